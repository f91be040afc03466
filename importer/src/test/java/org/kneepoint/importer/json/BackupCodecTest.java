package org.kneepoint.importer.json;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.time.Instant;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.kneepoint.fitter.curve.CurveKind;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.curve.Quantity;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.library.FitRecord;
import org.kneepoint.fitter.library.GradeInfo;
import org.kneepoint.fitter.library.ImportInfo;
import org.kneepoint.fitter.library.LibraryCurve;
import org.kneepoint.fitter.library.LibrarySnapshot;
import org.kneepoint.fitter.library.SusceptibilityPoint;
import org.kneepoint.fitter.units.SusceptibilityForm;

class BackupCodecTest {

    private static final String SHA = "a".repeat(64);

    /** A small invented library with one of everything. */
    private static LibrarySnapshot library() {
        Instant at = Instant.parse("2026-12-04T10:15:30.123Z");
        DemagnetizationCurve curve = new DemagnetizationCurve(CurveKind.INTRINSIC, Quantity.J, new double[] {0, -1e5, -2e5},
                new double[] {1.3, 1.29, 1.28}, 293.15);
        return new LibrarySnapshot(List.of(new ImportInfo("n40.csv", SHA, at, 1, 3, 1)),
                List.of(new GradeInfo("Invented N40", "sintered NdFeB", "Invented supplier", 7500.0, "two\nlines", "imported", 55.5)),
                List.of(new LibraryCurve("Invented N40", curve, "datasheet", SHA)),
                List.of(new SusceptibilityPoint("Invented salt", 4.0, 0.733e-6, SusceptibilityForm.MOLAR, 1800.0, 0.2, "table", SHA)),
                List.of(new FitRecord("Invented N40", 293.15, "intrinsic", null, "knee", "{\"br\":1.3}", 1e-3, at, "0.1.0")));
    }

    private static String refused(String text) {
        return assertThrows(BadInputException.class, () -> BackupCodec.read("b.json", text)).getMessage();
    }

    @Test
    void backup_then_restore_then_backup_gives_the_same_bytes() {
        String written = BackupCodec.write(library());
        LibrarySnapshot read = BackupCodec.read("b.json", written);
        assertEquals(written, BackupCodec.write(read));
        assertEquals(3, read.pointCount());
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
        Br of 12.8 T            | '"values" : [ 1.3, 1.29, 1.28 ]'   | '"values" : [ 12.8, 1.29, 1.28 ]'           | b.json (curves[0].values[0]): J = 12.8 T, beyond what any known material reaches (J from -3 T to 3 T at 250 K and above)
        temperature 1e308 K     | '"temperatureK" : 293.15,'         | '"temperatureK" : 1e308,'                   | b.json (curves[0].temperatureK): a curve at 1e+308 K; curves are measured from 1e-06 K to 1500 K (no material stays magnetized above the Curie temperature of cobalt)
        density 1e300           | '"density" : 7500.0,'              | '"density" : 1e300,'                        | b.json (grades[0].density): density 1e+300 kg/m³ is outside what is plausible (from 0.1 kg/m³ to 23000 kg/m³; see the limits in docs/curve-file-format.md)
        grade with NUL          | '"name" : "Invented N40",'         | '"name" : "Invented\\u0000N40",'             | b.json (grades[0].name): name holds U+0000 (a control character) at character 9; names may not hold control or bidirectional formatting characters
        material with override  | '"material" : "Invented salt",'    | '"material" : "\\u202EInvented salt",'       | b.json (susceptibility[0].material): material holds U+202E (a bidirectional formatting character) at character 1; names may not hold control or bidirectional formatting characters
        chi beyond -1           | '"chi" : 7.33E-7,'                 | '"chi" : -1.0,'                             | b.json (susceptibility[0].chi): χ = -1.00000 (SI, molar) is outside what is plausible: as a volume susceptibility it must lie between −1 (perfect diamagnetism) and 1e6
        a count that is text    | '"points" : 3,'                    | '"points" : "3",'                           | b.json (imports[0].points): expected a count (a whole number, 0 or more)
        unknown curve kind      | '"kind" : "intrinsic",'            | '"kind" : "spiral",'                        | b.json (curves[0].kind): expected one of [normal, intrinsic, loop], got 'spiral'
        """)
    void implausible_backups_are_refused_naming_the_element(String name, String original, String replacement, String message) {
        String written = BackupCodec.write(library());
        String damaged = written.replace(original, replacement);
        assertEquals(true, !damaged.equals(written), "the replacement applies: " + original);
        assertEquals(message, refused(damaged));
    }

    @Test
    void content_after_the_backup_and_numbers_too_long_are_refused() {
        String written = BackupCodec.write(library());
        assertEquals("b.json, line 56, column 1: content after the end of the JSON document; a file holds one document", refused(written + "{}"));
        assertEquals("b.json, line 23, column 5023: a number too long to be a measurement; a number has at most 40 characters",
                refused(written.replace("\"temperatureK\" : 293.15", "\"temperatureK\" : 2" + "9".repeat(5000))));
    }

    @Test
    void something_that_is_not_a_backup_is_named_as_such() {
        assertEquals("b.json: not a Kneepoint backup (expected \"format\": \"kneepoint-library-backup\", \"version\": 1 to 2)", refused("{}"));
        assertEquals("b.json, line 1, column 2: not valid JSON: Unexpected end-of-input: expected close marker for Object", refused("{"));
    }
}
