package org.kneepoint.importer.csv;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.kneepoint.fitter.error.BadInputException;

/** The physical limits as the curve-file reader applies them: each refusal names the line and column. */
class CurveFilePlausibilityTest {

    private static final String HEADER = "# grade: Invented N40\n# family: invented\n# temperature: 20 °C\n";

    private static CurveFile read(String text) {
        return CurveFileReader.read("c.csv", text);
    }

    private static String refused(String text) {
        BadInputException error = assertThrows(BadInputException.class, () -> read(text));
        assertFalse(error.getMessage().contains("\n"), "one line: " + error.getMessage());
        return error.getMessage();
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
        Br of 12.8 T                | 'H [kA/m],J [T]\n0,12.8\n-500,12.7\n'                | c.csv, line 5, column 2 (J [T]): J = 12.8 T, beyond what any known material reaches (J from -3 T to 3 T at 250 K and above)
        B of 1.3e20 T               | 'H [kA/m],B [T]\n0,1.3e20\n-500,1.2\n'               | c.csv, line 5, column 2 (B [T]): B = 1.3e+20 T at H = 0 A/m means J = 1.3e+20 T, beyond what any known material reaches (J from -3 T to 3 T at 250 K and above)
        H of 1e12 A/m               | 'H [A/m],J [T]\n0,1.2\n-1e12,1.1\n'                  | c.csv, line 6, column 1 (H [A/m]): H = -1e+12 A/m is beyond any field an instrument applies (from -1e+08 A/m to 1e+08 A/m, about 126 T)
        J rising as H falls         | 'H [kA/m],J [T]\n0,0.5\n-200,0.8\n-400,1.1\n-600,1.3\n' | c.csv, line 8, column 2 (J [T]): J rises from 0.5 T to 1.3 T as H falls from 0 A/m to -600000 A/m, more than the curve's noise allows (0.013 T); on a demagnetization curve J falls as H falls (is the sign of H reversed?)
        all-zero data               | 'H [kA/m],J [T]\n0,0\n0,0\n0,0\n'                    | c.csv: every H and every J is 0 (all-zero data)
        no magnetization            | 'H [kA/m],J [T]\n0,0\n-100,0\n-200,0\n'              | c.csv: J is 0 at every point: the data hold no magnetization
        one field only              | 'H [kA/m],J [T]\n-5,1.2\n-5,1.2\n'                   | c.csv: every point has the same H; a curve needs a range of H
        number too long             | 'H [kA/m],J [T]\n0,1.20000000000000000000000000000000000000001\n' | c.csv, line 5, column 2 (J [T]): '1.20000000000000000000000000000000000000… (43 characters)' is too long to be a measurement; a number has at most 40 characters
        """)
    void implausible_curves_are_refused_where_they_are_wrong(String name, String table, String message) {
        assertEquals(message, refused(HEADER + table.replace("\\n", "\n")));
    }

    @Test
    void a_temperature_of_1e308_kelvin_is_refused_on_its_metadata_line() {
        assertEquals("c.csv, line 1: temperature 1e+308 K is outside what is plausible (from 1e-06 K to 1500 K; see the limits in docs/curve-file-format.md)",
                refused("# temperature: 1e308 K\nH [kA/m],J [T]\n0,1.2\n-100,1.1\n"));
    }

    @Test
    void a_temperature_column_beyond_the_limit_is_refused_in_its_cell() {
        assertEquals("c.csv, line 3, column 1 (T [K]): temperature 5000 K is outside what is plausible (from 1e-06 K to 1500 K; see the limits in docs/curve-file-format.md)",
                refused("T [K],H [kA/m],J [T]\n300,0,1.2\n5000,-100,1.1\n"));
    }

    @Test
    void a_density_of_1e300_is_refused() {
        assertEquals("c.csv, line 1: density 1e+300 kg/m³ is outside what is plausible (from 0.1 kg/m³ to 23000 kg/m³; see the limits in docs/curve-file-format.md)",
                refused("# density: 1e300 kg/m³\nH [kA/m],J [T]\n0,1.2\n-100,1.1\n"));
    }

    @Test
    void grade_names_with_nul_or_a_right_to_left_override_are_refused() {
        assertEquals("c.csv, line 1: grade holds U+0000 (a control character) at character 4; names may not hold control or bidirectional formatting characters",
                refused("# grade: N40\u0000x\nH [kA/m],J [T]\n0,1.2\n-100,1.1\n"));
        assertEquals("c.csv, line 2: family holds U+202E (a bidirectional formatting character) at character 1; names may not hold control or bidirectional formatting characters",
                refused("# grade: N40\n# family: \u202Eevil\nH [kA/m],J [T]\n0,1.2\n-100,1.1\n"));
    }

    @Test
    void a_huge_header_cell_is_quoted_only_in_part() {
        String cell = "X".repeat(10_000_000);
        String message = refused(cell + ",J [T]\n0,1\n");
        assertEquals("c.csv, line 1, column 1: unknown column '" + "X".repeat(40) + "… (10000000 characters)'; expected H, B, J, M or T with a unit, such as 'J [T]'",
                message);
        assertTrue(message.length() < 200);
    }

    @Test
    void a_noisy_but_real_curve_passes_and_so_does_a_loop_with_area() {
        StringBuilder noisy = new StringBuilder("H [kA/m],J [T]\n");
        java.util.SplittableRandom random = new java.util.SplittableRandom(5);
        for (int i = 0; i <= 200; i++) {
            double h = -5.0 * i;
            noisy.append(h).append(',').append(1.3 + 0.003 * random.nextGaussian()).append('\n');
        }
        assertEquals(201, read(HEADER + noisy).curves().get(0).size());
        String loop = "# kind: loop\nH [kA/m],J [T]\n1000,1.3\n0,1.2\n-1000,-1.3\n0,-1.2\n1000,1.3\n";
        assertEquals(5, read(loop).curves().get(0).size());
    }

    @Test
    void a_loop_with_b_zero_everywhere_encloses_no_area_and_is_refused() {
        assertEquals("c.csv: the loop encloses no area (its points go and come back along one path, or B is 0 everywhere);"
                + " a hysteresis loop has a descending and an ascending branch",
                refused("# kind: loop\nH [kA/m],B [T]\n1000,0\n0,0\n-1000,0\n0,0\n1000,0\n"));
    }

    @Test
    void in_a_file_of_several_temperatures_a_whole_curve_problem_names_the_curve() {
        assertEquals("c.csv (the curve starting on line 4): J is 0 at every point: the data hold no magnetization",
                refused("T [K],H [kA/m],J [T]\n300,0,1.2\n300,-100,1.1\n400,0,0\n400,-100,0\n"));
    }
}
