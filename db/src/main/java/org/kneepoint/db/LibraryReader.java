package org.kneepoint.db;

import static org.kneepoint.db.jooq.Tables.CURVE;
import static org.kneepoint.db.jooq.Tables.CURVE_PIECE;
import static org.kneepoint.db.jooq.Tables.FIT;
import static org.kneepoint.db.jooq.Tables.GRADE;
import static org.kneepoint.db.jooq.Tables.IMPORT_RECORD;
import static org.kneepoint.db.jooq.Tables.MATERIAL_FAMILY;
import static org.kneepoint.db.jooq.Tables.SUSCEPTIBILITY_POINT;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import org.jooq.Condition;
import org.jooq.DSLContext;
import org.jooq.Record;
import org.jooq.Table;
import org.jooq.impl.DSL;
import org.kneepoint.fitter.curve.CurveKind;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.curve.Quantity;
import org.kneepoint.fitter.library.FitRecord;
import org.kneepoint.fitter.library.GradeInfo;
import org.kneepoint.fitter.library.GradeSummary;
import org.kneepoint.fitter.library.ImportInfo;
import org.kneepoint.fitter.library.LibraryCurve;
import org.kneepoint.fitter.library.LibrarySnapshot;
import org.kneepoint.fitter.library.StoredGrade;
import org.kneepoint.fitter.library.SusceptibilityPoint;
import org.kneepoint.fitter.units.SusceptibilityForm;

/** Reads the library into its value types, always in a fixed order. */
public final class LibraryReader {

    private final DSLContext dsl;

    LibraryReader(DSLContext dsl) {
        this.dsl = dsl;
    }

    /** Every grade (of one family, when given), by name, with the temperatures of its curves. */
    public List<GradeSummary> grades(String family) {
        Condition filter = family == null ? DSL.noCondition() : MATERIAL_FAMILY.NAME.eq(family);
        Map<Long, List<Double>> temperatures = new LinkedHashMap<>();
        Map<Long, Integer> curveCounts = new LinkedHashMap<>();
        dsl.select(CURVE.GRADE_ID, CURVE.TEMPERATURE_K).from(CURVE).orderBy(CURVE.GRADE_ID, CURVE.TEMPERATURE_K)
                .forEach(row -> {
                    List<Double> list = temperatures.computeIfAbsent(row.value1(), id -> new ArrayList<>());
                    if (list.isEmpty() || !list.get(list.size() - 1).equals(row.value2())) {
                        list.add(row.value2());
                    }
                    curveCounts.merge(row.value1(), 1, Integer::sum);
                });
        List<GradeSummary> grades = new ArrayList<>();
        dsl.select(GRADE.ID, GRADE.NAME, MATERIAL_FAMILY.NAME, GRADE.SUPPLIER, GRADE.PRICE).from(GRADE)
                .join(MATERIAL_FAMILY).on(GRADE.FAMILY_ID.eq(MATERIAL_FAMILY.ID))
                .where(filter).orderBy(GRADE.NAME)
                .forEach(row -> grades.add(new GradeSummary(row.value2(), row.value3(), row.value4(),
                        temperatures.getOrDefault(row.value1(), List.of()), curveCounts.getOrDefault(row.value1(), 0), row.value5())));
        return grades;
    }

    /** The names of the families, alphabetically. */
    public List<String> families() {
        return dsl.select(MATERIAL_FAMILY.NAME).from(MATERIAL_FAMILY).orderBy(MATERIAL_FAMILY.NAME).fetch(MATERIAL_FAMILY.NAME);
    }

    public Optional<GradeInfo> grade(String name) {
        return storedGrade(name).map(StoredGrade::grade);
    }

    /** The grade with the row version an edit of it must name. */
    public Optional<StoredGrade> storedGrade(String name) {
        return gradeRows(GRADE.NAME.eq(name)).stream().findFirst();
    }

    private List<StoredGrade> gradeRows(Condition condition) {
        return dsl.select(GRADE.NAME, MATERIAL_FAMILY.NAME, GRADE.SUPPLIER, GRADE.DENSITY, GRADE.NOTES, GRADE.PROVENANCE,
                        GRADE.PRICE, GRADE.ROW_VERSION)
                .from(GRADE).join(MATERIAL_FAMILY).on(GRADE.FAMILY_ID.eq(MATERIAL_FAMILY.ID))
                .where(condition).orderBy(GRADE.NAME)
                .fetch(row -> new StoredGrade(new GradeInfo(row.value1(), row.value2(), row.value3(), row.value4(), row.value5(),
                        row.value6(), row.value7()), row.value8()));
    }

    /** The curves of a grade, by temperature and kind, with their points in stored order. */
    public List<LibraryCurve> curves(String grade) {
        return curveRows(GRADE.NAME.eq(grade));
    }

    private List<LibraryCurve> curveRows(Condition condition) {
        List<CurveRow> rows = dsl.select(GRADE.NAME, CURVE.TEMPERATURE_K, CURVE.KIND, CURVE.QUANTITY, CURVE.SOURCE, CURVE.POINT_COUNT,
                        CURVE.H_VALUES, CURVE.MEASURED_VALUES, IMPORT_RECORD.SHA256, CURVE.ID)
                .from(CURVE).join(GRADE).on(CURVE.GRADE_ID.eq(GRADE.ID))
                .leftJoin(IMPORT_RECORD).on(CURVE.IMPORT_ID.eq(IMPORT_RECORD.ID))
                .where(condition).orderBy(GRADE.NAME, CURVE.TEMPERATURE_K, CURVE.KIND, CURVE.ID)
                .fetch(row -> {
                    CurveRow curve = new CurveRow(row.value10(), row.value1(), row.value2(),
                            CurveKind.valueOf(row.value3().toUpperCase(Locale.ROOT)), Quantity.valueOf(row.value4()), row.value5(),
                            row.value9(), row.value6());
                    curve.append(row.value7(), row.value8());
                    return curve;
                });
        Map<Long, CurveRow> unfinished = new LinkedHashMap<>();
        rows.stream().filter(row -> !row.complete()).forEach(row -> unfinished.put(row.id(), row));
        if (!unfinished.isEmpty()) {
            dsl.select(CURVE_PIECE.CURVE_ID, CURVE_PIECE.H_VALUES, CURVE_PIECE.MEASURED_VALUES).from(CURVE_PIECE)
                    .where(CURVE_PIECE.CURVE_ID.in(unfinished.keySet())).orderBy(CURVE_PIECE.CURVE_ID, CURVE_PIECE.PIECE)
                    .forEach(piece -> unfinished.get(piece.value1()).append(piece.value2(), piece.value3()));
        }
        return rows.stream().map(CurveRow::curve).toList();
    }

    /** A curve being read: its row, then its pieces, appended in order until all points are there. */
    private static final class CurveRow {

        private final long id;
        private final String grade;
        private final double temperatureK;
        private final CurveKind kind;
        private final Quantity quantity;
        private final String source;
        private final String importSha256;
        private final double[] h;
        private final double[] values;
        private int filled;

        CurveRow(long id, String grade, double temperatureK, CurveKind kind, Quantity quantity, String source, String importSha256,
                int points) {
            this.id = id;
            this.grade = grade;
            this.temperatureK = temperatureK;
            this.kind = kind;
            this.quantity = quantity;
            this.source = source;
            this.importSha256 = importSha256;
            this.h = new double[points];
            this.values = new double[points];
        }

        long id() {
            return id;
        }

        void append(byte[] hBytes, byte[] valueBytes) {
            int end = PackedDoubles.unpackInto(hBytes, h, filled);
            if (PackedDoubles.unpackInto(valueBytes, values, filled) != end) {
                throw new IllegalStateException("a stored curve holds different numbers of H and measured values");
            }
            filled = end;
        }

        boolean complete() {
            return filled == h.length;
        }

        LibraryCurve curve() {
            if (!complete()) {
                throw new IllegalStateException("a stored curve of " + h.length + " points has only " + filled);
            }
            return new LibraryCurve(grade, new DemagnetizationCurve(kind, quantity, h, values, temperatureK), source, importSha256);
        }
    }

    public Optional<ImportInfo> importWithChecksum(String sha256) {
        return imports(IMPORT_RECORD.SHA256.eq(sha256)).stream().findFirst();
    }

    private List<ImportInfo> imports(Condition condition) {
        return dsl.selectFrom(IMPORT_RECORD).where(condition).orderBy(IMPORT_RECORD.IMPORTED_AT, IMPORT_RECORD.SHA256)
                .fetch(row -> new ImportInfo(row.getFileName(), row.getSha256(), row.getImportedAt().toInstant(),
                        row.getCurveCount(), row.getPointCount(), row.getSusceptibilityCount()));
    }

    /** Susceptibility points of one material (or all when null), by material and temperature. */
    public List<SusceptibilityPoint> susceptibility(String material) {
        Condition condition = material == null ? DSL.noCondition() : SUSCEPTIBILITY_POINT.MATERIAL.eq(material);
        return dsl.select(SUSCEPTIBILITY_POINT.asterisk(), IMPORT_RECORD.SHA256).from(SUSCEPTIBILITY_POINT)
                .leftJoin(IMPORT_RECORD).on(SUSCEPTIBILITY_POINT.IMPORT_ID.eq(IMPORT_RECORD.ID))
                .where(condition)
                .orderBy(SUSCEPTIBILITY_POINT.MATERIAL, SUSCEPTIBILITY_POINT.TEMPERATURE_K, SUSCEPTIBILITY_POINT.ID)
                .fetch(row -> new SusceptibilityPoint(row.get(SUSCEPTIBILITY_POINT.MATERIAL), row.get(SUSCEPTIBILITY_POINT.TEMPERATURE_K),
                        row.get(SUSCEPTIBILITY_POINT.CHI), SusceptibilityForm.valueOf(row.get(SUSCEPTIBILITY_POINT.FORM).toUpperCase(Locale.ROOT)),
                        row.get(SUSCEPTIBILITY_POINT.DENSITY), row.get(SUSCEPTIBILITY_POINT.MOLAR_MASS),
                        row.get(SUSCEPTIBILITY_POINT.SOURCE), row.get(IMPORT_RECORD.SHA256)));
    }

    /** Fits, by time. */
    public List<FitRecord> fits() {
        return dsl.select(GRADE.NAME, CURVE.TEMPERATURE_K, CURVE.KIND, FIT.MATERIAL, FIT.MODEL, FIT.PARAMETERS, FIT.RESIDUAL,
                        FIT.FITTED_AT, FIT.PROGRAM_VERSION)
                .from(FIT).leftJoin(GRADE).on(FIT.GRADE_ID.eq(GRADE.ID)).leftJoin(CURVE).on(FIT.CURVE_ID.eq(CURVE.ID))
                .orderBy(FIT.FITTED_AT, FIT.ID)
                .fetch(row -> new FitRecord(row.value1(), row.value2(), row.value3(), row.value4(), row.value5(), row.value6(),
                        row.value7(), row.value8().toInstant(), row.value9()));
    }

    /** Everything, in the fixed order of {@link LibrarySnapshot}. */
    public LibrarySnapshot snapshot() {
        return new LibrarySnapshot(imports(DSL.noCondition()), gradeRows(DSL.noCondition()).stream().map(StoredGrade::grade).toList(),
                curveRows(DSL.noCondition()),
                susceptibility(null), fits());
    }

    public boolean isEmpty() {
        return rowCounts().values().stream().allMatch(count -> count == 0);
    }

    /** Row count of every table, for checks that a failed write left nothing behind. */
    public Map<String, Integer> rowCounts() {
        Map<String, Integer> counts = new LinkedHashMap<>();
        for (Table<? extends Record> table : List.of(IMPORT_RECORD, MATERIAL_FAMILY, GRADE, CURVE, CURVE_PIECE, SUSCEPTIBILITY_POINT, FIT)) {
            counts.put(table.getName(), dsl.fetchCount(table));
        }
        return counts;
    }
}
