package org.kneepoint.db;

import static org.kneepoint.db.jooq.Tables.CURVE;
import static org.kneepoint.db.jooq.Tables.CURVE_PIECE;
import static org.kneepoint.db.jooq.Tables.FIT;
import static org.kneepoint.db.jooq.Tables.GRADE;
import static org.kneepoint.db.jooq.Tables.IMPORT_RECORD;
import static org.kneepoint.db.jooq.Tables.MATERIAL_FAMILY;
import static org.kneepoint.db.jooq.Tables.SUSCEPTIBILITY_POINT;

import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.util.Locale;
import org.jooq.DSLContext;
import org.jooq.Record1;
import org.kneepoint.db.jooq.tables.records.GradeRecord;
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

    /** The transaction's own context, for the other row writers of the same transaction. */
    DSLContext context() {
        return tx;
    }

    boolean libraryIsEmpty() {
        return !tx.fetchExists(GRADE) && !tx.fetchExists(IMPORT_RECORD) && !tx.fetchExists(SUSCEPTIBILITY_POINT)
                && !tx.fetchExists(FIT) && !tx.fetchExists(MATERIAL_FAMILY);
    }

    long insertImport(ImportInfo info) {
        StorageLimits.check(info);
        OffsetDateTime importedAt = info.importedAt().atOffset(ZoneOffset.UTC);
        long id = tx.insertInto(IMPORT_RECORD)
                .set(IMPORT_RECORD.FILE_NAME, info.fileName())
                .set(IMPORT_RECORD.SHA256, info.sha256())
                .set(IMPORT_RECORD.IMPORTED_AT, importedAt)
                .set(IMPORT_RECORD.CURVE_COUNT, info.curves())
                .set(IMPORT_RECORD.POINT_COUNT, info.points())
                .set(IMPORT_RECORD.SUSCEPTIBILITY_COUNT, info.susceptibilityPoints())
                .returning(IMPORT_RECORD.ID).fetchOne().getId();
        tx.update(IMPORT_RECORD).set(IMPORT_RECORD.CHECKSUM, RowChecksums.importRecord(id, info.fileName(), info.sha256(), importedAt,
                info.curves(), info.points(), info.susceptibilityPoints())).where(IMPORT_RECORD.ID.eq(id)).execute();
        return id;
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
        StorageLimits.check(grade);
        long familyId = ensureFamily(grade.family());
        long gradeId = tx.insertInto(GRADE)
                .set(GRADE.NAME, grade.name())
                .set(GRADE.FAMILY_ID, familyId)
                .set(GRADE.SUPPLIER, grade.supplier())
                .set(GRADE.DENSITY, grade.density())
                .set(GRADE.NOTES, grade.notes())
                .set(GRADE.PROVENANCE, grade.provenance())
                .set(GRADE.PRICE, grade.price())
                .set(GRADE.ROW_VERSION, 1)
                .returning(GRADE.ID).fetchOne().getId();
        tx.update(GRADE).set(GRADE.CHECKSUM, RowChecksums.grade(gradeId, grade.name(), familyId, grade.supplier(), grade.density(),
                grade.notes(), grade.provenance(), grade.price(), 1)).where(GRADE.ID.eq(gradeId)).execute();
        return gradeId;
    }

    /**
     * Replaces the grade's details when its row is still at {@code expectedVersion}, and returns the
     * new version. The version test and the update are one statement, so of two concurrent edits
     * from the same version exactly one succeeds (the database holds the row lock between them).
     */
    int editGrade(String name, int expectedVersion, GradeDetails details) {
        StorageLimits.check(details);
        GradeRecord stored = tx.selectFrom(GRADE).where(GRADE.NAME.eq(name)).forUpdate().fetchOne();
        if (stored != null && stored.getRowVersion() == expectedVersion) {
            new CheckedRows(tx, CheckedRows.refusing()).grades(GRADE.ID.eq(stored.getId()));
            int updated = tx.update(GRADE)
                    .set(GRADE.SUPPLIER, details.supplier())
                    .set(GRADE.DENSITY, details.density())
                    .set(GRADE.NOTES, details.notes())
                    .set(GRADE.PRICE, details.price())
                    .set(GRADE.ROW_VERSION, expectedVersion + 1)
                    .set(GRADE.CHECKSUM, RowChecksums.grade(stored.getId(), name, stored.getFamilyId(), details.supplier(), details.density(),
                            details.notes(), stored.getProvenance(), details.price(), expectedVersion + 1))
                    .where(GRADE.ID.eq(stored.getId())).and(GRADE.ROW_VERSION.eq(expectedVersion))
                    .execute();
            if (updated == 1) {
                return expectedVersion + 1;
            }
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
        long familyId = tx.insertInto(MATERIAL_FAMILY).set(MATERIAL_FAMILY.NAME, family).returning(MATERIAL_FAMILY.ID).fetchOne().getId();
        tx.update(MATERIAL_FAMILY).set(MATERIAL_FAMILY.CHECKSUM, RowChecksums.family(familyId, family))
                .where(MATERIAL_FAMILY.ID.eq(familyId)).execute();
        return familyId;
    }

    /**
     * Inserts a curve and its points (the first {@link PackedDoubles#PIECE} in its row, the rest in
     * pieces); a curve of the same kind at the same temperature is a conflict.
     */
    void insertCurve(long gradeId, LibraryCurve stored, Long importId) {
        StorageLimits.check(stored);
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
        byte[] hBytes = PackedDoubles.pack(h, 0, first);
        byte[] valueBytes = PackedDoubles.pack(values, 0, first);
        String pointsChecksum = RowChecksums.points(hBytes, valueBytes);
        long curveId = tx.insertInto(CURVE)
                .set(CURVE.GRADE_ID, gradeId)
                .set(CURVE.TEMPERATURE_K, curve.temperatureK())
                .set(CURVE.KIND, kind)
                .set(CURVE.QUANTITY, curve.quantity().name())
                .set(CURVE.SOURCE, stored.source())
                .set(CURVE.IMPORT_ID, importId)
                .set(CURVE.POINT_COUNT, curve.size())
                .set(CURVE.H_VALUES, hBytes)
                .set(CURVE.MEASURED_VALUES, valueBytes)
                .set(CURVE.POINTS_CHECKSUM, pointsChecksum)
                .returning(CURVE.ID).fetchOne().getId();
        tx.update(CURVE).set(CURVE.CHECKSUM, RowChecksums.curve(curveId, gradeId, curve.temperatureK(), kind, curve.quantity().name(),
                stored.source(), importId, curve.size(), pointsChecksum)).where(CURVE.ID.eq(curveId)).execute();
        if (first == h.length) {
            return;
        }
        var pieces = tx.batch(tx.insertInto(CURVE_PIECE, CURVE_PIECE.CURVE_ID, CURVE_PIECE.PIECE, CURVE_PIECE.H_VALUES,
                CURVE_PIECE.MEASURED_VALUES, CURVE_PIECE.CHECKSUM).values((Long) null, null, null, null, null));
        int piece = 1;
        for (int from = first; from < h.length; from += PackedDoubles.PIECE, piece++) {
            int to = Math.min(h.length, from + PackedDoubles.PIECE);
            byte[] pieceH = PackedDoubles.pack(h, from, to);
            byte[] pieceValues = PackedDoubles.pack(values, from, to);
            pieces.bind(curveId, piece, pieceH, pieceValues, RowChecksums.piece(curveId, piece, pieceH, pieceValues));
        }
        pieces.execute();
    }

    void insertSusceptibility(SusceptibilityPoint point, Long importId) {
        StorageLimits.check(point);
        String form = point.form().name().toLowerCase(Locale.ROOT);
        long id = tx.insertInto(SUSCEPTIBILITY_POINT)
                .set(SUSCEPTIBILITY_POINT.MATERIAL, point.material())
                .set(SUSCEPTIBILITY_POINT.TEMPERATURE_K, point.temperatureK())
                .set(SUSCEPTIBILITY_POINT.CHI, point.chi())
                .set(SUSCEPTIBILITY_POINT.FORM, form)
                .set(SUSCEPTIBILITY_POINT.DENSITY, point.density())
                .set(SUSCEPTIBILITY_POINT.MOLAR_MASS, point.molarMass())
                .set(SUSCEPTIBILITY_POINT.SOURCE, point.source())
                .set(SUSCEPTIBILITY_POINT.IMPORT_ID, importId)
                .returning(SUSCEPTIBILITY_POINT.ID).fetchOne().getId();
        tx.update(SUSCEPTIBILITY_POINT).set(SUSCEPTIBILITY_POINT.CHECKSUM, RowChecksums.susceptibility(id, point.material(),
                point.temperatureK(), point.chi(), form, point.density(), point.molarMass(), point.source(), importId))
                .where(SUSCEPTIBILITY_POINT.ID.eq(id)).execute();
    }

    void insertFit(FitRecord fit) {
        StorageLimits.check(fit);
        Long gradeId = fit.grade() == null ? null
                : tx.select(GRADE.ID).from(GRADE).where(GRADE.NAME.eq(fit.grade())).fetchOne(GRADE.ID);
        Long curveId = gradeId == null || fit.curveTemperatureK() == null ? null
                : tx.select(CURVE.ID).from(CURVE).where(CURVE.GRADE_ID.eq(gradeId)).and(CURVE.KIND.eq(fit.curveKind()))
                        .and(CURVE.TEMPERATURE_K.between(fit.curveTemperatureK() - SAME_TEMPERATURE_K, fit.curveTemperatureK() + SAME_TEMPERATURE_K))
                        .fetchOne(CURVE.ID);
        OffsetDateTime fittedAt = fit.fittedAt().atOffset(ZoneOffset.UTC);
        long id = tx.insertInto(FIT)
                .set(FIT.GRADE_ID, gradeId)
                .set(FIT.CURVE_ID, curveId)
                .set(FIT.MATERIAL, fit.material())
                .set(FIT.MODEL, fit.model())
                .set(FIT.PARAMETERS, fit.parametersJson())
                .set(FIT.RESIDUAL, fit.residual())
                .set(FIT.FITTED_AT, fittedAt)
                .set(FIT.PROGRAM_VERSION, fit.programVersion())
                .returning(FIT.ID).fetchOne().getId();
        tx.update(FIT).set(FIT.CHECKSUM, RowChecksums.fit(id, gradeId, curveId, fit.material(), fit.model(), fit.parametersJson(),
                fit.residual(), fittedAt, fit.programVersion())).where(FIT.ID.eq(id)).execute();
    }
}
