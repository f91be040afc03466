package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class DutyCommandTest {

    private static final String GRADE = "--pc 1 --br 1.3T --mu-rec 1.05 --hcj 1600kA/m --knee 1450kA/m --alpha -0.12%/K --beta -0.6%/K";

    @Test
    void loss_of_the_hot_step_stays_after_cooling() throws IOException {
        // docs/design.md §4: the worst point so far sets the recoil line
        String[] args = (GRADE + " --json").split(" ");
        String[] all = new String[args.length + 3];
        all[0] = "duty";
        System.arraycopy(args, 0, all, 1, args.length);
        all[args.length + 1] = "--steps";
        all[args.length + 2] = "20C:0, 150C:300kA/m, 20C:0";
        CliRun run = CliRun.of(all);
        assertEquals(0, run.exitCode(), run.err());
        JsonNode json = new ObjectMapper().readTree(run.out());
        JsonNode steps = json.get("steps");
        assertEquals(3, steps.size());
        assertEquals(0.0, steps.get(0).get("irreversibleLossPercent").asDouble(), 1e-6);
        double hot = steps.get(1).get("irreversibleLossPercent").asDouble();
        assertTrue(hot > 0);
        assertEquals(hot, steps.get(2).get("irreversibleLossPercent").asDouble(), 0.0);
        assertEquals(423.15, steps.get(1).get("temperatureK").asDouble(), 1e-9);
        assertEquals(3e5, steps.get(1).get("opposingField").asDouble(), 1e-9);
        assertTrue(steps.get(2).get("operatingPoint").get("b").asDouble() < steps.get(0).get("operatingPoint").get("b").asDouble());
        assertEquals(3, json.get("cautions").size());
    }

    @Test
    void table_has_one_row_per_step_and_the_cautions() {
        CliRun run = CliRun.of(("duty " + GRADE + " --steps 20C:0,100C:0").split(" "));
        assertEquals(0, run.exitCode(), run.err());
        assertTrue(run.out().contains("100 °C"), run.out());
        assertTrue(run.out().contains("Cautions:"), run.out());
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
        no field            | 20C:0,150C
        field without unit  | 20C:0,150C:300
        negative field      | 20C:-300kA/m
        temperature in A/m  | 20A/m:0
        empty step          | 20C:0,,20C:0
        below absolute zero | -300C:0
        """)
    void bad_steps_give_exit_2_one_line_and_no_output(String name, String steps) {
        CliRun run = CliRun.of(("duty " + GRADE + " --steps " + steps).split(" "));
        assertEquals(2, run.exitCode(), run.err());
        assertEquals("", run.out());
        assertEquals(1, run.err().strip().lines().count(), run.err());
    }

    @Test
    void a_step_may_give_its_field_as_an_external_field_on_a_free_magnet() throws IOException {
        // Pc 1, so N = 1/2 and an external 150 kA/m acts as a circuit field of 300 kA/m (Ha = Hext/(1 − N), docs/design.md §4)
        String[] args = (GRADE + " --json").split(" ");
        String[] external = new String[args.length + 3];
        external[0] = "duty";
        System.arraycopy(args, 0, external, 1, args.length);
        external[args.length + 1] = "--steps";
        external[args.length + 2] = "150C:150kA/m:external, 150C:300kA/m:opposing";
        CliRun run = CliRun.of(external);
        assertEquals(0, run.exitCode(), run.err());
        JsonNode steps = new ObjectMapper().readTree(run.out()).get("steps");
        assertEquals("external", steps.get(0).get("fieldConvention").asText());
        assertEquals(1.5e5, steps.get(0).get("externalFieldH").asDouble(), 1e-9);
        assertEquals(3e5, steps.get(0).get("opposingField").asDouble(), 1e-6);
        assertEquals("opposing", steps.get(1).get("fieldConvention").asText());
        assertTrue(steps.get(1).get("externalFieldH").isNull());
        assertEquals(steps.get(0).get("stepLossPercent").asDouble(), steps.get(1).get("stepLossPercent").asDouble(), 1e-9);
        external[args.length + 2] = "150C:150kA/m:sideways";
        CliRun bad = CliRun.of(external);
        assertEquals(2, bad.exitCode());
        assertTrue(bad.err().contains("step 1: the field's kind must be 'opposing' or 'external', got 'sideways'"), bad.err());
    }
}
