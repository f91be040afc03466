package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class SweepCommandTest {

    private static final String[] SWEEP = {"sweep", "--pc", "1", "--br", "1.3T", "--mu-rec", "1.05", "--hcj", "1600kA/m", "--knee",
        "1450kA/m", "--alpha", "-0.12%/K", "--beta", "-0.6%/K", "--from", "20C", "--to", "180C", "--step", "10K"};

    @TempDir
    Path folder;

    private static CliRun run(String... more) {
        List<String> args = new ArrayList<>(List.of(SWEEP));
        args.addAll(List.of(more));
        return CliRun.of(args.toArray(String[]::new));
    }

    @Test
    void json_has_one_step_per_temperature_each_the_check_there() throws IOException {
        CliRun run = run("--opposing-field", "100kA/m", "--json");
        assertEquals(0, run.exitCode(), run.err());
        JsonNode sweep = new ObjectMapper().readTree(run.out());
        List<String> keys = new ArrayList<>();
        sweep.fieldNames().forEachRemaining(keys::add);
        assertEquals(List.of("pc", "fieldConvention", "opposingFieldH", "externalFieldH", "lossLimitPercent", "steps",
                "minWorkingTemperatureK", "maxWorkingTemperatureK", "extrapolated", "beyondMeasuredField", "cautions", "verdict"), keys);
        assertEquals(17, sweep.get("steps").size());
        JsonNode at120 = sweep.get("steps").get(10);
        assertEquals(393.15, at120.get("temperatureK").asDouble(), 1e-9);
        CliRun check = CliRun.of("check", "--pc", "1", "--br", "1.3T", "--mu-rec", "1.05", "--hcj", "1600kA/m", "--knee", "1450kA/m",
                "--alpha", "-0.12%/K", "--beta", "-0.6%/K", "--temperature", "120C", "--opposing-field", "100kA/m", "--json");
        JsonNode checked = new ObjectMapper().readTree(check.out());
        assertEquals(checked.get("operatingPoint"), at120.get("operatingPoint"));
        assertEquals(checked.get("irreversibleLossPercent"), at120.get("irreversibleLossPercent"));
        assertEquals(checked.get("kneeMarginH"), at120.get("kneeMarginH"));
        assertEquals(checked.get("maxWorkingTemperatureK").asDouble(), sweep.get("maxWorkingTemperatureK").asDouble(), 1e-6);
    }

    @Test
    void writes_the_table_as_csv_and_the_chart_as_svg() throws IOException {
        Path csv = folder.resolve("sweep.csv");
        assertEquals(0, run("-o", csv.toString()).exitCode());
        List<String> lines = Files.readAllLines(csv);
        assertTrue(lines.get(0).startsWith("temperature_K,H_A_per_m,B_T,J_T"), lines.get(0));
        assertEquals(18, lines.size());
        Path svg = folder.resolve("sweep.svg");
        CliRun run = run("-o", svg.toString());
        assertEquals(0, run.exitCode(), run.err());
        String chart = Files.readString(svg);
        assertTrue(chart.startsWith("<?xml") || chart.startsWith("<svg"), chart.substring(0, 40));
        assertTrue(chart.contains("max. working temperature"));
        assertTrue(run.out().contains("working temperatures for a loss limit of 1"), run.out());
    }

    @Test
    void bad_ranges_are_refused_in_one_line() {
        for (String[] bad : new String[][] {{"--step", "0K"}, {"--to", "10C"}, {"-o", "sweep.pdf"}, {"--step", "5C"}}) {
            CliRun run = run(bad);
            assertEquals(2, run.exitCode(), String.join(" ", bad) + ": " + run.err());
            assertEquals(1, run.err().strip().lines().count(), run.err());
        }
    }
}
