package org.kneepoint.importer.csv;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.units.SusceptibilityForm;

class SusceptibilityFileReaderTest {

    @TempDir
    Path folder;

    private SusceptibilityTable read(String text) throws IOException {
        Path file = folder.resolve("chi.csv");
        Files.writeString(file, text);
        return new SusceptibilityFileReader(ReadLimits.defaults()).read(file);
    }

    private String refused(String text) {
        return assertThrows(BadInputException.class, () -> read(text)).getMessage();
    }

    @Test
    void cgs_volume_susceptibility_is_converted_to_si() throws IOException {
        // χ_SI = 4π·χ_CGS (IEEE Trans. Magn. author guide, "Units for magnetic properties", Table I).
        SusceptibilityTable table = read("# material: Invented bismuth\nT [°C]\tchi [cgs]\n20\t-1.32e-5\n");
        assertEquals(SusceptibilityForm.VOLUME, table.form());
        assertEquals(293.15, table.points().get(0)[0], 1e-12);
        assertEquals(-4 * Math.PI * 1.32e-5, table.points().get(0)[1], 1e-18);
    }

    @Test
    void mass_susceptibility_keeps_its_form_and_a_semicolon_table_its_decimal_commas() throws IOException {
        SusceptibilityTable table = read("# material: Invented salt\n# density: 2.5 g/cm³\nT [K];chi [m³/kg]\n300;1,5e-8\n");
        assertEquals(SusceptibilityForm.MASS, table.form());
        assertEquals(1.5e-8, table.points().get(0)[1], 1e-22);
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
        no material              | 'T [K],chi [SI]\n4,1e-5\n'                                     | chi.csv: no material; add a line '# material: NAME' before the header
        no chi column            | '# material: m\nT [K],H [kA/m]\n4,1\n'                         | chi.csv, line 2, column 2: a susceptibility table has a T column and a chi column, got 'H [kA/m]'
        unknown chi unit         | '# material: m\nT [K],chi [emu]\n4,1\n'                        | chi.csv, line 2, column 2: expected a susceptibility unit: SI or emu/cm³ (volume), m³/kg or cm³/g = emu/(g·Oe) (mass), m³/mol or cm³/mol = emu/(mol·Oe) (molar), got 'emu'
        two chi columns          | '# material: m\nchi [SI],chi [SI],T [K]\n1,1,4\n'              | chi.csv, line 2, column 2: a second chi column, after column 1
        zero kelvin              | '# material: m\nT [K],chi [SI]\n0,1e-5\n'                      | chi.csv, line 3, column 1 (T [K]): temperature must be above absolute zero
        5000 kelvin              | '# material: m\nT [K],chi [SI]\n5000,1e-5\n'                   | chi.csv, line 3, column 1 (T [K]): temperature 5000 K is outside what is plausible (from 1e-06 K to 4000 K; see the limits in docs/curve-file-format.md)
        chi below -1             | '# material: m\nT [K],chi [SI]\n4,1e-5\n5,-2\n'                | chi.csv, line 4, column 2 (chi [SI]): χ = -2.00000 (SI, volume) is outside what is plausible: as a volume susceptibility it must lie between −1 (perfect diamagnetism) and 1e6
        all zero                 | '# material: m\nT [K],chi [SI]\n4,0\n5,0\n'                    | chi.csv: χ is 0 at every point (all-zero data)
        molar mass of a planet   | '# material: m\n# molar-mass: 1e9 kg/mol\nT [K],chi [SI]\n4,1\n' | chi.csv, line 2: molar-mass 1e+09 kg/mol is outside what is plausible (from 0.001 kg/mol to 1000 kg/mol; see the limits in docs/curve-file-format.md)
        missing cell             | '# material: m\nT [K],chi [SI]\n4\n'                           | chi.csv, line 3: 1 cells, expected 2 (comma-separated, as in the header)
        material with NUL        | '# material: a\u0000b\nT [K],chi [SI]\n4,1\n'                  | chi.csv, line 1: material holds U+0000 (a control character) at character 2; names may not hold control or bidirectional formatting characters
        """)
    void bad_tables_are_refused_where_they_are_wrong(String name, String text, String message) {
        assertEquals(message, refused(text.replace("\\n", "\n")));
    }
}
