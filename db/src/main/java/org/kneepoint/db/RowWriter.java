package org.kneepoint.db;

import static org.kneepoint.db.jooq.Tables.CURVE;
import static org.kneepoint.db.jooq.Tables.CURVE_PIECE;
import static org.kneepoint.db.jooq.Tables.FIT;
import static org.kneepoint.db.jooq.Tables.GRADE;
import static org.kneepoint.db.jooq.Tables.IMPORT_RECORD;
import static org.kneepoint.db.jooq.Tables.MATERIAL_FAMILY;
import static org.kneepoint.db.jooq.Tables.SUSCEPTIBILITY_POINT;

import java.time.ZoneOffset;
import java.util.Locale;
import org.jooq.DSLContext;
import org.jooq.Record1;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.error.ConflictException;
import org.kneepoint.fitter.error.NotFoundException;
import org.kneepoint.fitter.library.FitRecord;
import org.kneepoint.fitter.library.GradeDetails;
import org.kneepoint.fitter.library.GradeInfo;
import org.kneepoint.fitter.library.ImportInfo;
import org.kneepoint.fitter.library.LibraryCurve;
import org.kneepoint.fitter.library.SusceptibilityPoint;

/** Inserts rows inside one transaction (its own {@link DSLContext}); the callers own the transaction. */
final class RowWriter {

    /** Two curve temperatures closer than this are the same temperature. */
    private static final double SAME_TEMPERATURE_K = 1e-6;

    private final DSLContext tx;

    RowWriter(DSLContext tx) {
        this.tx = tx;
    }

    boolean libraryIsEmpty() {
        return !tx.fetchExists(GRADE) && !tx.fetchExists(IMPORT_RECORD) && !tx.fetchExists(SUSCEPTIBILITY_POINT)
                && !tx.fetchExists(FIT) && !tx.fetchExists(MATERIAL_FAMILY);
    }

    long insertImport(ImportInfo info) {
        return tx.insertInto(IMPORT_RECORD)
                .set(IMPORT_RECORD.FILE_NAME, info.fileName())
                .set(IMPORT_RECORD.SHA256, info.sha256())
                .set(IMPORT_RECORD.IMPORTED_AT, info.importedAt().atOffset(ZoneOffset.UTC))
                .set(IMPORT_RECORD.CURVE_COUNT, info.curves())
                .set(IMPORT_RECORD.POINT_COUNT, info.points())
                .set(IMPORT_RECORD.SUSCEPTIBILITY_COUNT, info.susceptibilityPoints())
                .returning(IMPORT_RECORD.ID).fetchOne().getId();
    }

    Long importId(String sha256) {
        return sha256 == null ? null
                : tx.select(IMPORT_RECORD.ID).from(IMPORT_RECORD).where(IMPORT_RECORD.SHA256.eq(sha256)).fetchOne(IMPORT_RECORD.ID);
    }

    /**
     * The id of the grade, inserting it (and its family) when new; a stored grade of another family
     * is a conflict. A stored grade's row is locked until the transaction ends, so that writers in
     * other processes add curves to one grade one after the other and each sees the other's curves.
     */
    long ensureGrade(GradeInfo grade) {
        Long id = tx.select(GRADE.ID).from(GRADE).where(GRADE.NAME.eq(grade.name())).forUpdate().fetchOne(GRADE.ID);
        if (id != null) {
            String family = tx.select(MATERIAL_FAMILY.NAME).from(MATERIAL_FAMILY).join(GRADE).on(GRADE.FAMILY_ID.eq(MATERIAL_FAMILY.ID))
                    .where(GRADE.ID.eq(id)).fetchOne(MATERIAL_FAMILY.NAME);
            if (!grade.family().equals(family)) {
                throw new ConflictException("grade '" + grade.name() + "' is stored as family '" + family
                        + "', not '" + grade.family() + "'");
            }
            return id;
        }
        return tx.insertInto(GRADE)
                .set(GRADE.NAME, grade.name())
                .set(GRADE.FAMILY_ID, ensureFamily(grade.family()))
                .set(GRADE.SUPPLIER, grade.supplier())
                .set(GRADE.DENSITY, grade.density())
                .set(GRADE.NOTES, grade.notes())
                .set(GRADE.PROVENANCE, grade.provenance())
                .set(GRADE.PRICE, grade.price())
                .returning(GRADE.ID).fetchOne().getId();
    }

    /**
     * Replaces the grade's details when its row is still at {@code expectedVersion}, and returns the
     * new version. The version test and the update are one statement, so of two concurrent edits
     * from the same version exactly one succeeds (the database holds the row lock between them).
     */
    int editGrade(String name, int expectedVersion, GradeDetails details) {
        int updated = tx.update(GRADE)
                .set(GRADE.SUPPLIER, details.supplier())
                .set(GRADE.DENSITY, details.density())
                .set(GRADE.NOTES, details.notes())
                .set(GRADE.PRICE, details.price())
                .set(GRADE.ROW_VERSION, GRADE.ROW_VERSION.plus(1))
                .where(GRADE.NAME.eq(name)).and(GRADE.ROW_VERSION.eq(expectedVersion))
                .execute();
        if (updated == 1) {
            return expectedVersion + 1;
        }
        Integer version = tx.select(GRADE.ROW_VERSION).from(GRADE).where(GRADE.NAME.eq(name)).fetchOne(GRADE.ROW_VERSION);
        if (version == null) {
            throw new NotFoundException("no grade named '" + name + "' in the library");
        }
        throw new ConflictException("grade '" + name + "' was changed by someone else since version " + expectedVersion
                + " (it is now at version " + version + "); read it again and redo the edit");
    }

    private long ensureFamily(String family) {
        Record1<Long> id = tx.select(MATERIAL_FAMILY.ID).from(MATERIAL_FAMILY).where(MATERIAL_FAMILY.NAME.eq(family)).fetchOne();
        if (id != null) {
            return id.value1();
        }
        return tx.insertInto(MATERIAL_FAMILY).set(MATERIAL_FAMILY.NAME, family).returning(MATERIAL_FAMILY.ID).fetchOne().getId();
    }

    /**
     * Inserts a curve and its points (the first {@link PackedDoubles#PIECE} in its row, the rest in
     * pieces); a curve of the same kind at the same temperature is a conflict.
     */
    void insertCurve(long gradeId, LibraryCurve stored, Long importId) {
        DemagnetizationCurve curve = stored.curve();
        String kind = curve.kind().name().toLowerCase(Locale.ROOT);
        boolean taken = tx.fetchExists(tx.selectOne().from(CURVE).where(CURVE.GRADE_ID.eq(gradeId))
                .and(CURVE.KIND.eq(kind))
                .and(CURVE.TEMPERATURE_K.between(curve.temperatureK() - SAME_TEMPERATURE_K, curve.temperatureK() + SAME_TEMPERATURE_K)));
        if (taken) {
            throw new ConflictException(String.format(Locale.ROOT, "grade '%s' already has a %s curve at %.2f K",
                    stored.grade(), kind, curve.temperatureK()));
        }
        double[] h = curve.h();
        double[] values = curve.values();
        int first = Math.min(h.length, PackedDoubles.PIECE);
        long curveId = tx.insertInto(CURVE)
                .set(CURVE.GRADE_ID, gradeId)
                .set(CURVE.TEMPERATURE_K, curve.temperatureK())
                .set(CURVE.KIND, kind)
                .set(CURVE.QUANTITY, curve.quantity().name())
                .set(CURVE.SOURCE, stored.source())
                .set(CURVE.IMPORT_ID, importId)
                .set(CURVE.POINT_COUNT, curve.size())
                .set(CURVE.H_VALUES, PackedDoubles.pack(h, 0, first))
                .set(CURVE.MEASURED_VALUES, PackedDoubles.pack(values, 0, first))
                .returning(CURVE.ID).fetchOne().getId();
        if (first == h.length) {
            return;
        }
        var pieces = tx.batch(tx.insertInto(CURVE_PIECE, CURVE_PIECE.CURVE_ID, CURVE_PIECE.PIECE, CURVE_PIECE.H_VALUES,
                CURVE_PIECE.MEASURED_VALUES).values((Long) null, null, null, null));
        int piece = 1;
        for (int from = first; from < h.length; from += PackedDoubles.PIECE, piece++) {
            int to = Math.min(h.length, from + PackedDoubles.PIECE);
            pieces.bind(curveId, piece, PackedDoubles.pack(h, from, to), PackedDoubles.pack(values, from, to));
        }
        pieces.execute();
    }

    void insertSusceptibility(SusceptibilityPoint point, Long importId) {
        tx.insertInto(SUSCEPTIBILITY_POINT)
                .set(SUSCEPTIBILITY_POINT.MATERIAL, point.material())
                .set(SUSCEPTIBILITY_POINT.TEMPERATURE_K, point.temperatureK())
                .set(SUSCEPTIBILITY_POINT.CHI, point.chi())
                .set(SUSCEPTIBILITY_POINT.FORM, point.form().name().toLowerCase(Locale.ROOT))
                .set(SUSCEPTIBILITY_POINT.DENSITY, point.density())
                .set(SUSCEPTIBILITY_POINT.MOLAR_MASS, point.molarMass())
                .set(SUSCEPTIBILITY_POINT.SOURCE, point.source())
                .set(SUSCEPTIBILITY_POINT.IMPORT_ID, importId)
                .execute();
    }

    void insertFit(FitRecord fit) {
        Long gradeId = fit.grade() == null ? null
                : tx.select(GRADE.ID).from(GRADE).where(GRADE.NAME.eq(fit.grade())).fetchOne(GRADE.ID);
        Long curveId = gradeId == null || fit.curveTemperatureK() == null ? null
                : tx.select(CURVE.ID).from(CURVE).where(CURVE.GRADE_ID.eq(gradeId)).and(CURVE.KIND.eq(fit.curveKind()))
                        .and(CURVE.TEMPERATURE_K.between(fit.curveTemperatureK() - SAME_TEMPERATURE_K, fit.curveTemperatureK() + SAME_TEMPERATURE_K))
                        .fetchOne(CURVE.ID);
        tx.insertInto(FIT)
                .set(FIT.GRADE_ID, gradeId)
                .set(FIT.CURVE_ID, curveId)
                .set(FIT.MATERIAL, fit.material())
                .set(FIT.MODEL, fit.model())
                .set(FIT.PARAMETERS, fit.parametersJson())
                .set(FIT.RESIDUAL, fit.residual())
                .set(FIT.FITTED_AT, fit.fittedAt().atOffset(ZoneOffset.UTC))
                .set(FIT.PROGRAM_VERSION, fit.programVersion())
                .execute();
    }
}
