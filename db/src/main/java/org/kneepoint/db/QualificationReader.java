package org.kneepoint.db;

import static org.kneepoint.db.jooq.Tables.GRADE;
import static org.kneepoint.db.jooq.Tables.LOT;
import static org.kneepoint.db.jooq.Tables.LOT_CURVE;
import static org.kneepoint.db.jooq.Tables.LOT_CURVE_PIECE;
import static org.kneepoint.db.jooq.Tables.IMPORT_RECORD;
import static org.kneepoint.db.jooq.Tables.SPECIFICATION;
import static org.kneepoint.db.jooq.Tables.SPECIFICATION_LIMIT;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.function.Function;
import org.jooq.Condition;
import org.jooq.DSLContext;
import org.jooq.impl.DSL;
import org.kneepoint.fitter.curve.CurveKind;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.curve.Quantity;
import org.kneepoint.fitter.library.GradeSpecification;
import org.kneepoint.fitter.library.LotCurve;
import org.kneepoint.fitter.library.LotInfo;
import org.kneepoint.fitter.qualification.Limit;
import org.kneepoint.fitter.qualification.Specification;
import org.kneepoint.fitter.qualification.SpecifiedQuantity;

/** Reads specifications, lots and lot curves into their value types, always in a fixed order. */
public final class QualificationReader {

    private static final double SAME_TEMPERATURE_K = 1e-6;

    private final DSLContext dsl;

    QualificationReader(DSLContext dsl) {
        this.dsl = dsl;
    }

    /** A stored specification with its row id. */
    record SpecificationRow(long id, GradeSpecification specification) {
    }

    /** The grade's specifications (every grade's when null), by grade and temperature. */
    public List<GradeSpecification> specifications(String grade) {
        return checked(reader -> reader.specificationRows(grade == null ? DSL.noCondition() : GRADE.NAME.eq(grade)).stream()
                .map(SpecificationRow::specification).toList());
    }

    /** Runs a read in one {@link Snapshot}, after checking the qualification tables' checksums in it. */
    private <T> T checked(Function<QualificationReader, T> read) {
        return Snapshot.read(dsl, snapshot -> {
            QualificationChecksums.check(snapshot);
            T result = read.apply(new QualificationReader(snapshot));
            RowCounts.check(snapshot);
            return result;
        });
    }

    SpecificationRow specificationRow(long gradeId, double temperatureK) {
        return specificationRows(SPECIFICATION.GRADE_ID.eq(gradeId)
                .and(SPECIFICATION.TEMPERATURE_K.between(temperatureK - SAME_TEMPERATURE_K, temperatureK + SAME_TEMPERATURE_K)))
                .stream().findFirst().orElse(null);
    }

    private List<SpecificationRow> specificationRows(Condition condition) {
        Map<Long, List<Limit>> limits = new LinkedHashMap<>();
        dsl.select(SPECIFICATION_LIMIT.SPECIFICATION_ID, SPECIFICATION_LIMIT.QUANTITY, SPECIFICATION_LIMIT.MINIMUM, SPECIFICATION_LIMIT.TYPICAL)
                .from(SPECIFICATION_LIMIT).join(SPECIFICATION).on(SPECIFICATION_LIMIT.SPECIFICATION_ID.eq(SPECIFICATION.ID))
                .join(GRADE).on(SPECIFICATION.GRADE_ID.eq(GRADE.ID)).where(condition)
                .forEach(row -> limits.computeIfAbsent(row.value1(), id -> new ArrayList<>())
                        .add(new Limit(quantity(row.value2()), row.value3(), row.value4())));
        return dsl.select(SPECIFICATION.ID, GRADE.NAME, SPECIFICATION.TEMPERATURE_K, SPECIFICATION.ROW_VERSION)
                .from(SPECIFICATION).join(GRADE).on(SPECIFICATION.GRADE_ID.eq(GRADE.ID)).where(condition)
                .orderBy(GRADE.NAME, SPECIFICATION.TEMPERATURE_K)
                .fetch(row -> new SpecificationRow(row.value1(), new GradeSpecification(row.value2(),
                        new Specification(row.value3(), limits.getOrDefault(row.value1(), List.of())), row.value4())));
    }

    private static SpecifiedQuantity quantity(String key) {
        return SpecifiedQuantity.ofKey(key).orElseThrow(() -> new IllegalStateException("a stored limit names an unknown quantity: " + key));
    }

    /** The grade's lots (every grade's when null), by grade and name. */
    public List<LotInfo> lots(String grade) {
        return checked(reader -> reader.dsl.select(GRADE.NAME, LOT.NAME, LOT.MEASURED_ON, LOT.NOTES).from(LOT).join(GRADE)
                .on(LOT.GRADE_ID.eq(GRADE.ID)).where(grade == null ? DSL.noCondition() : GRADE.NAME.eq(grade)).orderBy(GRADE.NAME, LOT.NAME)
                .fetch(row -> new LotInfo(row.value1(), row.value2(), row.value3(), row.value4())));
    }

    public Optional<LotInfo> lot(String grade, String name) {
        return lots(grade).stream().filter(lot -> lot.name().equals(name)).findFirst();
    }

    /** The names of the grades that have a lot of this name, alphabetically. */
    public List<String> gradesWithLot(String name) {
        return checked(reader -> reader.dsl.select(GRADE.NAME).from(LOT).join(GRADE).on(LOT.GRADE_ID.eq(GRADE.ID)).where(LOT.NAME.eq(name))
                .orderBy(GRADE.NAME).fetch(GRADE.NAME));
    }

    /** The curves of a lot, by sample, temperature and kind. */
    public List<LotCurve> lotCurves(String grade, String lot) {
        return checked(reader -> reader.lotCurveRows(GRADE.NAME.eq(grade).and(LOT.NAME.eq(lot))));
    }

    /** Every lot curve of the grade (of every grade when null), by lot, sample, temperature and kind. */
    public List<LotCurve> lotCurves(String grade) {
        return checked(reader -> reader.lotCurveRows(grade == null ? DSL.noCondition() : GRADE.NAME.eq(grade)));
    }

    private List<LotCurve> lotCurveRows(Condition condition) {
        Map<Long, CurvePoints> points = new LinkedHashMap<>();
        List<LotCurveRow> rows = dsl.select(LOT_CURVE.ID, GRADE.NAME, LOT.NAME, LOT_CURVE.SAMPLE, LOT_CURVE.TEMPERATURE_K, LOT_CURVE.KIND,
                        LOT_CURVE.QUANTITY, LOT_CURVE.SOURCE, IMPORT_RECORD.SHA256, LOT_CURVE.POINT_COUNT, LOT_CURVE.H_VALUES,
                        LOT_CURVE.MEASURED_VALUES)
                .from(LOT_CURVE).join(LOT).on(LOT_CURVE.LOT_ID.eq(LOT.ID)).join(GRADE).on(LOT.GRADE_ID.eq(GRADE.ID))
                .leftJoin(IMPORT_RECORD).on(LOT_CURVE.IMPORT_ID.eq(IMPORT_RECORD.ID))
                .where(condition).orderBy(GRADE.NAME, LOT.NAME, LOT_CURVE.SAMPLE, LOT_CURVE.TEMPERATURE_K, LOT_CURVE.KIND, LOT_CURVE.ID)
                .fetch(row -> {
                    CurvePoints curvePoints = new CurvePoints(row.value10());
                    curvePoints.append(row.value11(), row.value12());
                    points.put(row.value1(), curvePoints);
                    return new LotCurveRow(row.value1(), row.value2(), row.value3(), row.value4(), row.value5(),
                            CurveKind.valueOf(row.value6().toUpperCase(Locale.ROOT)), Quantity.valueOf(row.value7()), row.value8(), row.value9());
                });
        List<Long> unfinished = points.entrySet().stream().filter(entry -> !entry.getValue().complete()).map(Map.Entry::getKey).toList();
        if (!unfinished.isEmpty()) {
            dsl.select(LOT_CURVE_PIECE.LOT_CURVE_ID, LOT_CURVE_PIECE.H_VALUES, LOT_CURVE_PIECE.MEASURED_VALUES).from(LOT_CURVE_PIECE)
                    .where(LOT_CURVE_PIECE.LOT_CURVE_ID.in(unfinished)).orderBy(LOT_CURVE_PIECE.LOT_CURVE_ID, LOT_CURVE_PIECE.PIECE)
                    .forEach(piece -> points.get(piece.value1()).append(piece.value2(), piece.value3()));
        }
        return rows.stream().map(row -> row.curve(points.get(row.id()))).toList();
    }

    /** A lot curve's row without its points. */
    private record LotCurveRow(long id, String grade, String lot, String sample, double temperatureK, CurveKind kind, Quantity quantity,
            String source, String importSha256) {

        LotCurve curve(CurvePoints points) {
            if (!points.complete()) {
                throw new IllegalStateException("a stored lot curve of " + points.h.length + " points has only " + points.filled);
            }
            return new LotCurve(grade, lot, sample, new DemagnetizationCurve(kind, quantity, points.h, points.values, temperatureK), source,
                    importSha256);
        }
    }

    /** A curve's points being read: its row, then its pieces, appended in order. */
    private static final class CurvePoints {

        private final double[] h;
        private final double[] values;
        private int filled;

        CurvePoints(int count) {
            h = new double[count];
            values = new double[count];
        }

        void append(byte[] hBytes, byte[] valueBytes) {
            int end = PackedDoubles.unpackInto(hBytes, h, filled, "a stored lot curve");
            if (PackedDoubles.unpackInto(valueBytes, values, filled, "a stored lot curve") != end) {
                throw new DamagedDataException(DamagedDataException.message("a stored lot curve holds different numbers of H and measured values"));
            }
            filled = end;
        }

        boolean complete() {
            return filled == h.length;
        }
    }
}
