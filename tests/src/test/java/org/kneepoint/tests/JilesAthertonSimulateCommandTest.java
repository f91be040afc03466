package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.kneepoint.fitter.model.ja.LoopMetrics;
import org.kneepoint.fitter.model.ja.MajorLoopAnalysis;
import org.kneepoint.fitter.units.MagneticConstant;

class JilesAthertonSimulateCommandTest {

    private static final List<String> SOFT_IRON = List.of("ja", "simulate", "--ms", "1.6e6A/m", "--a", "1100A/m",
            "--k", "400A/m", "--c", "0.2", "--alpha", "1.6e-3", "--hmax", "5kA/m");

    private static CliRun run(String... extra) {
        List<String> args = new ArrayList<>(SOFT_IRON);
        args.addAll(Arrays.asList(extra));
        return CliRun.of(args.toArray(String[]::new));
    }

    @Test
    void json_gives_the_loop_figures_of_the_issue_as_the_model_computes_them() throws IOException {
        CliRun run = run("--json");
        assertEquals(0, run.exitCode(), run.err());
        assertEquals("", run.err());
        JsonNode json = new ObjectMapper().readTree(run.out());
        LoopMetrics expected = MajorLoopAnalysis.adaptive(FitTestData.SOFT_IRON).measure(FitTestData.H_MAX);
        assertEquals(expected.hc(), json.get("hc").asDouble(), 0);
        assertEquals(expected.mr(), json.get("mr").asDouble(), 0);
        assertEquals(expected.hcb(), json.get("hcb").asDouble(), 0);
        assertEquals(expected.lossPerCycle(), json.get("lossPerCycle").asDouble(), 0);
        assertEquals(json.get("hc").asDouble(), json.get("hcj").asDouble(), 0, "J = μ0·M, so HcJ = Hc");
        assertEquals(MagneticConstant.MU0 * json.get("mr").asDouble(), json.get("br").asDouble(), 1e-15);
        assertEquals(MagneticConstant.MU0 * (5000 + json.get("mMax").asDouble()), json.get("bMax").asDouble(), 1e-12);
        assertTrue(json.get("lossPerCycle").asDouble() > 0);
        assertFalse(json.has("points"), "points only when asked for");
    }

    @Test
    void points_run_from_hmax_to_minus_hmax_and_back_and_are_point_symmetric() throws IOException {
        CliRun run = run("--points", "21", "--json");
        assertEquals(0, run.exitCode(), run.err());
        JsonNode points = new ObjectMapper().readTree(run.out()).get("points");
        assertEquals(21, points.size());
        assertEquals(5000, points.get(0).get(0).asDouble(), 0);
        assertEquals(-5000, points.get(10).get(0).asDouble(), 0);
        assertEquals(5000, points.get(20).get(0).asDouble(), 0);
        for (int i = 1; i < 10; i++) {
            assertEquals(-points.get(i).get(0).asDouble(), points.get(10 + i).get(0).asDouble(), 1e-9);
            assertEquals(-points.get(i).get(1).asDouble(), points.get(10 + i).get(1).asDouble(), 1e-6,
                    "the falling branch mirrors the rising one (Jiles, Thoelke, Devine 1992: loops are point-symmetric)");
        }
    }

    @Test
    void the_table_names_each_figure_and_summarizes_the_points() {
        CliRun run = run("--points", "101");
        assertEquals(0, run.exitCode(), run.err());
        for (String name : List.of("Hc = HcJ", "HcB", "Mr", "Br", "M at Hmax", "B at Hmax", "loss per cycle", "J/m³")) {
            assertTrue(run.out().contains(name), name + " in\n" + run.out());
        }
        assertTrue(run.out().contains("loop points      101 (B from"), run.out());
        assertTrue(run.out().lines().count() < 12, "a summary, not the points");
    }

    @Test
    void fields_in_other_units_give_the_same_loop() throws IOException {
        ObjectMapper mapper = new ObjectMapper();
        JsonNode si = mapper.readTree(run("--json").out());
        JsonNode cgs = mapper.readTree(CliRun.of("ja", "simulate", "--ms", "1600emu/cm³", "--a", "1.1 kA/m",
                "--k", "0.4kA/m", "--c", "0.2", "--alpha", "0.0016", "--hmax", "5000 A/m", "--json").out());
        assertEquals(si.get("hc").asDouble(), cgs.get("hc").asDouble(), 1e-9 * si.get("hc").asDouble());
        assertEquals(si.get("mMax").asDouble(), cgs.get("mMax").asDouble(), 1e-9 * si.get("mMax").asDouble());
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
        Ms without unit   | --ms     | 1.6e6    | Invalid value for option '--ms': expected a magnetization
        Hmax in tesla     | --hmax   | 5T       | Invalid value for option '--hmax': expected a field strength such as 955 kA/m or 12 kOe, got '5T' ('T' is a flux density unit)
        c above one       | --c      | 1.2      | Jiles–Atherton c = 1.2 is out of range
        negative alpha    | --alpha  | -1e-3    | Jiles–Atherton α = -0.001 is out of range
        unstable alpha    | --alpha  | 0.01     | must be below 3a = 3300.0 A/m
        zero Hmax         | --hmax   | 0A/m     | Hmax = 0.0 A/m is out of range
        c not a number    | --c      | much     | Invalid value for option '--c'
        """)
    void bad_parameters_give_exit_code_2_and_one_line(String name, String option, String value, String message) {
        List<String> args = new ArrayList<>(SOFT_IRON);
        args.set(args.indexOf(option) + 1, value);
        args.add("--json");
        CliRun run = CliRun.of(args.toArray(String[]::new));
        assertBadInput(run, message);
    }

    @Test
    void too_few_points_and_a_missing_option_are_bad_input() {
        assertBadInput(run("--points", "2"), "option --points: expected 3 to 100000 points, got 2");
        assertBadInput(CliRun.of("ja", "simulate", "--ms", "1.6MA/m"), "Missing required options");
        assertBadInput(CliRun.of("ja"), "missing subcommand; expected one of simulate");
    }

    static void assertBadInput(CliRun run, String message) {
        assertEquals(2, run.exitCode(), run.err());
        assertEquals("", run.out(), "nothing on standard output");
        assertTrue(run.err().startsWith("kneepoint: "), run.err());
        assertTrue(run.err().contains(message), run.err());
        assertEquals(1, run.err().strip().lines().count(), run.err());
        assertFalse(run.err().contains("Exception"), run.err());
    }
}
