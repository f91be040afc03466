package org.kneepoint.importer.csv;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.kneepoint.fitter.curve.CurveKind;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.curve.Quantity;
import org.kneepoint.fitter.error.BadInputException;

class CurveFileReaderTest {

    @TempDir
    Path folder;

    private CurveFile read(String text) throws IOException {
        Path file = folder.resolve("curve.csv");
        Files.writeString(file, text, StandardCharsets.UTF_8);
        return new CurveFileReader(ReadLimits.defaults()).read(file);
    }

    private String refused(String text) {
        return assertThrows(BadInputException.class, () -> read(text)).getMessage();
    }

    @Test
    void reads_cgs_columns_into_si() throws IOException {
        CurveFile file = read("# grade: Invented N40\n# temperature: 20 °C\nH [kOe],J [kG]\n0,12.5\n-5,12.4\n-10,12.0\n");
        DemagnetizationCurve curve = file.curves().get(0);
        assertEquals("Invented N40", file.metadata().grade());
        assertEquals(293.15, curve.temperatureK(), 1e-12);
        assertEquals(CurveKind.INTRINSIC, curve.kind());
        assertEquals(-5e6 / (4 * Math.PI), curve.h()[1], 1e-9);
        assertEquals(1.24, curve.values()[1], 1e-15);
    }

    @Test
    void semicolon_and_tab_files_may_use_a_decimal_comma() throws IOException {
        CurveFile semicolon = read("H [kA/m];B [T]\n0;1,25\n-100;1,12\n-200;0,99\n");
        CurveFile tab = read("H [kA/m]\tB [T]\n0\t1.25\n-100\t1.12\n-200\t0.99\n");
        assertEquals(1.12, semicolon.curves().get(0).values()[1], 1e-15);
        assertEquals(semicolon.curves().get(0), tab.curves().get(0));
        assertEquals(Quantity.B, tab.curves().get(0).quantity());
    }

    @Test
    void a_magnetization_column_is_read_as_polarization() throws IOException {
        CurveFile file = read("H [A/m],M [kA/m]\n0,950\n-1000,949\n-2000,948\n");
        assertEquals(MU0 * 950e3, file.curves().get(0).values()[0], 1e-12);
    }

    @Test
    void a_temperature_column_splits_the_file_into_curves() throws IOException {
        CurveFile file = read("T [°C],H [kA/m],J [T]\n20,0,1.3\n20,-500,1.28\n20,-900,1.2\n100,0,1.2\n100,-500,1.15\n100,-700,0.9\n");
        assertEquals(2, file.curves().size());
        assertEquals(373.15, file.curves().get(1).temperatureK(), 1e-12);
        assertEquals(3, file.curves().get(1).size());
    }

    @Test
    void loops_keep_repeated_h_values_of_their_two_branches() throws IOException {
        CurveFile file = read("# kind: loop\nH [kA/m],J [T]\n1000,1.3\n0,1.25\n-1000,-1.3\n0,-1.25\n1000,1.3\n");
        assertEquals(CurveKind.LOOP, file.curves().get(0).kind());
        assertEquals(5, file.curves().get(0).size());
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
        empty file                 | ''                                                  | curve.csv: the file is empty; expected a header such as 'H [kOe],J [kG]' followed by rows of numbers
        comments only              | '# invented\n\n'                                    | curve.csv: the file has no header row; expected a header such as 'H [kOe],J [kG]' followed by rows of numbers
        header only                | 'H [kA/m],J [T]\n'                                  | curve.csv: the file has a header but no data rows
        NaN                        | 'H [kA/m],J [T]\n0,1.2\n-1,NaN\n'                   | curve.csv, line 3, column 2 (J [T]): expected a finite number, got 'NaN'
        infinity                   | 'H [kA/m],J [T]\n0,1.2\nInfinity,1\n'               | curve.csv, line 3, column 1 (H [kA/m]): expected a finite number, got 'Infinity'
        text in a number column    | 'H [kA/m],J [T]\n0,1.2\n-1,abc\n'                   | curve.csv, line 3, column 2 (J [T]): expected a finite number, got 'abc'
        unknown unit               | 'H [kA/m],J [kGauss]\n0,1\n'                        | curve.csv, line 1, column 2: column J: expected a flux density such as 1.2 T or 12 kG, got 'kGauss' (not a unit Kneepoint knows)
        H in tesla                 | 'H [T],J [T]\n0,1\n'                                | curve.csv, line 1, column 1: column H: expected a field strength such as 955 kA/m or 12 kOe, got 'T' (a flux density unit)
        two J columns              | 'H [kA/m],J [T],J [kG]\n0,1,10\n'                   | curve.csv, line 1, column 3: a second value column (J), after 'J [T]' in column 2; a curve file has one H column, one of B, J or M, and at most one T
        B and J columns            | 'H [kA/m],B [T],J [T]\n0,1,1\n'                     | curve.csv, line 1, column 3: a second value column (J), after 'B [T]' in column 2; a curve file has one H column, one of B, J or M, and at most one T
        no unit                    | 'H,J\n0,1\n'                                        | curve.csv, line 1, column 1: column H has no unit; write it as 'H [kA/m]'
        one column                 | 'H [kA/m]\n0\n'                                     | curve.csv, line 1: expected a header row of at least two columns separated by commas, semicolons or tabs, such as 'H [kOe],J [kG]'
        missing cell               | 'H [kA/m],J [T]\n0,1.2\n-1\n'                       | curve.csv, line 3: 1 cells, expected 2 (comma-separated, as in the header)
        conflicting duplicates     | 'H [kA/m],J [T]\n0,1.2\n-100,1.1\n-100,0.8\n'        | curve.csv, line 4: H = -100000 A/m again, with J = 0.800000 T against 1.10000 T on line 3 (conflicting duplicates)
        unknown metadata key       | '# temprature: 20 C\nH [kA/m],J [T]\n0,1\n'           | curve.csv, line 1: unknown metadata key 'temprature'; expected one of [grade, family, supplier, density, temperature, kind, source, notes]
        bad temperature            | '# temperature: 20 kA/m\nH [kA/m],J [T]\n0,1\n'       | curve.csv, line 1: expected a temperature such as 20 °C or 293.15 K, got '20 kA/m' ('kA/m' is a field strength unit)
        kind against column        | '# kind: normal\nH [kA/m],J [T]\n0,1\n'              | curve.csv: the metadata say kind: normal but the value column holds J; a normal curve has a B column
        decimal comma with commas  | 'H [kA/m],J [T]\n0,1,2\n'                           | curve.csv, line 2: 3 cells, expected 2 (comma-separated, as in the header)
        """)
    void bad_files_are_refused_with_their_place_and_what_was_expected(String name, String text, String message) {
        assertEquals(message, refused(text.replace("\\n", "\n")));
    }

    @Test
    void a_file_larger_than_the_limit_is_refused_before_reading() throws IOException {
        Path file = folder.resolve("big.csv");
        Files.writeString(file, "H [kA/m],J [T]\n" + "0,1.2\n".repeat(1000));
        var error = assertThrows(BadInputException.class, () -> new CurveFileReader(new ReadLimits(1000)).read(file));
        assertEquals("big.csv: the file is 6015 bytes, larger than the limit of 1000 bytes", error.getMessage());
    }

    @Test
    void a_file_that_is_not_utf8_is_refused() throws IOException {
        Path file = folder.resolve("latin1.csv");
        Files.write(file, new byte[] {'H', ' ', '[', 'k', 'A', '/', 'm', ']', ',', 'J', ' ', '[', 'T', ']', '\n', (byte) 0xB0, '\n'});
        var error = assertThrows(BadInputException.class, () -> new CurveFileReader(ReadLimits.defaults()).read(file));
        assertEquals("latin1.csv: the file is not UTF-8 text", error.getMessage());
    }
}
