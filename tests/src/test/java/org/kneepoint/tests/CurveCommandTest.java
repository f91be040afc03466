package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class CurveCommandTest {

    private static final Path EXAMPLES = Path.of("..", "examples");

    @TempDir
    Path folder;

    @Test
    void json_output_has_the_documented_keys_in_si_units() throws IOException {
        CliRun run = CliRun.of("curve", EXAMPLES.resolve("invented-sintered-ndfeb-20C.csv").toString(), "--json");
        assertEquals(0, run.exitCode(), run.err());
        assertEquals("", run.err());
        JsonNode json = new ObjectMapper().readTree(run.out());
        for (String key : List.of("br", "hcb", "hcj", "bhMax", "hAtBhMax", "bAtBhMax", "hk", "squareness", "muRec", "temperatureK")) {
            assertTrue(json.has(key), key);
        }
        assertEquals(1.28, json.get("br").asDouble(), 1e-3);
        assertEquals(293.15, json.get("temperatureK").asDouble(), 1e-9);
        assertTrue(json.get("hcj").asDouble() > 1e6, "HcJ in A/m");
    }

    @Test
    void a_curve_that_stops_early_reports_null_in_json() throws IOException {
        CliRun run = CliRun.of("curve", EXAMPLES.resolve("invented-alnico-stops-early.csv").toString(), "--json");
        JsonNode json = new ObjectMapper().readTree(run.out());
        assertTrue(json.get("hcj").isNull());
        assertTrue(json.get("squareness").isNull());
        assertTrue(json.get("hcb").isNull());
    }

    @Test
    void a_file_with_several_temperatures_gives_an_array() throws IOException {
        CliRun run = CliRun.of("curve", EXAMPLES.resolve("invented-ndfeb-three-temperatures.csv").toString(), "--json");
        JsonNode json = new ObjectMapper().readTree(run.out());
        assertEquals(3, json.size());
        assertEquals(423.15, json.get(2).get("temperatureK").asDouble(), 1e-9);
    }

    @Test
    void the_table_names_each_quantity_with_its_unit() {
        CliRun run = CliRun.of("curve", EXAMPLES.resolve("invented-hard-ferrite-20C.tsv").toString());
        assertEquals(0, run.exitCode());
        assertTrue(run.out().contains("Br                   0.4 T"), run.out());
        assertTrue(run.out().contains("HcJ                  not reached"), run.out());
        assertTrue(run.out().contains("kJ/m³"), run.out());
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
        empty file          | ''                                   | bad.csv: the file is empty
        header only         | 'H [kA/m],J [T]\n'                   | bad.csv: the file has a header but no data rows
        one point           | 'H [kA/m],J [T]\n0,1.2\n'            | bad.csv: a curve needs at least 3 points with distinct H, got 1
        NaN                 | 'H [kA/m],J [T]\n0,NaN\n'            | bad.csv, line 2, column 2 (J [T]): expected a finite number, got 'NaN'
        infinite            | 'H [kA/m],J [T]\n0,-inf\n'           | bad.csv, line 2, column 2 (J [T]): expected a finite number, got '-inf'
        text                | 'H [kA/m],J [T]\nzero,1\n'           | bad.csv, line 2, column 1 (H [kA/m]): expected a finite number, got 'zero'
        unknown unit        | 'H [kA/m],J [teslas]\n0,1\n'         | bad.csv, line 1, column 2: column J: expected a flux density
        H in tesla          | 'H [T],B [T]\n0,1\n'                 | bad.csv, line 1, column 1: column H: expected a field strength such as 955 kA/m or 12 kOe, got 'T' (a flux density unit)
        same quantity twice | 'H [kA/m],H [kOe],J [T]\n0,0,1\n'    | bad.csv, line 1, column 2: a second H column
        conflicting rows    | 'H [kA/m],J [T]\n0,1.2\n-5,1.1\n-5,0.5\n-9,1\n' | bad.csv, line 4: H = -5000.00 A/m again
        first quadrant      | 'H [kA/m],B [T]\n0,1.2\n5,1.3\n9,1.4\n' | bad.csv: the curve lies wholly in the first quadrant
        """)
    void bad_input_gives_exit_code_2_and_one_line_naming_the_place(String name, String text, String start) throws IOException {
        Path file = folder.resolve("bad.csv");
        Files.writeString(file, text.replace("\\n", "\n"));
        CliRun run = CliRun.of("curve", file.toString(), "--json");
        assertEquals(2, run.exitCode());
        assertEquals("", run.out(), "nothing on standard output");
        assertTrue(run.err().startsWith("kneepoint: " + start), run.err());
        assertEquals(1, run.err().strip().lines().count(), run.err());
        assertFalse(run.err().contains("Exception"), run.err());
    }

    @Test
    void a_file_over_the_configured_size_limit_is_refused() throws IOException {
        Path file = folder.resolve("big.csv");
        Files.writeString(file, "H [kA/m],J [T]\n0,1.2\n-1,1.1\n-2,1.0\n");
        CliRun run = CliRun.of("curve", file.toString(), "--max-file-size", "20");
        assertEquals(2, run.exitCode());
        assertEquals("kneepoint: big.csv: the file is 35 bytes, larger than the limit of 20 bytes", run.err().strip());
    }

    @Test
    void a_million_points_are_read_and_characterized() throws IOException {
        Path file = folder.resolve("million.csv");
        StringBuilder text = new StringBuilder("H [A/m],J [T]\n");
        for (int i = 0; i < 1_000_000; i++) {
            double h = 1e5 - 1.6e6 * i / 999_999.0;
            double j = h <= -1.4e6 ? 0 : (1.3 + 6.3e-8 * h) * (1 - Math.exp(-(h + 1.4e6) / 4e4));
            text.append(h).append(',').append(j).append('\n');
        }
        Files.writeString(file, text);
        CliRun run = CliRun.of("curve", file.toString(), "--json");
        assertEquals(0, run.exitCode(), run.err());
        JsonNode json = new ObjectMapper().readTree(run.out());
        assertEquals(1_000_000, json.get("points").asInt());
        assertEquals(1.4e6, json.get("hcj").asDouble(), 2.0, "within one point spacing (1.6 A/m)");
    }

    @Test
    void version_and_help_work() {
        CliRun version = CliRun.of("--version");
        assertEquals(0, version.exitCode());
        assertTrue(version.out().startsWith("kneepoint "), version.out());
        CliRun help = CliRun.of("--help");
        assertTrue(help.out().contains("curve"), help.out());
    }

    @Test
    void an_unknown_option_is_one_line_and_exit_code_2() {
        CliRun run = CliRun.of("curve", "--frobnicate");
        assertEquals(2, run.exitCode());
        assertEquals(1, run.err().strip().lines().count(), run.err());
    }
}
