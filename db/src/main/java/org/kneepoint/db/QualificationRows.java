package org.kneepoint.db;

import static org.kneepoint.db.jooq.Tables.GRADE;
import static org.kneepoint.db.jooq.Tables.LOT;
import static org.kneepoint.db.jooq.Tables.LOT_CURVE;
import static org.kneepoint.db.jooq.Tables.LOT_CURVE_PIECE;
import static org.kneepoint.db.jooq.Tables.SPECIFICATION;
import static org.kneepoint.db.jooq.Tables.SPECIFICATION_LIMIT;

import java.util.List;
import java.util.Locale;
import java.util.Objects;
import org.jooq.DSLContext;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.ConflictException;
import org.kneepoint.fitter.error.NotFoundException;
import org.kneepoint.fitter.library.GradeSpecification;
import org.kneepoint.fitter.library.LotCurve;
import org.kneepoint.fitter.library.LotInfo;
import org.kneepoint.fitter.qualification.Limit;
import org.kneepoint.fitter.qualification.Specification;

/** Writes specifications, lots and lot curves inside one transaction (its own {@link DSLContext}). */
final class QualificationRows {

    /** Two stored temperatures closer than this are the same row's temperature. */
    private static final double SAME_TEMPERATURE_K = 1e-6;

    private final DSLContext tx;

    QualificationRows(DSLContext tx) {
        this.tx = tx;
    }

    /** The grade's id, its row locked until the transaction ends; an unknown grade is not found. */
    long lockedGrade(String grade) {
        Long id = tx.select(GRADE.ID).from(GRADE).where(GRADE.NAME.eq(grade)).forUpdate().fetchOne(GRADE.ID);
        if (id == null) {
            throw new NotFoundException("no grade named '" + grade + "' in the library");
        }
        return id;
    }

    /**
     * Stores the specification at its temperature: the limits it names replace those stored, the
     * others stay. Returns what is stored now, with its new version.
     */
    GradeSpecification mergeSpecification(String grade, Specification given) {
        long gradeId = lockedGrade(grade);
        var stored = new QualificationReader(tx).specificationRow(gradeId, given.temperatureK());
        if (stored == null) {
            writeSpecification(gradeId, given, 1);
            return new GradeSpecification(grade, given, 1);
        }
        Specification merged;
        try {
            merged = stored.specification().specification().mergedWith(given);
        } catch (IllegalArgumentException e) {
            throw new BadInputException("with the limits stored for grade '" + grade + "' at " + given.temperatureK() + " K: " + e.getMessage());
        }
        tx.deleteFrom(SPECIFICATION_LIMIT).where(SPECIFICATION_LIMIT.SPECIFICATION_ID.eq(stored.id())).execute();
        int version = stored.specification().version() + 1;
        tx.update(SPECIFICATION).set(SPECIFICATION.ROW_VERSION, version).where(SPECIFICATION.ID.eq(stored.id())).execute();
        insertLimits(stored.id(), merged.limits());
        return new GradeSpecification(grade, merged, version);
    }

    void writeSpecification(long gradeId, Specification specification, int version) {
        long id = tx.insertInto(SPECIFICATION)
                .set(SPECIFICATION.GRADE_ID, gradeId)
                .set(SPECIFICATION.TEMPERATURE_K, specification.temperatureK())
                .set(SPECIFICATION.ROW_VERSION, version)
                .returning(SPECIFICATION.ID).fetchOne().getId();
        insertLimits(id, specification.limits());
    }

    private void insertLimits(long specificationId, List<Limit> limits) {
        for (Limit limit : limits) {
            tx.insertInto(SPECIFICATION_LIMIT)
                    .set(SPECIFICATION_LIMIT.SPECIFICATION_ID, specificationId)
                    .set(SPECIFICATION_LIMIT.QUANTITY, limit.quantity().key())
                    .set(SPECIFICATION_LIMIT.MINIMUM, limit.minimum())
                    .set(SPECIFICATION_LIMIT.TYPICAL, limit.typical())
                    .execute();
        }
    }

    /**
     * The lot's id, inserting it when new. A stored lot keeps its day of measurement and notes; an
     * import that names different ones is a conflict.
     */
    long ensureLot(long gradeId, LotInfo lot) {
        StorageLimits.check(lot);
        var stored = tx.select(LOT.ID, LOT.MEASURED_ON, LOT.NOTES).from(LOT).where(LOT.GRADE_ID.eq(gradeId)).and(LOT.NAME.eq(lot.name()))
                .fetchOne();
        if (stored == null) {
            return tx.insertInto(LOT)
                    .set(LOT.GRADE_ID, gradeId)
                    .set(LOT.NAME, lot.name())
                    .set(LOT.MEASURED_ON, lot.measuredOn())
                    .set(LOT.NOTES, lot.notes())
                    .returning(LOT.ID).fetchOne().getId();
        }
        if (lot.measuredOn() != null && !lot.measuredOn().equals(stored.value2())) {
            throw new ConflictException("lot '" + lot.name() + "' of grade '" + lot.grade() + "' is stored as measured on "
                    + stored.value2() + ", not " + lot.measuredOn());
        }
        if (lot.notes() != null && !Objects.equals(lot.notes(), stored.value3())) {
            throw new ConflictException("lot '" + lot.name() + "' of grade '" + lot.grade() + "' already has other notes");
        }
        return stored.value1();
    }

    /** Inserts a lot curve and its points; a curve of the same sample, kind and temperature is a conflict. */
    void insertLotCurve(long lotId, LotCurve stored, Long importId) {
        StorageLimits.check(stored);
        DemagnetizationCurve curve = stored.curve();
        String kind = curve.kind().name().toLowerCase(Locale.ROOT);
        boolean taken = tx.fetchExists(tx.selectOne().from(LOT_CURVE).where(LOT_CURVE.LOT_ID.eq(lotId))
                .and(LOT_CURVE.SAMPLE.eq(stored.sample())).and(LOT_CURVE.KIND.eq(kind))
                .and(LOT_CURVE.TEMPERATURE_K.between(curve.temperatureK() - SAME_TEMPERATURE_K, curve.temperatureK() + SAME_TEMPERATURE_K)));
        if (taken) {
            throw new ConflictException(String.format(Locale.ROOT, "lot '%s' already has a %s curve of sample '%s' at %.2f K",
                    stored.lot(), kind, stored.sample(), curve.temperatureK()));
        }
        double[] h = curve.h();
        double[] values = curve.values();
        int first = Math.min(h.length, PackedDoubles.PIECE);
        long curveId = tx.insertInto(LOT_CURVE)
                .set(LOT_CURVE.LOT_ID, lotId)
                .set(LOT_CURVE.SAMPLE, stored.sample())
                .set(LOT_CURVE.TEMPERATURE_K, curve.temperatureK())
                .set(LOT_CURVE.KIND, kind)
                .set(LOT_CURVE.QUANTITY, curve.quantity().name())
                .set(LOT_CURVE.SOURCE, stored.source())
                .set(LOT_CURVE.IMPORT_ID, importId)
                .set(LOT_CURVE.POINT_COUNT, curve.size())
                .set(LOT_CURVE.H_VALUES, PackedDoubles.pack(h, 0, first))
                .set(LOT_CURVE.MEASURED_VALUES, PackedDoubles.pack(values, 0, first))
                .returning(LOT_CURVE.ID).fetchOne().getId();
        int piece = 1;
        for (int from = first; from < h.length; from += PackedDoubles.PIECE, piece++) {
            int to = Math.min(h.length, from + PackedDoubles.PIECE);
            tx.insertInto(LOT_CURVE_PIECE)
                    .set(LOT_CURVE_PIECE.LOT_CURVE_ID, curveId)
                    .set(LOT_CURVE_PIECE.PIECE, piece)
                    .set(LOT_CURVE_PIECE.H_VALUES, PackedDoubles.pack(h, from, to))
                    .set(LOT_CURVE_PIECE.MEASURED_VALUES, PackedDoubles.pack(values, from, to))
                    .execute();
        }
    }
}
