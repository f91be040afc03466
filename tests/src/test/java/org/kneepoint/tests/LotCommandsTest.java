package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.kneepoint.db.DatabaseLocation;
import org.kneepoint.db.Library;

/**
 * {@code spec} and {@code lot} end to end. The grade's reference curve and the lots are invented ({@link KneeCurveFiles}),
 * with Br and HcJ exact by construction; the characterization finds them to 1e-9 relative (CurveCharacterizerTest),
 * the tolerance of the margins below.
 */
class LotCommandsTest {

    private static final String GRADE = "Invented N40";
    private static final double TOLERANCE = 1e-9;

    @TempDir
    Path folder;

    private String db() {
        return folder.resolve("library").toString();
    }

    private Map<String, Integer> rowCounts() {
        try (Library library = Library.open(DatabaseLocation.ofFolder(folder.resolve("library")))) {
            return library.reader().rowCounts();
        }
    }

    private Path curveFile(String name, String header, double br, int hcjKiloAmpere) throws IOException {
        return KneeCurveFiles.write(folder, name, header, br, hcjKiloAmpere);
    }

    private static JsonNode json(CliRun run) throws IOException {
        assertEquals(0, run.exitCode(), run.err());
        return new ObjectMapper().readTree(run.out());
    }

    private CliRun run(String... args) {
        List<String> all = new ArrayList<>(List.of(args));
        all.addAll(List.of("--db", db()));
        return CliRun.of(all.toArray(String[]::new));
    }

    @BeforeEach
    void gradeWithSpecificationAndThreeLots() throws IOException {
        Path reference = curveFile("n40.csv", "# grade: " + GRADE + "\n# family: sintered NdFeB\n", 1.30, 1400);
        assertEquals(0, run("import", reference.toString()).exitCode());
        assertEquals(0, run("spec", "set", GRADE, "--temperature", "20C", "--br-min", "13kG", "--hcj-min", "1400kA/m").exitCode());
        assertEquals(0, run("lot", "import", GRADE, "--lot", "L-above", "--measured-on", "2026-11-02",
                curveFile("above-s1.csv", "", 1.31, 1420).toString()).exitCode());
        assertEquals(0, run("lot", "import", GRADE, "--lot", "L-at", curveFile("at-s1.csv", "# grade: " + GRADE + "\n", 1.30, 1400).toString())
                .exitCode());
        assertEquals(0, run("lot", "import", GRADE, "--lot", "L-below", "--sample", "edge",
                curveFile("below-s1.csv", "", 1.30, 1380).toString()).exitCode());
    }

    private static JsonNode quantity(JsonNode check, String name) {
        for (JsonNode quantity : check.get("samples").get(0).get("quantities")) {
            if (quantity.get("name").asText().equals(name)) {
                return quantity;
            }
        }
        throw new AssertionError("no quantity " + name + " in " + check);
    }

    @Test
    void a_lot_just_above_its_limits_passes_with_the_margins_of_its_formula() throws IOException {
        JsonNode check = json(run("lot", "check", GRADE, "--lot", "L-above", "--json"));
        assertEquals("pass", check.get("verdict").asText());
        assertEquals(0.01, quantity(check, "br").get("margin").asDouble(), TOLERANCE);
        assertEquals(20e3, quantity(check, "hcj").get("margin").asDouble(), TOLERANCE * 1.4e6);
        assertEquals(1.3, quantity(check, "br").get("limit").asDouble(), 1e-15);
    }

    @Test
    void a_lot_at_its_limits_passes_and_equals_the_reference_curve() throws IOException {
        JsonNode check = json(run("lot", "check", GRADE, "--lot", "L-at", "--json"));
        assertEquals(List.of("lot", "grade", "samples", "verdict", "reasons"), fieldNames(check));
        JsonNode sample = check.get("samples").get(0);
        assertEquals(List.of("sample", "temperatureK", "quantities", "maxDeviation", "maxDeviationAtH"), fieldNames(sample));
        assertEquals(List.of("name", "value", "limit", "margin", "verdict"), fieldNames(sample.get("quantities").get(0)));
        assertEquals("pass", check.get("verdict").asText());
        assertEquals(0.0, quantity(check, "hcj").get("margin").asDouble(), TOLERANCE * 1.4e6);
        assertEquals(0.0, sample.get("maxDeviation").asDouble());
        assertEquals("at-s1", sample.get("sample").asText());
    }

    @Test
    void a_lot_just_below_its_hcj_limit_fails_with_the_reason_in_words() throws IOException {
        JsonNode check = json(run("lot", "check", GRADE, "--lot", "L-below", "--json"));
        assertEquals("fail", check.get("verdict").asText());
        assertEquals("fail", quantity(check, "hcj").get("verdict").asText());
        assertEquals(-20e3, quantity(check, "hcj").get("margin").asDouble(), TOLERANCE * 1.4e6);
        assertEquals("edge", check.get("samples").get(0).get("sample").asText());
        assertEquals("sample edge at 20 °C: HcJ 1380 kA/m is below the minimum 1400 kA/m", check.get("reasons").get(0).asText());
        CliRun table = run("lot", "check", GRADE, "--lot", "L-below");
        assertTrue(table.out().startsWith("Lot L-below of Invented N40: FAIL\n"), table.out());
    }

    // Guarded acceptance (JCGM 106:2012; ILAC-G8:09/2019 §4): Br = 1.31 T is 0.01 T above 1.30 T, less than 1 % of 1.31 T.
    @Test
    void a_guard_band_wider_than_the_margin_makes_the_lot_inconclusive() throws IOException {
        JsonNode check = json(run("lot", "check", GRADE, "--lot", "L-above", "--uncertainty", "br=1%,hcj=0.5%", "--json"));
        assertEquals("inconclusive", quantity(check, "br").get("verdict").asText());
        assertEquals("pass", quantity(check, "hcj").get("verdict").asText());
        assertEquals("inconclusive", check.get("verdict").asText());
    }

    @Test
    void specifications_accept_cgs_units_and_are_shown_in_si_with_their_version() throws IOException {
        json(run("spec", "set", GRADE, "--temperature", "20C", "--bh-max-min", "40MGOe", "--hcj-min", "14kOe", "--squareness-min", "90%", "--json"));
        JsonNode shown = json(run("spec", "show", GRADE, "--json"));
        JsonNode entry = shown.get("specifications").get(0);
        assertEquals(2, entry.get("version").asInt());
        Map<String, Double> minimums = new java.util.LinkedHashMap<>();
        entry.get("limits").forEach(limit -> minimums.put(limit.get("name").asText(), limit.get("minimum").asDouble()));
        // 1 kG = 0.1 T, 1 Oe = 1000/(4π) A/m, 1 MGOe = 100/(4π) kJ/m³ (NIST SP 811, docs/references.md §7).
        assertEquals(1.3, minimums.get("br"), 1e-12);
        assertEquals(14e6 / (4 * Math.PI), minimums.get("hcj"), 1e-6);
        assertEquals(40e5 / (4 * Math.PI), minimums.get("bhMax"), 1e-6);
        assertEquals(0.9, minimums.get("squareness"), 1e-15);
        assertEquals(List.of("br", "hcj", "bhMax", "squareness"), List.copyOf(minimums.keySet()));
    }

    @Test
    void lot_list_names_each_lot_with_its_samples() throws IOException {
        JsonNode list = json(run("lot", "list", GRADE, "--json"));
        assertEquals(3, list.get("lots").size());
        JsonNode above = list.get("lots").get(0);
        assertEquals("L-above", above.get("lot").asText());
        assertEquals("2026-11-02", above.get("measuredOn").asText());
        assertEquals("above-s1", above.get("samples").get(0).asText());
    }

    @Test
    void bad_input_is_one_line_exit_2_and_writes_nothing() throws IOException {
        assertEquals(0, run("import", curveFile("other.csv", "# grade: Invented N35\n# family: sintered NdFeB\n", 1.2, 1000).toString()).exitCode());
        assertEquals(0, run("lot", "import", "Invented N35", "--lot", "L-35", curveFile("l35.csv", "", 1.2, 1000).toString()).exitCode());
        Map<String, Integer> before = rowCounts();
        Path another = curveFile("another.csv", "", 1.3, 1400);
        assertRefused(run("lot", "check", GRADE, "--lot", "L-none"), "grade 'Invented N40' has no lot 'L-none'");
        assertRefused(run("lot", "check", GRADE, "--lot", "L-35"), "a lot of that name is of grade 'Invented N35'");
        assertRefused(run("spec", "set", GRADE, "--temperature", "20C"), "a specification needs at least one quantity");
        assertRefused(run("spec", "set", GRADE, "--temperature", "20C", "--br-min", "14kOe"), "--br-min");
        assertRefused(run("lot", "import", "Invented N35", "--lot", "L-36", curveFile("wrong-grade.csv", "# grade: " + GRADE + "\n", 1.29, 1400)
                .toString()), "the file names grade 'Invented N40', but the lot is of grade 'Invented N35'");
        assertRefused(run("lot", "import", "Unknown grade", "--lot", "L-1", another.toString()), "no grade named 'Unknown grade'");
        assertRefused(run("lot", "check", GRADE, "--lot", "L-at", "--uncertainty", "br=0.5"), "--uncertainty");
        assertEquals(before, rowCounts());
    }

    private static void assertRefused(CliRun run, String part) {
        assertEquals(2, run.exitCode(), run.out() + run.err());
        assertEquals("", run.out());
        assertEquals(1, run.err().lines().count(), run.err());
        assertTrue(run.err().contains(part), run.err());
    }

    private static List<String> fieldNames(JsonNode node) {
        List<String> names = new ArrayList<>();
        node.fieldNames().forEachRemaining(names::add);
        return names;
    }
}
