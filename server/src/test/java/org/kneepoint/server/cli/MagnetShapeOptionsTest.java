package org.kneepoint.server.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.kneepoint.server.app.Json;
import picocli.CommandLine;
import picocli.CommandLine.Model.OptionSpec;

/**
 * The magnet's shape options are declared once ({@link MagnetShapeOptions}) and keep their names in every command that
 * takes a magnet; a command that names its shape takes that shape's sizes only, and says which option is wrong.
 */
class MagnetShapeOptionsTest {

    private static final List<String> NAMES = List.of("--diameter", "--length", "--inner-diameter", "--width", "--depth", "--thickness",
            "--on-steel", "--factor");

    private record Run(int exitCode, String out, String err) {
    }

    private static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        CommandLine commandLine = KneepointCommand.commandLine();
        commandLine.setOut(new PrintWriter(out, true));
        commandLine.setErr(new PrintWriter(err, true));
        int exitCode = commandLine.execute(args);
        return new Run(exitCode, out.toString(), err.toString());
    }

    @Test
    void every_command_that_takes_a_magnet_has_the_same_eight_options() {
        CommandLine root = KneepointCommand.commandLine();
        for (List<String> path : List.of(List.of("check"), List.of("duty"), List.of("select"), List.of("permeance", "cylinder"),
                List.of("permeance", "block"), List.of("permeance", "spheroid"), List.of("field", "cylinder"), List.of("field", "ring"),
                List.of("field", "block"))) {
            CommandLine command = root;
            for (String name : path) {
                command = command.getSubcommands().get(name);
            }
            for (String option : NAMES) {
                OptionSpec spec = command.getCommandSpec().findOption(option);
                assertTrue(spec != null, path + " has " + option);
                assertEquals(MagnetShapeOptions.class, spec.userObject() instanceof java.lang.reflect.Field field
                        ? field.getDeclaringClass() : null, path + ": " + option + " comes from the one mixin");
            }
        }
    }

    @Test
    void permeance_of_a_cylinder_with_a_bore_is_that_of_a_ring() {
        Run ring = run("permeance", "cylinder", "--diameter", "10mm", "--inner-diameter", "4mm", "--length", "5mm", "--json");
        assertEquals(0, ring.exitCode(), ring.err());
        JsonNode factors = Json.read(ring.out());
        assertTrue(factors.get("demagnetizingFactor").get("magnetometric").asDouble() > 0);
        Run table = run("permeance", "cylinder", "--diameter", "10mm", "--inner-diameter", "4mm", "--length", "5mm");
        assertTrue(table.out().startsWith("ring D = "), table.out());
    }

    @Test
    void a_size_of_another_shape_is_refused_naming_the_option() {
        Run run = run("permeance", "block", "--width", "20mm", "--depth", "10mm", "--thickness", "5mm", "--diameter", "3mm");
        assertEquals(2, run.exitCode());
        assertTrue(run.err().contains("--diameter is not a size of a block, which takes --width, --depth, --thickness"), run.err());
        assertEquals("", run.out());
    }

    @Test
    void a_missing_size_is_refused_naming_the_option() {
        Run run = run("field", "ring", "--diameter", "20mm", "--length", "5mm", "--br", "1.3T", "--at", "0,0,6mm");
        assertEquals(2, run.exitCode());
        assertTrue(run.err().contains("a ring needs --inner-diameter"), run.err());
    }

    @Test
    void the_factor_belongs_to_the_load_line_and_on_steel_not_to_a_free_magnets_field() {
        Run factor = run("permeance", "spheroid", "--diameter", "10mm", "--length", "10mm", "--factor", "fluxmetric");
        assertEquals(2, factor.exitCode());
        assertTrue(factor.err().contains("spheroid takes no --factor"), factor.err());
        Run steel = run("field", "block", "--width", "10mm", "--depth", "8mm", "--thickness", "4mm", "--br", "1.2T", "--at", "1,2,3mm",
                "--on-steel");
        assertEquals(2, steel.exitCode());
        assertTrue(steel.err().contains("--on-steel does not apply here"), steel.err());
    }

    @Test
    void the_load_line_of_a_check_takes_the_shape_and_its_factor() {
        Run run = run("check", "--width", "20mm", "--depth", "20mm", "--thickness", "3mm", "--factor", "fluxmetric", "--br", "1.3T",
                "--mu-rec", "1.05", "--hcj", "1600kA/m", "--temperature", "20C", "--json");
        assertEquals(0, run.exitCode(), run.err());
        double fluxmetric = Json.read(run.out()).get("pc").asDouble();
        Run magnetometric = run("check", "--width", "20mm", "--depth", "20mm", "--thickness", "3mm", "--br", "1.3T", "--mu-rec", "1.05",
                "--hcj", "1600kA/m", "--temperature", "20C", "--json");
        assertEquals(0, magnetometric.exitCode(), magnetometric.err());
        assertTrue(fluxmetric != Json.read(magnetometric.out()).get("pc").asDouble(), "the factor chooses Pc");
    }
}
