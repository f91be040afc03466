package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.kneepoint.db.DatabaseLocation;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.library.LibraryCurve;

class LibraryCommandsTest {

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

    private List<LibraryCurve> stored(String grade) {
        try (Library library = Library.open(DatabaseLocation.ofFolder(folder.resolve("library")))) {
            return library.reader().curves(grade);
        }
    }

    private Path file(String name, String text) throws IOException {
        Path path = folder.resolve(name);
        Files.writeString(path, text);
        return path;
    }

    private static final String CURVE_SI = """
            # grade: Invented N40
            # family: sintered NdFeB
            # temperature: 20 °C
            H [kA/m],J [T]
            50,1.2913
            0,1.2888
            -400,1.2636
            -800,1.2382
            -1100,1.1871
            -1300,0.9
            -1400,0.2
            -1500,0
            """;

    @Test
    void import_then_grades_lists_the_grade_with_its_temperatures() throws IOException {
        CliRun run = CliRun.of("import", file("n40.csv", CURVE_SI).toString(), "--db", db());
        assertEquals(0, run.exitCode(), run.err());
        assertEquals("n40.csv: grade 'Invented N40' (sintered NdFeB), 1 curve at 20 °C, 8 points: imported\n", run.out());
        JsonNode grades = new ObjectMapper().readTree(CliRun.of("grades", "--json", "--db", db()).out());
        assertEquals("Invented N40", grades.get(0).get("name").asText());
        assertEquals("sintered NdFeB", grades.get(0).get("family").asText());
        assertEquals(293.15, grades.get(0).get("temperaturesK").get(0).asDouble(), 1e-12);
    }

    @Test
    void importing_the_same_file_twice_reports_it_and_stores_it_once() throws IOException {
        Path path = file("n40.csv", CURVE_SI);
        CliRun.of("import", path.toString(), "--db", db());
        Map<String, Integer> before = rowCounts();
        CliRun again = CliRun.of("import", path.toString(), "--db", db());
        assertEquals(0, again.exitCode());
        assertTrue(again.out().contains("already imported"), again.out());
        assertEquals(before, rowCounts());
    }

    @Test
    void a_dry_run_checks_and_writes_nothing() throws IOException {
        CliRun run = CliRun.of("import", file("n40.csv", CURVE_SI).toString(), "--dry-run", "--json", "--db", db());
        assertEquals(0, run.exitCode(), run.err());
        assertEquals("valid", new ObjectMapper().readTree(run.out()).get("files").get(0).get("status").asText());
        assertTrue(rowCounts().values().stream().allMatch(count -> count == 0));
    }

    @Test
    void one_bad_file_among_several_writes_nothing_at_all() throws IOException {
        Path good = file("good.csv", CURVE_SI);
        Path bad = file("bad.csv", CURVE_SI.replace("Invented N40", "Invented N45").replace("-800,1.2382", "-800,x"));
        CliRun run = CliRun.of("import", good.toString(), bad.toString(), "--db", db());
        assertEquals(2, run.exitCode());
        assertEquals("kneepoint: bad.csv, line 8, column 2 (J [T]): expected a finite number, got 'x'", run.err().strip());
        assertEquals("", run.out());
        assertTrue(rowCounts().values().stream().allMatch(count -> count == 0));
    }

    @Test
    void a_file_without_a_grade_or_a_temperature_is_refused() throws IOException {
        CliRun noGrade = CliRun.of("import", file("a.csv", CURVE_SI.replace("# grade: Invented N40\n", "")).toString(), "--db", db());
        assertEquals("kneepoint: a.csv: no grade; add a line '# grade: NAME' before the header", noGrade.err().strip());
        CliRun noTemperature = CliRun.of("import", file("b.csv", CURVE_SI.replace("# temperature: 20 °C\n", "")).toString(), "--db", db());
        assertEquals("kneepoint: b.csv: no temperature; add '# temperature: 20 °C' or a T column", noTemperature.err().strip());
    }

    // Import → export round trip, exact to 1e-12 relative after unit conversion (issue 3).
    @Test
    void export_returns_the_imported_points_to_1e_12_in_si_and_cgs() throws IOException {
        CliRun.of("import", file("n40.csv", CURVE_SI).toString(), "--db", db());
        for (String units : new String[] {"si", "cgs"}) {
            Path exported = folder.resolve("export-" + units + ".csv");
            CliRun run = CliRun.of("export", "Invented N40", "--temperature", "20C", "--curve", "intrinsic", "--units", units,
                    "-o", exported.toString(), "--db", db());
            assertEquals(0, run.exitCode(), run.err());
            var reread = new org.kneepoint.importer.csv.CurveFileReader(org.kneepoint.importer.csv.ReadLimits.defaults()).read(exported);
            double[] original = stored("Invented N40").get(0).curve().values();
            double[] back = reread.curves().get(0).values();
            double[] h = reread.curves().get(0).h();
            double[] originalH = stored("Invented N40").get(0).curve().h();
            for (int i = 0; i < original.length; i++) {
                assertEquals(original[i], back[i], 1e-12 * Math.abs(original[i]) + 1e-300, units + " J at " + i);
                assertEquals(originalH[i], h[i], 1e-12 * Math.abs(originalH[i]) + 1e-300, units + " H at " + i);
            }
        }
    }

    @Test
    void cgs_files_store_the_same_values_as_their_si_twins() throws IOException {
        String cgs = """
                # grade: Invented twin CGS
                # family: sintered NdFeB
                # temperature: 68 °F
                H [Oe];J [G]
                0;12888
                -5026,5482;12636
                -10053,0964;12382
                """;
        String si = """
                # grade: Invented twin SI
                # family: sintered NdFeB
                # temperature: 293.15 K
                H [A/m],J [T]
                0,1.2888
                -400000,1.2636
                -800000,1.2382
                """;
        CliRun run = CliRun.of("import", file("cgs.csv", cgs).toString(), file("si.csv", si).toString(), "--db", db());
        assertEquals(0, run.exitCode(), run.err());
        var fromCgs = stored("Invented twin CGS").get(0).curve();
        var fromSi = stored("Invented twin SI").get(0).curve();
        assertEquals(fromSi.temperatureK(), fromCgs.temperatureK(), 1e-12);
        assertArrayEquals(fromSi.values(), fromCgs.values(), 1e-12);
        double[] hSi = fromSi.h();
        double[] hCgs = fromCgs.h();
        for (int i = 0; i < hSi.length; i++) {
            assertEquals(hSi[i], hCgs[i], 1e-6 * Math.max(1, Math.abs(hSi[i])), "H to the 8 digits written");
        }
    }

    @Test
    void backup_restore_backup_gives_identical_bytes() throws IOException {
        assertEquals(0, CliRun.of("demo", "--db", db()).exitCode());
        Path first = folder.resolve("first.json");
        Path second = folder.resolve("second.json");
        assertEquals(0, CliRun.of("backup", first.toString(), "--db", db()).exitCode());
        String otherDb = folder.resolve("other").toString();
        CliRun restore = CliRun.of("restore", first.toString(), "--db", otherDb);
        assertEquals(0, restore.exitCode(), restore.err());
        assertEquals(0, CliRun.of("backup", second.toString(), "--db", otherDb).exitCode());
        assertArrayEquals(Files.readAllBytes(first), Files.readAllBytes(second));
        CliRun again = CliRun.of("restore", first.toString(), "--db", otherDb);
        assertEquals(2, again.exitCode());
        assertEquals("kneepoint: the library is not empty; restore needs an empty database", again.err().strip());
    }

    @Test
    void the_demo_loads_twelve_grades_once() throws IOException {
        CliRun first = CliRun.of("demo", "--db", db());
        assertEquals(0, first.exitCode(), first.err());
        JsonNode grades = new ObjectMapper().readTree(CliRun.of("grades", "--json", "--db", db()).out());
        assertEquals(12, grades.size());
        for (JsonNode grade : grades) {
            assertTrue(grade.get("name").asText().startsWith("DEMO "), grade.toString());
            assertTrue(grade.get("temperaturesK").size() >= 3, grade.toString());
        }
        Map<String, Integer> before = rowCounts();
        assertTrue(CliRun.of("demo", "--db", db()).out().contains("already loaded"));
        assertEquals(before, rowCounts());
        JsonNode families = new ObjectMapper().readTree(CliRun.of("grades", "--family", "hard ferrite", "--json", "--db", db()).out());
        assertEquals(2, families.size());
    }

    @Test
    void curve_of_a_stored_grade_at_another_temperature_needs_a_temperature_model() throws IOException {
        CliRun.of("import", file("n40.csv", CURVE_SI).toString(), "--db", db());
        CliRun ok = CliRun.of("curve", "Invented N40", "--temperature", "20C", "--json", "--db", db());
        assertEquals(0, ok.exitCode(), ok.err());
        assertEquals(1.2888, new ObjectMapper().readTree(ok.out()).get("br").asDouble(), 1e-3);
        CliRun missing = CliRun.of("curve", "Invented N40", "--temperature", "80C", "--db", db());
        assertEquals(2, missing.exitCode());
        assertEquals("kneepoint: grade 'Invented N40': no temperature model (a temperature model needs curves at two or more"
                + " temperatures, got 1)", missing.err().strip());
        CliRun unknown = CliRun.of("curve", "Nothing", "--temperature", "20C", "--db", db());
        assertEquals("kneepoint: no grade named 'Nothing' in the library; 'kneepoint grades' lists them", unknown.err().strip());
    }

    @Test
    void between_stored_temperatures_the_curve_is_modeled_and_beyond_them_flagged_extrapolated() throws IOException {
        CliRun.of("demo", "--db", db());
        JsonNode between = new ObjectMapper().readTree(CliRun.of("curve", "DEMO NdFeB 40/160", "--temperature", "100C", "--json",
                "--db", db()).out());
        assertTrue(between.get("modeled").asBoolean());
        assertFalse(between.get("extrapolated").asBoolean());
        JsonNode at80 = new ObjectMapper().readTree(CliRun.of("curve", "DEMO NdFeB 40/160", "--temperature", "80C", "--json",
                "--db", db()).out());
        JsonNode at120 = new ObjectMapper().readTree(CliRun.of("curve", "DEMO NdFeB 40/160", "--temperature", "120C", "--json",
                "--db", db()).out());
        assertFalse(at80.get(0) == null ? at80.get("modeled").asBoolean() : at80.get(0).get("modeled").asBoolean());
        double hcj80 = (at80.isArray() ? at80.get(0) : at80).get("hcj").asDouble();
        double hcj120 = (at120.isArray() ? at120.get(0) : at120).get("hcj").asDouble();
        assertTrue(between.get("hcj").asDouble() < hcj80 && between.get("hcj").asDouble() > hcj120, between.toString());
        CliRun beyond = CliRun.of("curve", "DEMO NdFeB 40/160", "--temperature", "180C", "--db", db());
        assertTrue(beyond.out().contains("EXTRAPOLATED"), beyond.out());
    }

    @Test
    void hostile_grade_names_are_stored_and_listed_unchanged() throws IOException {
        List<String> names = List.of("<script>alert(1)</script>", "'; DROP TABLE grade; --", "Ниодим «42» 磁石");
        int index = 0;
        for (String name : names) {
            CliRun run = CliRun.of("import", file("h" + index++ + ".csv", CURVE_SI.replace("Invented N40", name)).toString(), "--db", db());
            assertEquals(0, run.exitCode(), run.err());
        }
        JsonNode grades = new ObjectMapper().readTree(CliRun.of("grades", "--json", "--db", db()).out());
        List<String> listed = new java.util.ArrayList<>();
        grades.forEach(grade -> listed.add(grade.get("name").asText()));
        assertEquals(names.stream().sorted().toList(), listed);
        assertEquals(3, rowCounts().get("curve"));
    }

    @Test
    void control_characters_in_names_are_refused_by_import_and_never_reach_the_terminal_raw() throws IOException {
        String name = "Red\u001b[31m grade\u0007";
        String json = "{\"grade\": \"" + name.replace("\u001b", "\\u001b").replace("\u0007", "\\u0007")
                + "\", \"family\": \"invented\", \"temperature\": \"20 °C\", \"columns\": [\"H [kA/m]\", \"J [T]\"],"
                + " \"rows\": [[50, 1.2913], [0, 1.2888], [-400, 1.2636], [-800, 1.2382], [-1500, 0]]}";
        CliRun refused = CliRun.of("import", file("escape.json", json).toString(), "--db", db());
        assertEquals(2, refused.exitCode());
        assertEquals("kneepoint: escape.json, line 1: grade holds U+001B (a control character) at character 4; names may not hold control"
                + " or bidirectional formatting characters", refused.err().strip());
        assertFalse(refused.err().contains("\u001b"));
        // A library written before names were checked may still hold one: store it directly and list it.
        try (Library library = Library.open(DatabaseLocation.ofFolder(folder.resolve("library")))) {
            var curve = org.kneepoint.fitter.curve.DemagnetizationCurve.of(org.kneepoint.fitter.curve.Quantity.J,
                    new double[] {0, -4e5, -8e5}, new double[] {1.2888, 1.2636, 1.2382}, 293.15);
            var info = new org.kneepoint.fitter.library.ImportInfo("old.json", "b".repeat(64), java.time.Instant.parse("2026-01-01T00:00:00Z"), 1, 3, 0);
            library.writer().importBatches(List.of(new org.kneepoint.fitter.library.ImportBatch(info,
                    List.of(new org.kneepoint.fitter.library.GradeInfo(name, "invented", null, null, null, "stored directly")),
                    List.of(new LibraryCurve(name, curve, "old.json", "b".repeat(64))), List.of())));
        }
        CliRun table = CliRun.of("grades", "--db", db());
        assertFalse(table.out().contains("\u001b"), table.out());
        assertTrue(table.out().contains("Red\\u001b[31m grade\\u0007"), table.out());
        JsonNode listed = new ObjectMapper().readTree(CliRun.of("grades", "--json", "--db", db()).out());
        assertEquals(name, listed.get(0).get("name").asText());
    }

    @Test
    void export_refuses_bad_requests_and_writes_no_file() throws IOException {
        CliRun.of("import", file("n40.csv", CURVE_SI).toString(), "--db", db());
        Path target = folder.resolve("out.csv");
        for (String[] args : new String[][] {
            {"--points", "1"}, {"--points", "2000000"}, {"--shifted", "--curve", "intrinsic"}, {"--bare", "--format", "json"},
            {"--format", "xml"}, {"--units", "imperial"}}) {
            List<String> all = new java.util.ArrayList<>(List.of("export", "Invented N40", "--temperature", "20C", "-o", target.toString(), "--db", db()));
            all.addAll(List.of(args));
            CliRun run = CliRun.of(all.toArray(String[]::new));
            assertEquals(2, run.exitCode(), String.join(" ", args));
            assertEquals(1, run.err().strip().lines().count(), run.err());
            assertFalse(Files.exists(target), String.join(" ", args));
        }
    }

    @Test
    void a_json_curve_file_stores_the_same_curve_as_its_text_twin() throws IOException {
        String json = """
                {"grade": "Invented JSON twin", "family": "sintered NdFeB", "temperature": "20 °C",
                 "columns": ["H [kA/m]", "J [T]"],
                 "rows": [[50, 1.2913], [0, 1.2888], [-400, 1.2636], [-800, 1.2382], [-1100, 1.1871], [-1300, 0.9], [-1400, 0.2], [-1500, 0]]}
                """;
        CliRun run = CliRun.of("import", file("twin.json", json).toString(), file("n40.csv", CURVE_SI).toString(), "--db", db());
        assertEquals(0, run.exitCode(), run.err());
        assertEquals(stored("Invented N40").get(0).curve(), stored("Invented JSON twin").get(0).curve());
        CliRun bad = CliRun.of("import", file("bad.json", json.replace("[-800, 1.2382]", "[-800, \"x\"]")).toString(), "--db", db());
        assertEquals(2, bad.exitCode());
        assertTrue(bad.err().startsWith("kneepoint: bad.json, line 3, column 62 (rows): expected a number, got the text \"x\""), bad.err());
    }
}
