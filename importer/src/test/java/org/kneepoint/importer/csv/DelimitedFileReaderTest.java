package org.kneepoint.importer.csv;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.units.SusceptibilityForm;

class DelimitedFileReaderTest {

    @Test
    void a_chi_column_makes_a_susceptibility_table_and_its_metadata_reach_it() {
        FileContent content = DelimitedFileReader.read("salt.csv", "# material: Invented salt\n# density: 1.8 g/cm³\n# molar-mass: 200 g/mol\n"
                + "T [K],chi [cm³/mol]\n4,0.733\n77,0.0557\n");
        SusceptibilityTable table = assertInstanceOf(SusceptibilityTable.class, content);
        assertEquals("Invented salt", table.material());
        assertEquals(1800.0, table.density(), 1e-9);
        assertEquals(SusceptibilityForm.MOLAR, table.form());
        assertEquals(2, table.points().size());
    }

    @Test
    void any_other_header_makes_a_curve_file() {
        FileContent content = DelimitedFileReader.read("n40.csv", "# grade: Invented N40\n\"H [kOe]\",\"J [kG]\"\n0,12.5\n-5,12.4\n");
        CurveFile file = assertInstanceOf(CurveFile.class, content);
        assertEquals("Invented N40", file.metadata().grade());
        assertEquals("n40.csv", content.source());
    }

    @Test
    void the_metadata_keys_are_those_of_the_kind_the_header_chose() {
        String message = assertThrows(BadInputException.class,
                () -> DelimitedFileReader.read("salt.csv", "# grade: x\nT [K];χ [SI]\n4;1e-5\n")).getMessage();
        assertEquals("salt.csv, line 1: unknown metadata key 'grade'; expected one of [material, density, molar-mass, source, notes]", message);
    }

    @Test
    void the_header_tells_the_kind_by_a_chi_or_greek_chi_cell() {
        assertTrue(DelimitedFileReader.susceptibilityHeader(new String[] {"T [K]", " Chi [SI]"}));
        assertTrue(DelimitedFileReader.susceptibilityHeader(new String[] {"χ [SI]", "T [K]"}));
        assertFalse(DelimitedFileReader.susceptibilityHeader(new String[] {"H [kA/m]", "J [T]"}));
    }
}
