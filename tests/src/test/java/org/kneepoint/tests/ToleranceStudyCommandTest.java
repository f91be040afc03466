package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class ToleranceStudyCommandTest {

    private static final String[] CHECK = {"check", "--pc", "1", "--temperature", "120C", "--opposing-field", "200kA/m", "--br", "1.3T",
        "--mu-rec", "1.05", "--hcj", "1600kA/m", "--knee", "1450kA/m", "--alpha", "-0.12%/K", "--beta", "-0.6%/K", "--samples", "2000"};

    private static CliRun run(String... more) {
        List<String> args = new ArrayList<>(List.of(CHECK));
        args.addAll(List.of(more));
        return CliRun.of(args.toArray(String[]::new));
    }

    private static JsonNode json(String... more) throws IOException {
        CliRun run = run(more);
        assertEquals(0, run.exitCode(), run.err());
        return new ObjectMapper().readTree(run.out());
    }

    private static List<String> keys(JsonNode node) {
        List<String> keys = new ArrayList<>();
        node.fieldNames().forEachRemaining(keys::add);
        return keys;
    }

    @Test
    void tolerance_object_has_the_issues_keys_and_shares_summing_to_one() throws IOException {
        JsonNode tolerance = json("--tolerance", "br=±2%", "--tolerance", "hcj=+-5%", "--tolerance", "temperature=±5K",
                "--tolerance", "opposing-field=-0kA/m..+20kA/m", "--json").get("tolerance");
        assertEquals(List.of("samples", "seed", "distribution", "results", "probabilityOverLossLimit", "worstCase", "sensitivity",
                "sensitivityOutput"), keys(tolerance));
        assertEquals(2000, tolerance.get("samples").asInt());
        assertEquals(14, tolerance.get("seed").asLong());
        assertEquals("normal", tolerance.get("distribution").asText());
        assertEquals(List.of("b", "h", "j", "irreversibleLossPercent", "reversibleLossPercent", "maxWorkingTemperatureK"),
                keys(tolerance.get("results")));
        for (JsonNode summary : tolerance.get("results")) {
            assertEquals(List.of("mean", "sd", "p05", "p50", "p95", "min", "max"), keys(summary));
            assertTrue(summary.get("min").asDouble() <= summary.get("p05").asDouble()
                    && summary.get("p05").asDouble() <= summary.get("p50").asDouble()
                    && summary.get("p50").asDouble() <= summary.get("p95").asDouble()
                    && summary.get("p95").asDouble() <= summary.get("max").asDouble(), summary.toString());
        }
        assertEquals(List.of("br", "hcj", "temperature", "opposing-field"), keys(tolerance.get("worstCase").get("inputs")));
        double sum = 0;
        for (JsonNode share : tolerance.get("sensitivity")) {
            assertEquals(List.of("input", "share"), keys(share));
            sum += share.get("share").asDouble();
        }
        assertEquals(1.0, sum, 1e-9);
        double probability = tolerance.get("probabilityOverLossLimit").asDouble();
        assertTrue(probability >= 0 && probability <= 1);
    }

    @Test
    void a_fixed_seed_gives_byte_identical_json_and_another_seed_another_document() {
        String[] study = {"--tolerance", "br=±2%", "--tolerance", "pc=±10%", "--distribution", "uniform", "--seed", "7", "--json"};
        CliRun first = run(study);
        assertEquals(0, first.exitCode(), first.err());
        assertEquals(first.out(), run(study).out());
        study[7] = "8";
        assertFalse(first.out().equals(run(study).out()));
    }

    @Test
    void table_adds_the_study_under_the_check() {
        CliRun run = run("--tolerance", "hcj=-5%..+0%");
        assertEquals(0, run.exitCode(), run.err());
        assertTrue(run.out().contains("Tolerance study: 2000 samples, normal bands (a band is a 3σ process limit), seed 14"), run.out());
        assertTrue(run.out().contains("worst corner"), run.out());
        assertTrue(run.out().contains("implanted medical devices"), run.out());
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "br=±|--tolerance 'br=±'",
        "br=±-2%|--tolerance 'br=±-2%'",
        "flux=±2%|unknown input 'flux'",
        "length=±1mm|--tolerance length: the check's load line has no length",
        "pc=-150%..+0%|--tolerance pc: the band makes pc zero or negative",
    })
    void bad_bands_are_refused_with_one_line_naming_the_option(String band, String message) {
        CliRun run = run("--tolerance", band, "--json");
        assertEquals(2, run.exitCode(), run.err());
        assertEquals("", run.out());
        assertTrue(run.err().contains(message), run.err());
        assertEquals(1, run.err().strip().lines().count(), run.err());
    }

    @Test
    void a_band_that_makes_a_size_negative_is_refused() {
        CliRun run = CliRun.of("check", "--diameter", "10mm", "--length", "5mm", "--temperature", "20C", "--br", "1.3T", "--mu-rec",
                "1.05", "--hcj", "1600kA/m", "--tolerance", "length=±6mm");
        assertEquals(2, run.exitCode(), run.err());
        assertTrue(run.err().contains("--tolerance length: the band makes length zero or negative"), run.err());
    }

    @Test
    void study_options_without_a_band_are_refused() {
        CliRun run = run();
        assertEquals(2, run.exitCode(), run.err());
        assertTrue(run.err().contains("give at least one --tolerance NAME=SPEC"), run.err());
    }
}
