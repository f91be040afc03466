package org.kneepoint.db;

import static org.kneepoint.db.jooq.Tables.CURVE;
import static org.kneepoint.db.jooq.Tables.CURVE_PIECE;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.jooq.DSLContext;
import org.jooq.impl.DSL;
import org.kneepoint.db.jooq.tables.records.CurvePieceRecord;
import org.kneepoint.db.jooq.tables.records.CurveRecord;
import org.kneepoint.db.jooq.tables.records.GradeRecord;
import org.kneepoint.db.jooq.tables.records.ImportRecordRecord;
import org.kneepoint.db.jooq.tables.records.MaterialFamilyRecord;

/**
 * Checks the whole library: every row against its checksum, every curve complete (its pieces in
 * order, as many points as it says), every reference to a family, grade, curve or import record
 * stored. Collects all it finds;
 * a database file too damaged to be read at all is one line too.
 */
final class LibraryVerifier {

    private final DSLContext dsl;
    private final List<String> damaged = new ArrayList<>();
    private final Map<String, Integer> checked = new LinkedHashMap<>();

    LibraryVerifier(DSLContext dsl) {
        this.dsl = dsl;
    }

    VerifyReport run() {
        try {
            scan();
        } catch (DamagedDataException e) {
            damaged.add(e.getMessage());
        }
        return new VerifyReport(checked, damaged);
    }

    private void scan() {
        CheckedRows rows = new CheckedRows(dsl, this::damaged);
        Map<Long, MaterialFamilyRecord> families = rows.families(DSL.noCondition());
        checked.put("material_family", families.size());
        List<GradeRecord> grades = rows.grades(DSL.noCondition());
        checked.put("grade", grades.size());
        grades.forEach(grade -> rows.familyName(grade, families));
        Map<Long, ImportRecordRecord> imports = rows.imports(DSL.noCondition());
        checked.put("import_record", imports.size());
        List<CurveRecord> curves = rows.curves(DSL.noCondition());
        checked.put("curve", curves.size());
        Map<Long, List<CurvePieceRecord>> pieces = rows.pieces(curves);
        checked.put("curve_piece", pieces.values().stream().mapToInt(List::size).sum());
        for (CurveRecord curve : curves) {
            String what = rows.describe(curve);
            rows.importSha256(curve.getImportId(), imports, what);
            checkComplete(curve, pieces.getOrDefault(curve.getId(), List.of()), what);
        }
        int orphans = dsl.fetchCount(CURVE_PIECE, CURVE_PIECE.CURVE_ID.notIn(DSL.select(CURVE.ID).from(CURVE)));
        if (orphans > 0) {
            damaged(orphans + " pieces of curve points belong to no stored curve");
        }
        var points = rows.susceptibility(DSL.noCondition());
        checked.put("susceptibility_point", points.size());
        for (var point : points) {
            rows.importSha256(point.getImportId(), imports, "the susceptibility point of '" + point.getMaterial() + "'");
        }
        checked.put("fit", rows.fits().size());
        QualificationChecksums.verify(dsl, checked).forEach(this::damaged);
        RowCounts.check(dsl, this::damaged);
    }

    /** Notes damage once, however many reads come upon it (a curve is read again for the fits that name it). */
    private void damaged(String what) {
        if (!damaged.contains(what)) {
            damaged.add(what);
        }
    }

    private void checkComplete(CurveRecord curve, List<CurvePieceRecord> pieces, String what) {
        int points = curve.getHValues().length / Double.BYTES;
        if (curve.getHValues().length != curve.getMeasuredValues().length || curve.getHValues().length % Double.BYTES != 0) {
            damaged(what + " holds different numbers of H and measured values");
            return;
        }
        int expected = 1;
        for (CurvePieceRecord piece : pieces) {
            if (piece.getPiece() != expected++) {
                damaged(what + " lacks piece " + (expected - 1) + " of its points");
                return;
            }
            points += piece.getHValues().length / Double.BYTES;
        }
        if (points != curve.getPointCount()) {
            damaged(what + " holds " + points + " of its " + curve.getPointCount() + " points");
        }
    }
}
