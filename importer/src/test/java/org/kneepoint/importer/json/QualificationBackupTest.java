package org.kneepoint.importer.json;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.time.Instant;
import java.time.LocalDate;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.curve.CurveKind;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.curve.Quantity;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.library.GradeInfo;
import org.kneepoint.fitter.library.GradeSpecification;
import org.kneepoint.fitter.library.ImportInfo;
import org.kneepoint.fitter.library.LibraryCurve;
import org.kneepoint.fitter.library.LibrarySnapshot;
import org.kneepoint.fitter.library.LotCurve;
import org.kneepoint.fitter.library.LotInfo;
import org.kneepoint.fitter.qualification.Limit;
import org.kneepoint.fitter.qualification.Specification;
import org.kneepoint.fitter.qualification.SpecifiedQuantity;

/** Specifications and lots in backups (format version 2), and backups of version 1 still read. */
class QualificationBackupTest {

    private static final String SHA = "b".repeat(64);

    private static LibrarySnapshot library() {
        DemagnetizationCurve curve = new DemagnetizationCurve(CurveKind.INTRINSIC, Quantity.J, new double[] {0, -1e5, -2e5},
                new double[] {1.3, 1.29, 1.28}, 293.15);
        return new LibrarySnapshot(List.of(new ImportInfo("lot.csv", SHA, Instant.parse("2026-12-04T10:15:30.123Z"), 1, 3, 0)),
                List.of(new GradeInfo("Invented N40", "sintered NdFeB", null, null, null, null)),
                List.of(new LibraryCurve("Invented N40", curve, "datasheet", null)), List.of(), List.of(),
                List.of(new GradeSpecification("Invented N40", new Specification(293.15, List.of(new Limit(SpecifiedQuantity.BR, 1.25, 1.3),
                        new Limit(SpecifiedQuantity.SQUARENESS, 0.9, null))), 3)),
                List.of(new LotInfo("Invented N40", "L-001", LocalDate.parse("2026-11-30"), "invented")),
                List.of(new LotCurve("Invented N40", "L-001", "s1", curve, "hysteresisgraph", SHA)));
    }

    @Test
    void specifications_and_lots_survive_backup_and_restore_to_the_byte() {
        String written = BackupCodec.write(library());
        LibrarySnapshot read = BackupCodec.read("b.json", written);
        assertEquals(library(), read);
        assertEquals(written, BackupCodec.write(read));
    }

    @Test
    void a_version_1_backup_reads_without_specifications_or_lots() {
        String written = BackupCodec.write(library()).replace("\"version\" : 2", "\"version\" : 1");
        LibrarySnapshot read = BackupCodec.read("b.json", written);
        assertEquals(List.of(), read.lots());
        assertEquals(List.of(), read.specifications());
        assertEquals(1, read.curves().size());
    }

    @Test
    void a_limit_of_an_unknown_quantity_is_refused_by_its_path() {
        String written = BackupCodec.write(library()).replace("\"quantity\" : \"squareness\"", "\"quantity\" : \"roundness\"");
        String message = assertThrows(BadInputException.class, () -> BackupCodec.read("b.json", written)).getMessage();
        assertEquals("b.json (specifications[0].limits[1].quantity): expected one of br, hcj, bhMax, hk, squareness, hcb", message);
    }
}
