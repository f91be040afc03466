package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class CheckCommandTest {

    private static final String[] GRADE = {"--br", "1.3T", "--mu-rec", "1.05", "--hcj", "1600kA/m", "--knee", "1450kA/m",
        "--alpha", "-0.12%/K", "--beta", "-0.6%/K"};

    private static String[] with(String... args) {
        String[] all = new String[args.length + GRADE.length];
        System.arraycopy(args, 0, all, 0, args.length);
        System.arraycopy(GRADE, 0, all, args.length, GRADE.length);
        return all;
    }

    private static JsonNode json(String... args) throws IOException {
        CliRun run = CliRun.of(args);
        assertEquals(0, run.exitCode(), run.err());
        assertEquals("", run.err());
        return new ObjectMapper().readTree(run.out());
    }

    @Test
    void json_has_exactly_the_documented_keys() throws IOException {
        JsonNode json = json(with("check", "--pc", "1.5", "--temperature", "80C", "--opposing-field", "100kA/m", "--json"));
        List<String> keys = List.of("pc", "operatingPoint", "reversibleLossPercent", "irreversibleLossPercent", "kneeMarginH",
                "maxWorkingTemperatureK", "extrapolated", "cautions");
        assertEquals(keys, iterable(json));
        assertEquals(List.of("h", "b", "j"), iterable(json.get("operatingPoint")));
        assertEquals(3, json.get("cautions").size());
        assertFalse(json.get("extrapolated").asBoolean());
        // Br(T)/Br(T0) − 1 = α·ΔT = −0.12 %/K · 60 K (the linear law, REFERENCES §6b)
        assertEquals(-7.2, json.get("reversibleLossPercent").asDouble(), 1e-9);
        assertTrue(json.get("maxWorkingTemperatureK").asDouble() > 353.15);
    }

    @Test
    void linear_magnet_works_at_br_pc_over_pc_plus_mu_rec() throws IOException {
        // Bd = Br·Pc/(Pc + μrec), common practice
        JsonNode json = json("check", "--pc", "2", "--br", "1.2T", "--mu-rec", "1.05", "--hcj", "3000kA/m", "--temperature", "20C",
                "--json");
        assertEquals(1.2 * 2 / 3.05, json.get("operatingPoint").get("b").asDouble(), 1e-9);
        assertEquals(0.0, json.get("irreversibleLossPercent").asDouble(), 0.0);
    }

    @Test
    void shape_options_give_the_magnetometric_pc() throws IOException {
        JsonNode byShape = json(with("check", "--diameter", "10mm", "--length", "10mm", "--temperature", "20C", "--json"));
        JsonNode permeance = json("permeance", "cylinder", "--diameter", "10mm", "--length", "10mm", "--json");
        assertEquals(permeance.get("permeanceCoefficient").get("magnetometric").asDouble(), byShape.get("pc").asDouble(), 0.0);
    }

    @Test
    void table_shows_the_cautions() {
        CliRun run = CliRun.of(with("check", "--pc", "1", "--temperature", "150C", "--opposing-field", "300kA/m"));
        assertEquals(0, run.exitCode(), run.err());
        assertTrue(run.out().contains("irreversible loss"), run.out());
        assertTrue(run.out().contains("confirm them by measurement"), run.out());
        assertTrue(run.out().contains("implanted medical devices"), run.out());
    }

    @Test
    void table_for_a_shape_adds_the_local_check() {
        CliRun run = CliRun.of(with("check", "--width", "20mm", "--depth", "20mm", "--thickness", "3mm", "--temperature", "120C",
                "--opposing-field", "200kA/m"));
        assertEquals(0, run.exitCode(), run.err());
        assertTrue(run.out().contains("of the volume below the knee (24 cells per edge"), run.out());
        assertTrue(run.out().contains("lowest local H"), run.out());
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
        no unit on br     | check --pc 1 --br 1.3 --mu-rec 1.05 --hcj 1600kA/m --temperature 20C
        hcj in tesla      | check --pc 1 --br 1.3T --mu-rec 1.05 --hcj 1.6T --temperature 20C
        mu-rec text       | check --pc 1 --br 1.3T --mu-rec high --hcj 1600kA/m --temperature 20C
        mu-rec below 1    | check --pc 1 --br 1.3T --mu-rec 0.9 --hcj 1600kA/m --temperature 20C
        knee beyond hcj   | check --pc 1 --br 1.3T --mu-rec 1.05 --hcj 1600kA/m --knee 1700kA/m --temperature 20C
        no load line      | check --br 1.3T --mu-rec 1.05 --hcj 1600kA/m --temperature 20C
        pc and shape      | check --pc 1 --diameter 5mm --length 5mm --br 1.3T --mu-rec 1.05 --hcj 1600kA/m --temperature 20C
        half a cylinder   | check --diameter 5mm --br 1.3T --mu-rec 1.05 --hcj 1600kA/m --temperature 20C
        negative pc       | check --pc -1 --br 1.3T --mu-rec 1.05 --hcj 1600kA/m --temperature 20C
        loss without %    | check --pc 1 --br 1.3T --mu-rec 1.05 --hcj 1600kA/m --temperature 20C --loss-limit 1
        loss of 100 %     | check --pc 1 --br 1.3T --mu-rec 1.05 --hcj 1600kA/m --temperature 20C --loss-limit 100%
        alpha without %/K | check --pc 1 --br 1.3T --mu-rec 1.05 --hcj 1600kA/m --temperature 20C --alpha -0.12
        too hot           | check --pc 1 --br 1.3T --mu-rec 1.05 --hcj 1600kA/m --beta -0.6%/K --temperature 250C
        negative field    | check --pc 1 --br 1.3T --mu-rec 1.05 --hcj 1600kA/m --temperature 20C --opposing-field -5kA/m
        unknown factor    | check --diameter 5mm --length 5mm --factor middle --br 1.3T --mu-rec 1.05 --hcj 1600kA/m --temperature 20C
        """)
    void bad_input_gives_exit_2_one_line_and_no_output(String name, String command) {
        CliRun run = CliRun.of(command.split(" "));
        assertEquals(2, run.exitCode(), run.err());
        assertEquals("", run.out());
        assertEquals(1, run.err().strip().lines().count(), run.err());
        assertTrue(run.err().startsWith("kneepoint: "), run.err());
    }

    private static List<String> iterable(JsonNode node) {
        List<String> names = new java.util.ArrayList<>();
        node.fieldNames().forEachRemaining(names::add);
        return names;
    }
}
