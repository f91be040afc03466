package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class FieldCommandTest {

    private static JsonNode json(String... args) throws IOException {
        CliRun run = CliRun.of(args);
        assertEquals(0, run.exitCode(), run.err());
        return new ObjectMapper().readTree(run.out());
    }

    @Test
    void on_axis_field_of_a_cylinder_matches_the_textbook_formula() throws IOException {
        // B(z) = (Br/2)·[(z + L/2)/√(R² + (z + L/2)²) − (z − L/2)/√(R² + (z − L/2)²)] on the axis (issue 5; e.g. Derby and
        // Olbert, Am. J. Phys. 78, 229, 2010)
        JsonNode json = json("field", "cylinder", "--diameter", "10mm", "--length", "5mm", "--br", "1.3T", "--at", "0,0,6mm", "--json");
        double r = 0.005;
        double z = 0.006;
        double half = 0.0025;
        double expected = 0.65 * ((z + half) / Math.hypot(r, z + half) - (z - half) / Math.hypot(r, z - half));
        assertEquals(expected, json.get("b").get(2).asDouble(), 1e-12);
        assertEquals(0.0, json.get("b").get(0).asDouble(), 0.0);
        assertEquals(0.006, json.get("at").get(2).asDouble(), 1e-15);
    }

    @Test
    void one_unit_after_the_last_number_applies_to_all_three() throws IOException {
        JsonNode json = json("field", "block", "--width", "10mm", "--depth", "8mm", "--thickness", "4mm", "--br", "1.2T", "--at",
                "2,1,3mm", "--json");
        assertEquals(0.002, json.get("at").get(0).asDouble(), 1e-15);
        assertEquals(0.001, json.get("at").get(1).asDouble(), 1e-15);
        assertEquals(0.003, json.get("at").get(2).asDouble(), 1e-15);
        assertEquals(3, json.get("b").size());
    }

    @Test
    void a_point_on_a_cylinders_rim_gives_null_and_a_reason_never_nan() throws IOException {
        // the bug: exit 0 with "b": ["NaN", ...] on the rim, where the field of a sharp edge is infinite
        CliRun run = CliRun.of("field", "cylinder", "--diameter", "10mm", "--length", "5mm", "--br", "1.3T", "--at",
                "5,0,2.5mm", "--json");
        assertEquals(0, run.exitCode(), run.err());
        assertTrue(!run.out().contains("NaN") && !run.out().contains("Infinity"), run.out());
        JsonNode json = new ObjectMapper().readTree(run.out());
        assertTrue(json.get("b").isNull(), run.out());
        assertTrue(json.get("reason").asText().contains("rim"), run.out());
        CliRun table = CliRun.of("field", "cylinder", "--diameter", "10mm", "--length", "5mm", "--br", "1.3T", "--at",
                "5,0,-2.5mm");
        assertTrue(table.out().contains("not defined: on the rim"), table.out());
    }

    @Test
    void far_from_a_block_along_its_diagonal_the_field_is_the_dipoles() throws IOException {
        // the bug: 35 % off with the wrong sign at 10⁵ sizes. Dipole m = Br·V/μ0 along z; on the diagonal
        // u = (1, 1, 1)/√3 the dipole field is B = (μ0/4π)·m·(3(ẑ·u)u − ẑ)/r³ = Br·V/(4π·r³)·(1, 1, 0)
        double r = 1e5 * 0.01 * Math.sqrt(3);
        JsonNode json = json("field", "block", "--width", "10mm", "--depth", "10mm", "--thickness", "10mm", "--br", "1.2T",
                "--at", "1000,1000,1000m", "--json");
        double expected = 1.2 * 1e-6 / (4 * Math.PI * r * r * r);
        assertEquals(expected, json.get("b").get(0).asDouble(), 1e-9 * expected);
        assertEquals(expected, json.get("b").get(1).asDouble(), 1e-9 * expected);
        assertEquals(0.0, json.get("b").get(2).asDouble(), 1e-9 * expected);
    }

    @Test
    void ring_table_says_whether_the_point_is_inside() {
        CliRun run = CliRun.of("field", "ring", "--diameter", "20mm", "--inner-diameter", "8mm", "--length", "5mm", "--br", "1.2T",
                "--at", "0,0,0mm");
        assertEquals(0, run.exitCode(), run.err());
        assertTrue(run.out().contains("outside the magnet"), run.out());
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
        two coordinates | field cylinder --diameter 10mm --length 5mm --br 1.3T --at 1,2mm
        no unit         | field cylinder --diameter 10mm --length 5mm --br 1.3T --at 1,2,3
        text            | field cylinder --diameter 10mm --length 5mm --br 1.3T --at a,b,cmm
        br in A/m       | field cylinder --diameter 10mm --length 5mm --br 1A/m --at 1,2,3mm
        negative br     | field block --width 1mm --depth 1mm --thickness 1mm --br -1T --at 1,2,3mm
        no shape        | field
        """)
    void bad_input_gives_exit_2_one_line_and_no_output(String name, String command) {
        CliRun run = CliRun.of(command.split(" "));
        assertEquals(2, run.exitCode(), run.err());
        assertEquals("", run.out());
        assertEquals(1, run.err().strip().lines().count(), run.err());
    }
}
