package org.kneepoint.db;

import static org.kneepoint.db.jooq.Tables.CURVE;
import static org.kneepoint.db.jooq.Tables.CURVE_PIECE;
import static org.kneepoint.db.jooq.Tables.FIT;
import static org.kneepoint.db.jooq.Tables.GRADE;
import static org.kneepoint.db.jooq.Tables.IMPORT_RECORD;
import static org.kneepoint.db.jooq.Tables.LOT;
import static org.kneepoint.db.jooq.Tables.LOT_CURVE;
import static org.kneepoint.db.jooq.Tables.LOT_CURVE_PIECE;
import static org.kneepoint.db.jooq.Tables.MATERIAL_FAMILY;
import static org.kneepoint.db.jooq.Tables.SPECIFICATION;
import static org.kneepoint.db.jooq.Tables.SPECIFICATION_LIMIT;
import static org.kneepoint.db.jooq.Tables.SUSCEPTIBILITY_POINT;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.function.Function;
import org.jooq.Condition;
import org.jooq.DSLContext;
import org.jooq.Record;
import org.jooq.Table;
import org.jooq.impl.DSL;
import org.kneepoint.db.jooq.tables.records.CurvePieceRecord;
import org.kneepoint.db.jooq.tables.records.CurveRecord;
import org.kneepoint.db.jooq.tables.records.GradeRecord;
import org.kneepoint.db.jooq.tables.records.ImportRecordRecord;
import org.kneepoint.db.jooq.tables.records.MaterialFamilyRecord;
import org.kneepoint.db.jooq.tables.records.SusceptibilityPointRecord;
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

/**
 * Reads the library into its value types, always in a fixed order. Every row is checked against
 * its checksum as it is read ({@link CheckedRows}): damaged stored data are a
 * {@link DamagedDataException} naming the grade and curve, never a wrong number.
 */
public final class LibraryReader {

    private final DSLContext pool;

    LibraryReader(DSLContext pool) {
        this.pool = pool;
    }

    /** Runs a read of several statements in one {@link Snapshot}, over checked rows and checked {@link RowCounts}. */
    private <T> T read(Function<CheckedRows, T> read) {
        return Snapshot.read(pool, dsl -> {
            T result = read.apply(new CheckedRows(dsl, CheckedRows.refusing()));
            RowCounts.check(dsl);
            return result;
        });
    }

    /** Every grade (of one family, when given), by name, with the temperatures of its curves. */
    public List<GradeSummary> grades(String family) {
        return read(rows -> grades(rows, family));
    }

    private static List<GradeSummary> grades(CheckedRows rows, String family) {
        Map<Long, MaterialFamilyRecord> families = rows.families(DSL.noCondition());
        Condition filter = family == null ? DSL.noCondition()
                : GRADE.FAMILY_ID.in(families.values().stream().filter(f -> f.getName().equals(family)).map(MaterialFamilyRecord::getId).toList());
        Map<Long, List<Double>> temperatures = new LinkedHashMap<>();
        Map<Long, Integer> curveCounts = new LinkedHashMap<>();
        List<GradeRecord> grades = rows.grades(filter);
        for (CurveRecord curve : rows.curveHeads(DSL.noCondition())) {
            List<Double> list = temperatures.computeIfAbsent(curve.getGradeId(), id -> new ArrayList<>());
            if (list.isEmpty() || !list.get(list.size() - 1).equals(curve.getTemperatureK())) {
                list.add(curve.getTemperatureK());
            }
            curveCounts.merge(curve.getGradeId(), 1, Integer::sum);
        }
        return grades.stream().map(grade -> new GradeSummary(grade.getName(), rows.familyName(grade, families), grade.getSupplier(),
                temperatures.getOrDefault(grade.getId(), List.of()), curveCounts.getOrDefault(grade.getId(), 0), grade.getPrice())).toList();
    }

    /** The stamp of every grade, by name: one query, without the curves' points. */
    public Map<String, GradeStamp> gradeStamps() {
        return stamps(DSL.noCondition());
    }

    /** The stamp of one grade (empty when there is no such grade). */
    public Optional<GradeStamp> gradeStamp(String name) {
        return Optional.ofNullable(stamps(GRADE.NAME.eq(name)).get(name));
    }

    private Map<String, GradeStamp> stamps(Condition condition) {
        Map<String, GradeStamp> stamps = new HashMap<>();
        pool.select(GRADE.NAME, GRADE.ID, GRADE.ROW_VERSION, DSL.count(CURVE.ID), DSL.max(CURVE.ID))
                .from(GRADE).leftJoin(CURVE).on(CURVE.GRADE_ID.eq(GRADE.ID)).where(condition)
                .groupBy(GRADE.NAME, GRADE.ID, GRADE.ROW_VERSION)
                .forEach(row -> stamps.put(row.value1(), new GradeStamp(row.value2(), row.value3(), row.value4(),
                        row.value5() == null ? 0 : row.value5())));
        return stamps;
    }

    /** The names of the families, alphabetically. */
    public List<String> families() {
        return read(rows -> rows.families(DSL.noCondition())).values().stream().map(MaterialFamilyRecord::getName).toList();
    }

    public Optional<GradeInfo> grade(String name) {
        return storedGrade(name).map(StoredGrade::grade);
    }

    /** The grade with the row version an edit of it must name. */
    public Optional<StoredGrade> storedGrade(String name) {
        return read(rows -> gradeRows(rows, GRADE.NAME.eq(name))).stream().findFirst();
    }

    private static List<StoredGrade> gradeRows(CheckedRows rows, Condition condition) {
        List<GradeRecord> grades = rows.grades(condition);
        Map<Long, MaterialFamilyRecord> families = rows.families(MATERIAL_FAMILY.ID.in(grades.stream().map(GradeRecord::getFamilyId).toList()));
        return grades.stream().map(row -> new StoredGrade(new GradeInfo(row.getName(), rows.familyName(row, families), row.getSupplier(),
                row.getDensity(), row.getNotes(), row.getProvenance(), row.getPrice()), row.getRowVersion())).toList();
    }

    /** The curves of a grade, by temperature and kind, with their points in stored order. */
    public List<LibraryCurve> curves(String grade) {
        return read(rows -> {
            List<GradeRecord> found = rows.grades(GRADE.NAME.eq(grade));
            return found.isEmpty() ? List.<LibraryCurve>of() : curveRows(rows, CURVE.GRADE_ID.eq(found.get(0).getId()));
        });
    }

    private static List<LibraryCurve> curveRows(CheckedRows rows, Condition condition) {
        List<CurveRecord> curves = rows.curves(condition);
        Map<Long, ImportRecordRecord> imports = rows.imports(IMPORT_RECORD.ID.in(curves.stream().map(CurveRecord::getImportId)
                .filter(java.util.Objects::nonNull).distinct().toList()));
        List<CurveRecord> unfinished = curves.stream().filter(curve -> curve.getHValues().length / Double.BYTES < curve.getPointCount()).toList();
        Map<Long, List<CurvePieceRecord>> pieces = rows.pieces(unfinished);
        List<LibraryCurve> read = new ArrayList<>();
        for (CurveRecord row : curves) {
            String what = rows.describe(row);
            String importSha256 = rows.importSha256(row.getImportId(), imports, what);
            double[] h = new double[row.getPointCount()];
            double[] values = new double[row.getPointCount()];
            int filled = PackedDoubles.unpackInto(row.getHValues(), h, 0, what);
            if (PackedDoubles.unpackInto(row.getMeasuredValues(), values, 0, what) != filled) {
                throw new DamagedDataException(DamagedDataException.message(what + " holds different numbers of H and measured values"));
            }
            int expected = 1;
            for (CurvePieceRecord piece : pieces.getOrDefault(row.getId(), List.of())) {
                if (piece.getPiece() != expected++) {
                    throw new DamagedDataException(DamagedDataException.message(what + " lacks piece " + (expected - 1) + " of its points"));
                }
                int end = PackedDoubles.unpackInto(piece.getHValues(), h, filled, what);
                if (PackedDoubles.unpackInto(piece.getMeasuredValues(), values, filled, what) != end) {
                    throw new DamagedDataException(DamagedDataException.message(what + " holds different numbers of H and measured values"));
                }
                filled = end;
            }
            if (filled != h.length) {
                throw new DamagedDataException(DamagedDataException.message(what + " holds " + filled + " of its " + h.length + " points"));
            }
            read.add(new LibraryCurve(rows.gradeName(row.getGradeId()), new DemagnetizationCurve(
                    CurveKind.valueOf(row.getKind().toUpperCase(Locale.ROOT)), Quantity.valueOf(row.getQuantity()), h, values,
                    row.getTemperatureK()), row.getSource(), importSha256));
        }
        return read;
    }

    public Optional<ImportInfo> importWithChecksum(String sha256) {
        return read(rows -> imports(rows, IMPORT_RECORD.SHA256.eq(sha256))).stream().findFirst();
    }

    private static List<ImportInfo> imports(CheckedRows rows, Condition condition) {
        return rows.imports(condition).values().stream()
                .map(row -> new ImportInfo(row.getFileName(), row.getSha256(), row.getImportedAt().toInstant(),
                        row.getCurveCount(), row.getPointCount(), row.getSusceptibilityCount())).toList();
    }

    /** Susceptibility points of one material (or all when null), by material and temperature. */
    public List<SusceptibilityPoint> susceptibility(String material) {
        return read(rows -> susceptibility(rows, material == null ? DSL.noCondition() : SUSCEPTIBILITY_POINT.MATERIAL.eq(material)));
    }

    private static List<SusceptibilityPoint> susceptibility(CheckedRows rows, Condition condition) {
        List<SusceptibilityPointRecord> points = rows.susceptibility(condition);
        Map<Long, ImportRecordRecord> imports = rows.imports(IMPORT_RECORD.ID.in(points.stream().map(SusceptibilityPointRecord::getImportId)
                .filter(java.util.Objects::nonNull).distinct().toList()));
        return points.stream().map(row -> new SusceptibilityPoint(row.getMaterial(), row.getTemperatureK(), row.getChi(),
                SusceptibilityForm.valueOf(row.getForm().toUpperCase(Locale.ROOT)), row.getDensity(), row.getMolarMass(), row.getSource(),
                rows.importSha256(row.getImportId(), imports, "the susceptibility point of '" + row.getMaterial() + "'"))).toList();
    }

    /** Fits, by time. */
    public List<FitRecord> fits() {
        return read(LibraryReader::fits);
    }

    private static List<FitRecord> fits(CheckedRows rows) {
        List<org.kneepoint.db.jooq.tables.records.FitRecord> fits = rows.fits();
        Map<Long, CurveRecord> curves = new LinkedHashMap<>();
        rows.curveHeads(CURVE.ID.in(fits.stream().map(org.kneepoint.db.jooq.tables.records.FitRecord::getCurveId)
                .filter(java.util.Objects::nonNull).distinct().toList())).forEach(curve -> curves.put(curve.getId(), curve));
        return fits.stream().map(row -> {
            CurveRecord curve = row.getCurveId() == null ? null : curves.get(row.getCurveId());
            if (row.getCurveId() != null && curve == null) {
                throw new DamagedDataException(DamagedDataException.message("a stored fit names a curve that is not stored"));
            }
            return new FitRecord(row.getGradeId() == null ? null : rows.gradeName(row.getGradeId()),
                    curve == null ? null : curve.getTemperatureK(), curve == null ? null : curve.getKind(), row.getMaterial(), row.getModel(),
                    row.getParameters(), row.getResidual(), row.getFittedAt().toInstant(), row.getProgramVersion());
        }).toList();
    }

    /** Everything, in the fixed order of {@link LibrarySnapshot}. */
    public LibrarySnapshot snapshot() {
        return Snapshot.read(pool, dsl -> {
            CheckedRows rows = new CheckedRows(dsl, CheckedRows.refusing());
            QualificationReader qualification = new QualificationReader(dsl);
            LibrarySnapshot snapshot = new LibrarySnapshot(imports(rows, DSL.noCondition()),
                    gradeRows(rows, DSL.noCondition()).stream().map(StoredGrade::grade).toList(),
                    sortedByGrade(rows, curveRows(rows, DSL.noCondition())), susceptibility(rows, DSL.noCondition()), fits(rows),
                    qualification.specifications(null), qualification.lots(null), qualification.lotCurves(null));
            RowCounts.check(dsl);
            return snapshot;
        });
    }

    /** Curves in the order of their grades as read (by name), then as read (temperature, kind, id): the snapshot's order. */
    private static List<LibraryCurve> sortedByGrade(CheckedRows rows, List<LibraryCurve> curves) {
        Map<String, Integer> rank = new HashMap<>();
        rows.gradeOrder().forEach(name -> rank.putIfAbsent(name, rank.size()));
        List<LibraryCurve> sorted = new ArrayList<>(curves);
        sorted.sort(Comparator.comparingInt(curve -> rank.getOrDefault(curve.grade(), Integer.MAX_VALUE)));
        return sorted;
    }

    /** Whether every row of the library has been checked and found sound: see {@link LibraryVerifier}. */
    public VerifyReport verify() {
        return Snapshot.read(pool, dsl -> new LibraryVerifier(dsl).run());
    }

    public boolean isEmpty() {
        return rowCounts().values().stream().allMatch(count -> count == 0);
    }

    /** Row count of every table, for checks that a failed write left nothing behind. */
    public Map<String, Integer> rowCounts() {
        return Snapshot.read(pool, dsl -> {
            Map<String, Integer> counts = new LinkedHashMap<>();
            for (Table<? extends Record> table : RowCounts.TABLES) {
                counts.put(table.getName(), dsl.fetchCount(table));
            }
            return counts;
        });
    }
}
