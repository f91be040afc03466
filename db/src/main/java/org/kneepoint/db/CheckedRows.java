package org.kneepoint.db;

import static org.kneepoint.db.jooq.Tables.CURVE;
import static org.kneepoint.db.jooq.Tables.CURVE_PIECE;
import static org.kneepoint.db.jooq.Tables.FIT;
import static org.kneepoint.db.jooq.Tables.GRADE;
import static org.kneepoint.db.jooq.Tables.IMPORT_RECORD;
import static org.kneepoint.db.jooq.Tables.MATERIAL_FAMILY;
import static org.kneepoint.db.jooq.Tables.SUSCEPTIBILITY_POINT;

import java.util.ArrayList;
import java.util.Collection;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.Consumer;
import org.jooq.Condition;
import org.jooq.DSLContext;
import org.jooq.Field;
import org.kneepoint.db.jooq.tables.records.CurvePieceRecord;
import org.kneepoint.db.jooq.tables.records.CurveRecord;
import org.kneepoint.db.jooq.tables.records.FitRecord;
import org.kneepoint.db.jooq.tables.records.GradeRecord;
import org.kneepoint.db.jooq.tables.records.ImportRecordRecord;
import org.kneepoint.db.jooq.tables.records.MaterialFamilyRecord;
import org.kneepoint.db.jooq.tables.records.SusceptibilityPointRecord;

/**
 * Rows of the library, each checked against the checksum stored with it (migration V4) as it is
 * read. A row that fails is told to the sink with a description naming its grade and curve (or
 * its material, file or fit) and left out: the reader's sink throws {@link DamagedDataException}
 * at the first, {@code verify}'s collects them all.
 */
final class CheckedRows {

    private final DSLContext dsl;
    private final Consumer<String> damaged;
    private final Map<Long, String> gradeNames = new LinkedHashMap<>();

    CheckedRows(DSLContext dsl, Consumer<String> damaged) {
        this.dsl = dsl;
        this.damaged = damaged;
    }

    /** A sink that stops the read at the first damaged row. */
    static Consumer<String> refusing() {
        return what -> {
            throw new DamagedDataException(DamagedDataException.message(what));
        };
    }

    Map<Long, MaterialFamilyRecord> families(Condition condition) {
        Map<Long, MaterialFamilyRecord> families = new LinkedHashMap<>();
        for (MaterialFamilyRecord row : dsl.selectFrom(MATERIAL_FAMILY).where(condition).orderBy(MATERIAL_FAMILY.NAME, MATERIAL_FAMILY.ID)) {
            if (sound(row.getChecksum(), RowChecksums.of(row), "family '" + row.getName() + "'")) {
                families.put(row.getId(), row);
            }
        }
        return families;
    }

    /** Grades by name, each with its family's name (the family row checked too). */
    List<GradeRecord> grades(Condition condition) {
        List<GradeRecord> grades = new ArrayList<>();
        for (GradeRecord row : dsl.selectFrom(GRADE).where(condition).orderBy(GRADE.NAME, GRADE.ID)) {
            if (sound(row.getChecksum(), RowChecksums.of(row), "grade '" + row.getName() + "'")) {
                gradeNames.put(row.getId(), row.getName());
                grades.add(row);
            }
        }
        return grades;
    }

    /** The name of the family of a checked grade; a missing family row is damage. */
    String familyName(GradeRecord grade, Map<Long, MaterialFamilyRecord> families) {
        MaterialFamilyRecord family = families.get(grade.getFamilyId());
        if (family == null) {
            damaged.accept("grade '" + grade.getName() + "' names a family that is not stored");
            return null;
        }
        return family.getName();
    }

    Map<Long, ImportRecordRecord> imports(Condition condition) {
        Map<Long, ImportRecordRecord> imports = new LinkedHashMap<>();
        for (ImportRecordRecord row : dsl.selectFrom(IMPORT_RECORD).where(condition).orderBy(IMPORT_RECORD.IMPORTED_AT, IMPORT_RECORD.SHA256)) {
            if (sound(row.getChecksum(), RowChecksums.of(row), "import record of the file '" + row.getFileName() + "'")) {
                imports.put(row.getId(), row);
            }
        }
        return imports;
    }

    /** The SHA-256 of the import a row came from (null for none); a missing import record is damage. */
    String importSha256(Long importId, Map<Long, ImportRecordRecord> imports, String what) {
        if (importId == null) {
            return null;
        }
        ImportRecordRecord record = imports.get(importId);
        if (record == null) {
            damaged.accept(what + " names an import record that is not stored");
            return null;
        }
        return record.getSha256();
    }

    /** Curves without their points: what a listing needs (temperature, kind, grade). */
    List<CurveRecord> curveHeads(Condition condition) {
        List<Field<?>> fields = new ArrayList<>(List.of(CURVE.fields()));
        fields.remove(CURVE.H_VALUES);
        fields.remove(CURVE.MEASURED_VALUES);
        List<CurveRecord> curves = new ArrayList<>();
        for (CurveRecord row : dsl.select(fields).from(CURVE).where(condition).orderBy(CURVE.GRADE_ID, CURVE.TEMPERATURE_K, CURVE.ID)
                .fetchInto(CURVE)) {
            if (sound(row.getChecksum(), RowChecksums.of(row), describe(row))) {
                curves.add(row);
            }
        }
        return curves;
    }

    /** Curves with the points kept in their own rows, checked too. */
    List<CurveRecord> curves(Condition condition) {
        List<CurveRecord> curves = new ArrayList<>();
        for (CurveRecord row : dsl.selectFrom(CURVE).where(condition).orderBy(CURVE.GRADE_ID, CURVE.TEMPERATURE_K, CURVE.KIND, CURVE.ID)) {
            if (sound(row.getChecksum(), RowChecksums.of(row), describe(row))
                    && sound(row.getPointsChecksum(), RowChecksums.pointsOf(row), "the points of " + describe(row))) {
                curves.add(row);
            }
        }
        return curves;
    }

    /** The further pieces of the given curves, in order; a piece out of its place is damage. */
    Map<Long, List<CurvePieceRecord>> pieces(Collection<CurveRecord> curves) {
        Map<Long, CurveRecord> byId = new HashMap<>();
        curves.forEach(curve -> byId.put(curve.getId(), curve));
        Map<Long, List<CurvePieceRecord>> pieces = new HashMap<>();
        if (byId.isEmpty()) {
            return pieces;
        }
        for (CurvePieceRecord row : dsl.selectFrom(CURVE_PIECE).where(CURVE_PIECE.CURVE_ID.in(byId.keySet()))
                .orderBy(CURVE_PIECE.CURVE_ID, CURVE_PIECE.PIECE)) {
            CurveRecord curve = byId.get(row.getCurveId());
            String what = "piece " + row.getPiece() + " of the points of " + describe(curve);
            if (sound(row.getChecksum(), RowChecksums.of(row), what)) {
                pieces.computeIfAbsent(row.getCurveId(), id -> new ArrayList<>()).add(row);
            }
        }
        return pieces;
    }

    List<SusceptibilityPointRecord> susceptibility(Condition condition) {
        List<SusceptibilityPointRecord> points = new ArrayList<>();
        for (SusceptibilityPointRecord row : dsl.selectFrom(SUSCEPTIBILITY_POINT).where(condition)
                .orderBy(SUSCEPTIBILITY_POINT.MATERIAL, SUSCEPTIBILITY_POINT.TEMPERATURE_K, SUSCEPTIBILITY_POINT.ID)) {
            String what = String.format(Locale.ROOT, "susceptibility point of '%s' at %s K", row.getMaterial(), row.getTemperatureK());
            if (sound(row.getChecksum(), RowChecksums.of(row), what)) {
                points.add(row);
            }
        }
        return points;
    }

    List<FitRecord> fits() {
        List<FitRecord> fits = new ArrayList<>();
        for (FitRecord row : dsl.selectFrom(FIT).orderBy(FIT.FITTED_AT, FIT.ID)) {
            String of = row.getGradeId() != null ? "grade '" + gradeName(row.getGradeId()) + "'" : "'" + row.getMaterial() + "'";
            if (sound(row.getChecksum(), RowChecksums.of(row), "stored " + row.getModel() + " fit of " + of)) {
                fits.add(row);
            }
        }
        return fits;
    }

    /** "the intrinsic curve at 293.15 K of grade 'X'", as stored. */
    String describe(CurveRecord curve) {
        return String.format(Locale.ROOT, "the %s curve at %s K of grade '%s'", curve.getKind(), curve.getTemperatureK(),
                gradeName(curve.getGradeId()));
    }

    /** The names of the grades read so far, in the order read. */
    List<String> gradeOrder() {
        return List.copyOf(gradeNames.values());
    }

    /** A grade's name by id, from the grades read so far or else its own row (checked). */
    String gradeName(long gradeId) {
        String known = gradeNames.get(gradeId);
        if (known != null) {
            return known;
        }
        List<GradeRecord> grade = grades(GRADE.ID.eq(gradeId));
        return grade.isEmpty() ? "#" + gradeId + " (not stored)" : grade.get(0).getName();
    }

    /** Whether the stored checksum matches the row's values; if not, the sink hears of it. */
    private boolean sound(String stored, String computed, String what) {
        if (computed.equals(stored)) {
            return true;
        }
        damaged.accept(stored == null ? what + " has no checksum" : what + " does not match its checksum");
        return false;
    }
}
