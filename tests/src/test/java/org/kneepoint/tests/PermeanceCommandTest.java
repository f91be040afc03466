package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class PermeanceCommandTest {

    private static JsonNode json(String... args) throws IOException {
        CliRun run = CliRun.of(args);
        assertEquals(0, run.exitCode(), run.err());
        assertEquals("", run.err());
        return new ObjectMapper().readTree(run.out());
    }

    @Test
    void sphere_has_one_third_in_every_kind_and_pc_two() throws IOException {
        // uniformly magnetized sphere: N = 1/3 (Griffiths, Introduction to Electrodynamics, §6.1, the magnetized sphere)
        JsonNode json = json("permeance", "spheroid", "--diameter", "10mm", "--length", "10mm", "--json");
        for (String kind : new String[] {"magnetometric", "fluxmetric", "center"}) {
            assertEquals(1.0 / 3, json.get("demagnetizingFactor").get(kind).asDouble(), 1e-12);
            assertEquals(2.0, json.get("permeanceCoefficient").get(kind).asDouble(), 1e-12);
        }
    }

    @Test
    void cube_has_magnetometric_factor_one_third() throws IOException {
        // symmetry: Nx + Ny + Nz = 1 for the volume average, equal for a cube (Aharoni, J. Appl. Phys. 83, 3432, 1998)
        JsonNode json = json("permeance", "block", "--width", "7mm", "--depth", "7mm", "--thickness", "7mm", "--json");
        assertEquals(1.0 / 3, json.get("demagnetizingFactor").get("magnetometric").asDouble(), 1e-12);
    }

    @Test
    void on_steel_equals_the_doubled_magnet() throws IOException {
        // method of images in an infinitely permeable plate: the magnet and its mirror image (from memory)
        JsonNode onSteel = json("permeance", "cylinder", "--diameter", "10mm", "--length", "4mm", "--on-steel", "--json");
        JsonNode doubled = json("permeance", "cylinder", "--diameter", "10mm", "--length", "8mm", "--json");
        assertEquals(doubled, onSteel);
    }

    @Test
    void ring_and_circuit_give_the_documented_keys() throws IOException {
        JsonNode ring = json("permeance", "cylinder", "--diameter", "20mm", "--inner-diameter", "8mm", "--length", "5mm", "--json");
        assertTrue(ring.get("permeanceCoefficient").get("fluxmetric").asDouble() > 0);
        // Pc = (Lm·Ag)/(Am·Lg)·(σ/f), common practice (Parker 1990; from memory): 5·120/(100·1)·1.5 = 9
        JsonNode circuit = json("permeance", "circuit", "--magnet-length", "5mm", "--magnet-area", "100mm2", "--gap-length", "1mm",
                "--gap-area", "120mm²", "--leakage", "1.5", "--json");
        assertEquals(9.0, circuit.get("permeanceCoefficient").get("magnetometric").asDouble(), 1e-12);
    }

    @Test
    void table_names_the_three_kinds() {
        CliRun run = CliRun.of("permeance", "block", "--width", "10mm", "--depth", "5mm", "--thickness", "2mm");
        assertEquals(0, run.exitCode());
        assertTrue(run.out().contains("magnetometric Nm"), run.out());
        assertTrue(run.out().contains("centre point N0"), run.out());
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
        no unit          | permeance cylinder --diameter 10 --length 5mm
        negative length  | permeance cylinder --diameter -10mm --length 5mm
        wrong dimension  | permeance block --width 10T --depth 5mm --thickness 2mm
        bore too large   | permeance cylinder --diameter 10mm --inner-diameter 12mm --length 5mm
        circuit on steel | permeance circuit --magnet-length 5mm --magnet-area 1cm2 --gap-length 1mm --gap-area 1cm2 --on-steel
        leakage below 1  | permeance circuit --magnet-length 5mm --magnet-area 1cm2 --gap-length 1mm --gap-area 1cm2 --leakage 0.5
        area as length   | permeance circuit --magnet-length 5mm --magnet-area 1cm --gap-length 1mm --gap-area 1cm2
        no shape         | permeance
        """)
    void bad_input_gives_exit_2_one_line_and_no_output(String name, String command) {
        CliRun run = CliRun.of(command.split(" "));
        assertEquals(2, run.exitCode(), run.err());
        assertEquals("", run.out());
        assertEquals(1, run.err().strip().lines().count(), run.err());
        assertTrue(run.err().startsWith("kneepoint: "), run.err());
    }
}
