package org.kneepoint.importer.export;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.curve.CurveTable;
import org.kneepoint.fitter.curve.Quantity;
import org.kneepoint.importer.csv.CurveFile;
import org.kneepoint.importer.csv.CurveFileReader;
import org.kneepoint.importer.input.InputFile;
import org.kneepoint.importer.json.CurveJsonReader;

class CurveExportWriterTest {

    private static final CurveTable TABLE = new CurveTable(new double[] {0, -1e5, -2.5e5}, new double[] {1.3, 1.29, 1.2345678901234567},
            Quantity.J, "as stored");
    private static final ExportHeader HEADER = new ExportHeader("Invented N40", "sintered NdFeB", 293.15, "intrinsic", "datasheet", null);

    @Test
    void the_csv_export_reads_back_to_the_same_doubles() {
        String csv = CurveExportWriter.csv(HEADER, TABLE, ExportUnits.SI);
        assertTrue(csv.startsWith("# grade: Invented N40\n# family: sintered NdFeB\n# temperature: 293.15 K\n# kind: intrinsic\n# source: datasheet\n"
                + "H [A/m],J [T]\n"), csv);
        CurveFile back = CurveFileReader.read("n40.csv", csv);
        assertArrayEquals(TABLE.h(), back.curves().get(0).h());
        assertArrayEquals(TABLE.values(), back.curves().get(0).values());
    }

    @Test
    void the_cgs_json_export_reads_back_within_rounding() {
        String json = CurveExportWriter.json(HEADER, TABLE, ExportUnits.CGS);
        assertTrue(json.contains("\"columns\" : [ \"H [Oe]\", \"J [G]\" ]"), json);
        CurveFile back = CurveJsonReader.read(InputFile.of("n40.json", json.getBytes(StandardCharsets.UTF_8)));
        assertArrayEquals(TABLE.h(), back.curves().get(0).h(), 1e-9);
        assertArrayEquals(TABLE.values(), back.curves().get(0).values(), 1e-15);
    }

    @Test
    void a_bare_export_is_only_numbers_and_control_characters_in_names_become_spaces() {
        assertEquals("0.0,1.3\n-100000.0,1.29\n-250000.0,1.2345678901234567\n", CurveExportWriter.bare(TABLE, ExportUnits.SI));
        ExportHeader odd = new ExportHeader("N40\nX", "f", 300, "intrinsic", null, "line\u0007bell");
        String csv = CurveExportWriter.csv(odd, TABLE, ExportUnits.SI);
        assertTrue(csv.contains("# grade: N40 X\n") && csv.contains("# notes: line bell\n"), csv);
    }

    @Test
    void the_units_of_an_export_are_si_or_cgs() {
        assertEquals("A/m", ExportUnits.SI.field().symbol());
        assertEquals("G", ExportUnits.CGS.flux().symbol());
        assertEquals(1e-4, ExportUnits.CGS.flux().toSi(1), 1e-18);
    }
}
