package org.kneepoint.importer.csv;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.kneepoint.fitter.elements.ElementField;
import org.kneepoint.fitter.elements.GivenField;
import org.kneepoint.fitter.error.BadInputException;

class ElementFileReaderTest {

    @Test
    void field_strength_table_is_read_into_si() {
        ElementFile file = ElementFileReader.read("case1.csv", """
                # source: invented solver output
                x [mm],y [mm],z [mm],Hx [kA/m],Hy [kA/m],Hz [kOe],V [mm³],T [°C]
                1,2,3,10,-20,-5,0.5,120
                -1,0,0.25,0,0,0,2,20
                """);
        ElementField field = file.field();
        assertEquals(GivenField.FIELD_STRENGTH, field.given());
        assertEquals(2, field.size());
        assertEquals(3e-3, field.position(0, 2), 1e-18);
        assertEquals(-2e4, field.field(0, 1), 1e-9);
        assertEquals(-5e3 * 1000 / (4 * Math.PI), field.field(0, 2), 1e-6);
        assertEquals(5e-10, field.volume(0), 1e-24);
        assertEquals(393.15, field.temperature(0), 1e-12);
        assertTrue(field.hasTemperatures());
        assertFalse(field.hasDirections());
        assertEquals(4, field.line(1));
        assertEquals("mm", file.positionUnit().symbol());
        assertNull(file.depth());
    }

    @Test
    void flux_density_table_with_directions_is_normalized() {
        ElementField field = ElementFileReader.read("b.tsv", "x [m]\ty [m]\tz [m]\tBx [mT]\tBy [mT]\tBz [mT]\tV [cm³]\tmx\tmy\tmz\n"
                + "0\t0\t0\t1,5\t0\t-300\t1\t0\t3\t4\n").field();
        assertEquals(GivenField.FLUX_DENSITY, field.given());
        assertEquals(1.5e-3, field.field(0, 0), 1e-15);
        assertEquals(0.6, field.direction(0, 1), 1e-15);
        assertEquals(0.8, field.direction(0, 2), 1e-15);
        assertEquals(1e-6, field.volume(0), 1e-20);
    }

    @Test
    void two_dimensional_table_takes_its_volume_from_area_and_depth() {
        ElementFile file = ElementFileReader.read("slice.csv", "# depth: 50 mm\nx [mm],y [mm],Hx [kA/m],Hy [kA/m],A [mm²]\n1,2,-100,5,0.2\n");
        ElementField field = file.field();
        assertEquals(0.2e-6 * 0.05, field.volume(0), 1e-22);
        assertEquals(0.0, field.position(0, 2), 0.0);
        assertEquals(0.0, field.field(0, 2), 0.0);
        assertEquals(0.05, file.depth(), 1e-15);
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
        unknown column        | 'x [mm],y [mm],z [mm],Hx [kA/m],Hy [kA/m],Hz [kA/m],W [mm³]\n0,0,0,0,0,0,1\n'         | e.csv, line 1, column 7: unknown column 'W'; expected x, y, z, Hx, Hy, Hz (or Bx, By, Bz), V (or A), mx, my, mz or T
        field without unit    | 'x [mm],y [mm],z [mm],Hx,Hy [kA/m],Hz [kA/m],V [mm³]\n0,0,0,0,0,0,1\n'               | e.csv, line 1, column 4: column Hx has no unit; write it as 'Hx [kA/m]'
        position in tesla     | 'x [T],y [mm],z [mm],Hx [kA/m],Hy [kA/m],Hz [kA/m],V [mm³]\n0,0,0,0,0,0,1\n'         | e.csv, line 1, column 1: column x: expected a length such as 10 mm or 0.5 in, got 'T' (a flux density unit)
        H and B both          | 'x [mm],y [mm],z [mm],Hx [kA/m],Hy [kA/m],Bz [T],V [mm³]\n0,0,0,0,0,0,1\n'           | e.csv, line 1: give the field as Hx, Hy, Hz or as Bx, By, Bz, not both
        no volume             | 'x [mm],y [mm],z [mm],Hx [kA/m],Hy [kA/m],Hz [kA/m]\n0,0,0,0,0,0\n'                  | e.csv, line 1: no volume column; expected 'V [mm³]' (or, for 2-D data, 'A [mm²]' with a line '# depth: 50 mm')
        no Hz in 3-D          | 'x [mm],y [mm],z [mm],Hx [kA/m],Hy [kA/m],V [mm³]\n0,0,0,0,0,1\n'                    | e.csv, line 1: no column Hz; see docs/element-fields.md
        area without depth    | 'x [mm],y [mm],Hx [kA/m],Hy [kA/m],A [mm²]\n0,0,0,0,1\n'                             | e.csv, line 1: an area column A needs the depth of the 2-D model: add a line '# depth: 50 mm' before the header
        not a number          | 'x [mm],y [mm],z [mm],Hx [kA/m],Hy [kA/m],Hz [kA/m],V [mm³]\n0,0,0,0,0,0,1\n0,0,0,0,x1,0,1\n' | e.csv, line 3, column 5 (Hy [kA/m]): expected a finite number, got 'x1'
        zero volume           | 'x [mm],y [mm],z [mm],Hx [kA/m],Hy [kA/m],Hz [kA/m],V [mm³]\n0,0,0,0,0,0,0\n'        | e.csv, line 2, column 7 (V [mm³]): an element's volume must be positive, got '0'
        zero direction        | 'x [mm],y [mm],z [mm],Hx [kA/m],Hy [kA/m],Hz [kA/m],V [mm³],mx,my,mz\n0,0,0,0,0,0,1,0,0,0\n' | e.csv, line 2, column 8 (mx): the magnetization direction (mx, my, mz) is zero; expected a direction such as 0, 0, 1
        implausible field     | 'x [mm],y [mm],z [mm],Hx [kA/m],Hy [kA/m],Hz [kA/m],V [mm³]\n0,0,0,0,0,1e9,1\n'       | e.csv, line 2, column 6 (Hz [kA/m]): field component 1e+12 A/m is outside what is plausible (from -1e+08 A/m to 1e+08 A/m; see the limits in docs/curve-file-format.md)
        missing cell          | 'x [mm],y [mm],z [mm],Hx [kA/m],Hy [kA/m],Hz [kA/m],V [mm³]\n0,0,0,0,0,0\n'          | e.csv, line 2: 6 cells, expected 7 (comma-separated, as in the header)
        header only           | 'x [mm],y [mm],z [mm],Hx [kA/m],Hy [kA/m],Hz [kA/m],V [mm³]\n'                       | e.csv: the file has a header but no data rows
        two x columns         | 'x [mm],X [mm],z [mm],Hx [kA/m],Hy [kA/m],Hz [kA/m],V [mm³]\n0,0,0,0,0,0,1\n'        | e.csv, line 1, column 2: a second x column, after column 1
        direction with a unit | 'x [mm],y [mm],z [mm],Hx [kA/m],Hy [kA/m],Hz [kA/m],V [mm³],mx [mm],my,mz\n0,0,0,0,0,0,1,0,0,1\n' | e.csv, line 1, column 8: column mx is a direction and has no unit, got 'mm'
        """)
    void bad_files_are_refused_in_one_line_naming_line_and_column(String name, String text, String message) {
        BadInputException e = assertThrows(BadInputException.class, () -> ElementFileReader.read("e.csv", text.replace("\\n", "\n")));
        assertEquals(message, e.getMessage());
        assertEquals(1, e.getMessage().lines().count());
    }
}
