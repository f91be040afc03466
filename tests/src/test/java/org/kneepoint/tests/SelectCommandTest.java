package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.kneepoint.server.app.demo.DemoLibrary;

class SelectCommandTest {

    @TempDir
    static Path folder;

    private static String db;

    @BeforeAll
    static void load_the_demo_library() {
        db = folder.resolve("library").toString();
        assertEquals(0, CliRun.of("demo", "--db", db).exitCode());
    }

    private static JsonNode select(String... options) throws IOException {
        List<String> all = new ArrayList<>(List.of("select"));
        all.addAll(List.of(options));
        all.addAll(List.of("--db", db, "--json"));
        CliRun run = CliRun.of(all.toArray(String[]::new));
        assertEquals(0, run.exitCode(), run.err());
        assertEquals("", run.err());
        return new ObjectMapper().readTree(run.out());
    }

    @Test
    void every_grade_is_a_row_with_the_documented_keys() throws IOException {
        JsonNode rows = select("--pc", "1", "--temperature", "100C", "--opposing-field", "200kA/m");
        assertEquals(DemoLibrary.gradeNames().size(), rows.size());
        List<String> names = new ArrayList<>();
        rows.forEach(row -> names.add(row.get("grade").asText()));
        assertEquals(DemoLibrary.gradeNames().stream().sorted().toList(), names.stream().sorted().toList());
        for (JsonNode row : rows) {
            List<String> keys = new ArrayList<>();
            row.fieldNames().forEachRemaining(keys::add);
            assertEquals(List.of("grade", "family", "assessable", "pass", "reasons", "fluxDensity", "kneeMarginH",
                    "irreversibleLossPercent", "maxWorkingTemperatureK", "extrapolated", "price", "fieldConvention", "minWorkingTemperatureK",
                    "beyondMeasuredField", "verdict"), keys);
            assertTrue(row.get("reasons").isArray());
            assertEquals(row.get("pass").asBoolean(), row.get("reasons").isEmpty(), row.toString());
        }
    }

    @Test
    void each_row_carries_the_field_convention_and_the_working_temperatures_of_the_same_check() throws IOException {
        JsonNode rows = select("--pc", "1", "--temperature", "100C", "--external-field", "150kA/m");
        int checked = 0;
        for (JsonNode row : rows) {
            assertEquals("external", row.get("fieldConvention").asText(), row.toString());
            if (!row.get("assessable").asBoolean() || checked >= 3) {
                continue;
            }
            CliRun run = CliRun.of("check", row.get("grade").asText(), "--pc", "1", "--temperature", "100C", "--external-field",
                    "150kA/m", "--db", db, "--json");
            assertEquals(0, run.exitCode(), run.err());
            JsonNode check = new ObjectMapper().readTree(run.out());
            assertEquals(check.get("minWorkingTemperatureK").asDouble(), row.get("minWorkingTemperatureK").asDouble(), 1e-9, row.toString());
            assertEquals(check.get("maxWorkingTemperatureK").asDouble(), row.get("maxWorkingTemperatureK").asDouble(), 1e-9, row.toString());
            assertEquals(check.get("irreversibleLossPercent").asDouble(), row.get("irreversibleLossPercent").asDouble(), 1e-12);
            assertEquals(check.get("beyondMeasuredField").asBoolean(), row.get("beyondMeasuredField").asBoolean());
            checked++;
        }
        assertEquals(3, checked);
        assertEquals("opposing", select("--pc", "1", "--temperature", "100C").get(0).get("fieldConvention").asText());
    }

    @Test
    void rounded_alnico_grades_fail_on_a_short_magnets_load_line() throws IOException {
        // AlNiCo's low coercivity needs a long magnet (a high Pc); at Pc = 1 it loses much of its flux (common practice).
        JsonNode rows = select("--pc", "1", "--temperature", "100C");
        int alnico = 0;
        for (JsonNode row : rows) {
            if (row.get("family").asText().equals("cast AlNiCo")) {
                alnico++;
                assertTrue(row.get("assessable").asBoolean(), row.toString());
                assertFalse(row.get("pass").asBoolean(), row.toString());
                assertTrue(row.get("reasons").get(0).asText().startsWith("irreversible loss"), row.toString());
            }
        }
        assertEquals(2, alnico);
    }

    @Test
    void grades_with_one_temperature_or_curves_short_of_the_knee_are_not_assessable_with_the_reason() throws IOException {
        String library = folder.resolve("without-models").toString();
        Path single = folder.resolve("single.csv");
        Files.writeString(single, curveFile("INVENTED one temperature", new int[] {20}, 1.2));
        Path shortOfTheKnee = folder.resolve("short.csv");
        Files.writeString(shortOfTheKnee, curveFile("INVENTED short of the knee", new int[] {20, 100}, 0.5));
        assertEquals(0, CliRun.of("import", single.toString(), shortOfTheKnee.toString(), "--db", library).exitCode());
        CliRun run = CliRun.of("select", "--pc", "1", "--temperature", "80C", "--db", library, "--json");
        assertEquals(0, run.exitCode(), run.err());
        JsonNode rows = new ObjectMapper().readTree(run.out());
        assertEquals(2, rows.size());
        for (JsonNode row : rows) {
            assertFalse(row.get("assessable").asBoolean(), row.toString());
        }
        assertTrue(rows.get(0).get("reasons").get(0).asText().contains("two or more temperatures"), rows.toString());
        assertTrue(rows.get(1).get("reasons").get(0).asText().contains("stops before its knee"), rows.toString());
    }

    /** An invented NdFeB-like curve file, J of the knee form of DemoLibrary, from H = 0 down to {@code reach}·HcJ. */
    private static String curveFile(String grade, int[] celsius, double reach) {
        StringBuilder out = new StringBuilder("# INVENTED DATA for a test\n# grade: " + grade
                + "\n# family: sintered NdFeB\nT [°C],H [kA/m],J [T]\n");
        for (int t : celsius) {
            double br = 1.3 * (1 - 0.0012 * (t - 20));
            double hcj = 1600 * Math.exp(-0.006 * (t - 20));
            for (int i = 0; i < 60; i++) {
                double h = -reach * hcj * i / 59;
                double j = (br + 4e-7 * Math.PI * 0.05 * h * 1e3) * (1 - Math.exp(-(h + hcj) / (0.03 * hcj)));
                out.append(String.format(Locale.ROOT, "%d,%.4f,%.5f%n", t, h, Math.max(0.0, j)));
            }
        }
        return out.toString();
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(textBlock = """
        flux,        fluxDensity,             -1
        margin,      kneeMarginH,             -1
        loss,        irreversibleLossPercent, 1
        temperature, maxWorkingTemperatureK,  -1
        price,       price,                   1
        """)
    void rows_are_passing_first_then_in_the_sort_key_order(String sort, String key, int direction) throws IOException {
        JsonNode rows = select("--pc", "1", "--temperature", "120C", "--opposing-field", "300kA/m", "--sort", sort);
        List<List<JsonNode>> groups = List.of(new ArrayList<>(), new ArrayList<>(), new ArrayList<>());
        int group = 0;
        for (JsonNode row : rows) {
            int of = !row.get("assessable").asBoolean() ? 2 : row.get("pass").asBoolean() ? 0 : 1;
            assertTrue(of >= group, "passing, then failing, then not assessable: " + rows);
            group = of;
            groups.get(of).add(row);
        }
        assertFalse(groups.get(0).isEmpty());
        assertFalse(groups.get(1).isEmpty());
        for (List<JsonNode> rowsOfGroup : groups.subList(0, 2)) {
            for (int i = 1; i < rowsOfGroup.size(); i++) {
                JsonNode before = rowsOfGroup.get(i - 1).get(key);
                JsonNode after = rowsOfGroup.get(i).get(key);
                if (after.isNull()) {
                    continue;
                }
                assertFalse(before.isNull(), "values before nulls: " + rowsOfGroup);
                assertTrue(direction * (after.asDouble() - before.asDouble()) >= 0, key + " order: " + rowsOfGroup);
            }
        }
    }

    @Test
    void a_missed_minimum_flux_density_is_named_in_the_reasons() throws IOException {
        JsonNode rows = select("--pc", "2", "--temperature", "20C", "--min-flux-density", "0.7T");
        int failing = 0;
        for (JsonNode row : rows) {
            if (row.get("assessable").asBoolean() && row.get("fluxDensity").asDouble() < 0.7) {
                failing++;
                assertFalse(row.get("pass").asBoolean());
                assertTrue(row.get("reasons").toString().contains("is below the minimum 0.7 T"), row.toString());
            }
        }
        assertTrue(failing > 0);
    }

    @Test
    void an_exceeded_loss_and_a_temperature_out_of_range_are_named_in_the_reasons() throws IOException {
        JsonNode hot = select("--pc", "1", "--temperature", "150C", "--opposing-field", "800kA/m", "--max-loss", "2%");
        assertTrue(hot.toString().contains("exceeds the maximum 2 %"), hot.toString());
        JsonNode tooHot = select("--pc", "1", "--temperature", "400C", "--family", "sintered NdFeB");
        assertEquals(5, tooHot.size());
        for (JsonNode row : tooHot) {
            assertFalse(row.get("pass").asBoolean());
            assertTrue(row.get("reasons").get(0).asText().contains("outside the range of the grade's temperature model"), row.toString());
        }
    }

    @Test
    void family_keeps_only_that_family() throws IOException {
        JsonNode rows = select("--pc", "1", "--temperature", "100C", "--family", "sintered SmCo");
        assertEquals(2, rows.size());
        rows.forEach(row -> assertEquals("sintered SmCo", row.get("family").asText()));
    }

    @Test
    void table_shows_every_grade_and_ends_with_the_cautions() {
        CliRun run = CliRun.of("select", "--diameter", "10mm", "--length", "5mm", "--temperature", "120C", "--db", db);
        assertEquals(0, run.exitCode(), run.err());
        DemoLibrary.gradeNames().forEach(name -> assertTrue(run.out().contains(name), name));
        assertTrue(run.out().contains("confirm them by measurement"), run.out());
        assertTrue(run.out().endsWith("they disturb implanted medical devices.\n"), run.out());
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
        unknown sort key  | --pc 1 --temperature 20C --sort cost
        no load line      | --temperature 20C
        no temperature    | --pc 1
        loss without %    | --pc 1 --temperature 20C --max-loss 1
        flux without unit | --pc 1 --temperature 20C --min-flux-density 1
        """)
    void bad_input_gives_exit_2_one_line_and_no_output(String name, String options) {
        List<String> args = new ArrayList<>(List.of("select"));
        args.addAll(List.of(options.split(" ")));
        args.addAll(List.of("--db", db));
        CliRun run = CliRun.of(args.toArray(String[]::new));
        assertEquals(2, run.exitCode(), run.err());
        assertEquals("", run.out());
        assertEquals(1, run.err().strip().lines().count(), run.err());
    }
}
