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
import java.util.stream.Collectors;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.kneepoint.server.app.demo.DemoLibrary;

class LibraryCheckCommandTest {

    @TempDir
    static Path folder;

    private static String db;

    @BeforeAll
    static void load_the_demo_library() {
        db = folder.resolve("library").toString();
        assertEquals(0, CliRun.of("demo", "--db", db).exitCode());
    }

    private static JsonNode json(String... args) throws IOException {
        List<String> all = new ArrayList<>(List.of(args));
        all.addAll(List.of("--db", db, "--json"));
        CliRun run = CliRun.of(all.toArray(String[]::new));
        assertEquals(0, run.exitCode(), run.err());
        assertEquals("", run.err());
        return new ObjectMapper().readTree(run.out());
    }

    @Test
    void check_of_a_library_grade_has_the_typed_in_keys_and_extrapolated() throws IOException {
        // DEMO NdFeB 42/100 is measured at 20, 60, 80 and 100 °C (DemoLibrary, invented)
        JsonNode json = json("check", "DEMO NdFeB 42/100", "--pc", "1", "--temperature", "60C", "--opposing-field", "300kA/m");
        List<String> keys = new ArrayList<>();
        json.fieldNames().forEachRemaining(keys::add);
        assertEquals(List.of("pc", "operatingPoint", "reversibleLossPercent", "irreversibleLossPercent", "kneeMarginH",
                "maxWorkingTemperatureK", "extrapolated", "cautions", "kneeField", "kneeMarginTemperatureK", "maxWorkingTemperatureStop",
                "lossLimitPercent", "localCheck", "fieldConvention", "opposingFieldH", "externalFieldH",
                "demagnetizingFactor", "minWorkingTemperatureK", "minWorkingTemperatureStop", "operatingPointExtrapolated",
                "lossExtrapolated", "minWorkingTemperatureExtrapolated", "maxWorkingTemperatureExtrapolated", "beyondMeasuredField", "verdict"), keys);
        assertFalse(json.get("extrapolated").asBoolean());
        assertTrue(json.get("maxWorkingTemperatureK").asDouble() < 373.15, json.toString());
        assertEquals(3, json.get("cautions").size());
    }

    @Test
    void check_beyond_the_measured_temperatures_says_it_is_extrapolated() throws IOException {
        JsonNode json = json("check", "DEMO NdFeB 42/100", "--pc", "1", "--temperature", "130C");
        assertTrue(json.get("extrapolated").asBoolean());
        assertEquals(4, json.get("cautions").size());
        assertTrue(json.get("cautions").get(0).asText().contains("extrapolated"));
        CliRun table = CliRun.of("check", "DEMO NdFeB 42/100", "--pc", "1", "--temperature", "130C", "--db", db);
        assertEquals(0, table.exitCode(), table.err());
        assertTrue(table.out().contains("extrapolated         yes"), table.out());
        assertTrue(table.out().contains("DEMO NdFeB 42/100 (4 curves measured at 20 °C to 100 °C"), table.out());
        assertTrue(table.out().contains("implanted medical devices"), table.out());
    }

    @Test
    void max_working_temperature_search_stays_inside_the_model_range() throws IOException {
        // DEMO SmCo 28/200: measured 20 to 350 °C; the model extrapolates half the span, 165 K, beyond (FittedTemperatureModel)
        JsonNode json = json("check", "DEMO SmCo 28/200", "--pc", "2", "--temperature", "150C");
        assertEquals(623.15 + 165.0, json.get("maxWorkingTemperatureK").asDouble(), 1e-9);
        assertTrue(json.get("extrapolated").asBoolean());
    }

    @Test
    void hot_ndfeb_under_a_strong_opposing_field_loses_flux_while_smco_does_not() throws IOException {
        // Common practice: SmCo keeps its coercivity when hot, NdFeB does not (HcJ falls by roughly 0.2–0.3 %/K for SmCo
        // and 0.5–0.6 %/K for NdFeB, from memory), so at 150 °C and 800 kA/m against it SmCo stays above its knee. The recoil
        // line through its operating point still counts the start of the knee's bend (issue 11): a tenth of a per cent.
        String[] design = {"--pc", "1", "--temperature", "150C", "--opposing-field", "800kA/m"};
        JsonNode ndfeb = json(prepend("check", "DEMO NdFeB 40/160", design));
        JsonNode smco = json(prepend("check", "DEMO SmCo 28/200", design));
        assertTrue(ndfeb.get("irreversibleLossPercent").asDouble() > 1.0, ndfeb.toString());
        assertTrue(ndfeb.get("kneeMarginH").asDouble() < 0.0);
        assertTrue(smco.get("irreversibleLossPercent").asDouble() < 0.5, smco.toString());
        assertTrue(smco.get("irreversibleLossPercent").asDouble() < ndfeb.get("irreversibleLossPercent").asDouble() / 10);
        assertTrue(smco.get("kneeMarginH").asDouble() > 0.0);
        assertFalse(ndfeb.get("extrapolated").asBoolean());
    }

    @Test
    void duty_of_a_library_grade_keeps_the_loss_of_the_hot_step() throws IOException {
        JsonNode json = json("duty", "DEMO NdFeB 40/160", "--pc", "1", "--steps", "20C:0, 150C:800kA/m, 20C:0");
        JsonNode steps = json.get("steps");
        assertEquals(0.0, steps.get(0).get("irreversibleLossPercent").asDouble(), 1e-6);
        double hot = steps.get(1).get("irreversibleLossPercent").asDouble();
        assertTrue(hot > 1.0);
        assertEquals(hot, steps.get(2).get("irreversibleLossPercent").asDouble(), 0.0);
        assertFalse(json.get("extrapolated").asBoolean());
        assertEquals(3, json.get("cautions").size());
    }

    @Test
    void duty_beyond_the_measured_temperatures_says_it_is_extrapolated() throws IOException {
        JsonNode json = json("duty", "DEMO NdFeB 40/160", "--pc", "1", "--steps", "20C:0, 190C:0");
        assertTrue(json.get("extrapolated").asBoolean());
        assertEquals(4, json.get("cautions").size());
    }

    @Test
    void a_grade_measured_only_when_hot_is_checked_from_its_lowest_measured_temperature() throws IOException {
        // DEMO NdFeB 35/250 without its 20 °C curve: measured at 100 to 220 °C, the model reaches down to 40 °C only
        String demo = DemoLibrary.files().get("demo-ndfeb-35-250.csv");
        String hot = demo.lines().filter(line -> !line.startsWith("20,"))
                .map(line -> line.replace("# grade: DEMO NdFeB 35/250", "# grade: DEMO hot-only"))
                .collect(Collectors.joining("\n", "", "\n"));
        Path file = folder.resolve("demo-hot-only.csv");
        Files.writeString(file, hot);
        assertEquals(0, CliRun.of("import", file.toString(), "--db", db).exitCode());
        JsonNode json = json("check", "DEMO hot-only", "--pc", "1", "--temperature", "150C", "--opposing-field", "300kA/m");
        // the demo grade's Br falls by 0.11 % of Br(20 °C) per kelvin (DemoLibrary, invented): 50 K from Br(100 °C)
        assertEquals(-0.11 / (1 - 0.0011 * 80) * 50, json.get("reversibleLossPercent").asDouble(), 0.3);
        assertTrue(json.get("maxWorkingTemperatureK").asDouble() > 423.15);
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
        unknown grade           | check | NOPE 1/1          | --pc 1 --temperature 20C
        grade and --br          | check | DEMO SmCo 28/200  | --pc 1 --temperature 20C --br 1.2T
        grade and --alpha       | check | DEMO SmCo 28/200  | --pc 1 --temperature 20C --alpha -0.1%/K
        outside the model       | check | DEMO SmCo 28/200  | --pc 1 --temperature 900C
        duty unknown grade      | duty  | NOPE 1/1          | --pc 1 --steps 20C:0
        duty grade and --hcj    | duty  | DEMO SmCo 28/200  | --pc 1 --steps 20C:0 --hcj 1600kA/m
        """)
    void bad_grade_gives_exit_2_one_line_and_no_output(String name, String command, String grade, String options) {
        List<String> args = new ArrayList<>(List.of(command, grade));
        args.addAll(List.of(options.split(" ")));
        args.addAll(List.of("--db", db));
        CliRun run = CliRun.of(args.toArray(String[]::new));
        assertEquals(2, run.exitCode(), run.err());
        assertEquals("", run.out());
        assertEquals(1, run.err().strip().lines().count(), run.err());
        assertTrue(run.err().startsWith("kneepoint: "), run.err());
    }

    @Test
    void a_rounded_alnico_grade_loses_less_on_a_longer_magnets_load_line() throws IOException {
        // A higher permeance coefficient keeps the operating point further from the knee (common practice).
        JsonNode shortMagnet = new ObjectMapper().readTree(CliRun.of("check", "DEMO AlNiCo 5", "--pc", "1", "--temperature", "20C",
                "--json", "--db", db).out());
        JsonNode longMagnet = new ObjectMapper().readTree(CliRun.of("check", "DEMO AlNiCo 5", "--pc", "30", "--temperature", "20C",
                "--json", "--db", db).out());
        assertTrue(shortMagnet.get("irreversibleLossPercent").asDouble() > 10, shortMagnet.toString());
        assertTrue(longMagnet.get("irreversibleLossPercent").asDouble() < shortMagnet.get("irreversibleLossPercent").asDouble(),
                longMagnet.toString());
    }

    @Test
    void neither_grade_nor_typed_in_values_gives_exit_2() {
        CliRun run = CliRun.of("check", "--pc", "1", "--temperature", "20C", "--db", db);
        assertEquals(2, run.exitCode(), run.err());
        assertEquals("", run.out());
        assertTrue(run.err().contains("--br, --mu-rec and --hcj"), run.err());
    }

    private static String[] prepend(String command, String grade, String[] options) {
        List<String> all = new ArrayList<>(List.of(command, grade));
        all.addAll(List.of(options));
        return all.toArray(String[]::new);
    }
}
