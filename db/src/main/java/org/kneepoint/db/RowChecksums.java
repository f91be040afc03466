package org.kneepoint.db;

import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.time.OffsetDateTime;
import java.util.HexFormat;
import org.kneepoint.db.jooq.tables.records.CurvePieceRecord;
import org.kneepoint.db.jooq.tables.records.CurveRecord;
import org.kneepoint.db.jooq.tables.records.FitRecord;
import org.kneepoint.db.jooq.tables.records.GradeRecord;
import org.kneepoint.db.jooq.tables.records.ImportRecordRecord;
import org.kneepoint.db.jooq.tables.records.MaterialFamilyRecord;
import org.kneepoint.db.jooq.tables.records.SusceptibilityPointRecord;

/**
 * The SHA-256 checksum of one stored row (migration V4): 64 lower-case hex digits over the table's
 * name, the row's id and its values in a fixed encoding: each value a tag byte (0 for null) and
 * its bytes; texts as UTF-8 with their length, numbers as their IEEE-754 or two's complement bits
 * (zero without its sign, which the engines may drop), times as epoch milliseconds. The same values
 * give the same checksum on H2 and PostgreSQL, when written and when read back. Every value is
 * taken boxed, so a damaged file that reads a required column as null gives a checksum that does
 * not match (damage told as such), never a null pointer.
 */
final class RowChecksums {

    private static final HexFormat HEX = HexFormat.of();

    private RowChecksums() {
    }

    static String importRecord(Long id, String fileName, String sha256, OffsetDateTime importedAt, Integer curves, Integer points,
            Integer susceptibilityPoints) {
        return new Row("import_record").id(id).text(fileName).text(sha256).time(importedAt).number(curves).number(points)
                .number(susceptibilityPoints).hex();
    }

    static String family(Long id, String name) {
        return new Row("material_family").id(id).text(name).hex();
    }

    static String grade(Long id, String name, Long familyId, String supplier, Double density, String notes, String provenance,
            Double price, Integer rowVersion) {
        return new Row("grade").id(id).text(name).number(familyId).text(supplier).number(density).text(notes).text(provenance)
                .number(price).number(rowVersion).hex();
    }

    /** The points kept in a curve's own row. */
    static String points(byte[] hValues, byte[] measuredValues) {
        return new Row("curve points").bytes(hValues).bytes(measuredValues).hex();
    }

    static String curve(Long id, Long gradeId, Double temperatureK, String kind, String quantity, String source, Long importId,
            Integer pointCount, String pointsChecksum) {
        return new Row("curve").id(id).number(gradeId).number(temperatureK).text(kind).text(quantity).text(source).number(importId)
                .number(pointCount).text(pointsChecksum).hex();
    }

    static String piece(Long curveId, Integer piece, byte[] hValues, byte[] measuredValues) {
        return new Row("curve_piece").id(curveId).number(piece).bytes(hValues).bytes(measuredValues).hex();
    }

    static String susceptibility(Long id, String material, Double temperatureK, Double chi, String form, Double density,
            Double molarMass, String source, Long importId) {
        return new Row("susceptibility_point").id(id).text(material).number(temperatureK).number(chi).text(form).number(density)
                .number(molarMass).text(source).number(importId).hex();
    }

    static String fit(Long id, Long gradeId, Long curveId, String material, String model, String parameters, Double residual,
            OffsetDateTime fittedAt, String programVersion) {
        return new Row("fit").id(id).number(gradeId).number(curveId).text(material).text(model).text(parameters).number(residual)
                .time(fittedAt).text(programVersion).hex();
    }

    static String of(ImportRecordRecord row) {
        return importRecord(row.getId(), row.getFileName(), row.getSha256(), row.getImportedAt(), row.getCurveCount(), row.getPointCount(),
                row.getSusceptibilityCount());
    }

    static String of(MaterialFamilyRecord row) {
        return family(row.getId(), row.getName());
    }

    static String of(GradeRecord row) {
        return grade(row.getId(), row.getName(), row.getFamilyId(), row.getSupplier(), row.getDensity(), row.getNotes(), row.getProvenance(),
                row.getPrice(), row.getRowVersion());
    }

    /** A curve row's values, with its stored points checksum (its points need not have been read). */
    static String of(CurveRecord row) {
        return curve(row.getId(), row.getGradeId(), row.getTemperatureK(), row.getKind(), row.getQuantity(), row.getSource(),
                row.getImportId(), row.getPointCount(), row.getPointsChecksum());
    }

    /** The points kept in a curve's row, as read. */
    static String pointsOf(CurveRecord row) {
        return points(row.getHValues(), row.getMeasuredValues());
    }

    static String of(CurvePieceRecord row) {
        return piece(row.getCurveId(), row.getPiece(), row.getHValues(), row.getMeasuredValues());
    }

    static String of(SusceptibilityPointRecord row) {
        return susceptibility(row.getId(), row.getMaterial(), row.getTemperatureK(), row.getChi(), row.getForm(), row.getDensity(),
                row.getMolarMass(), row.getSource(), row.getImportId());
    }

    static String of(FitRecord row) {
        return fit(row.getId(), row.getGradeId(), row.getCurveId(), row.getMaterial(), row.getModel(), row.getParameters(),
                row.getResidual(), row.getFittedAt(), row.getProgramVersion());
    }

    /**
     * Any row of {@code table} by all its columns in the table's order, except {@code checksum}: for tables whose rows
     * are written and checked whole (the specifications and lots of migration V6). Dates count as their ISO text.
     */
    static String whole(String table, org.jooq.Record row) {
        Row digest = new Row(table);
        for (org.jooq.Field<?> field : row.fields()) {
            if (field.getName().equalsIgnoreCase("checksum")) {
                continue;
            }
            Object value = row.get(field);
            if (value == null || value instanceof Number) {
                digest.number((Number) value);
            } else if (value instanceof byte[] bytes) {
                digest.bytes(bytes);
            } else if (value instanceof OffsetDateTime time) {
                digest.time(time);
            } else {
                digest.text(value.toString());
            }
        }
        return digest.hex();
    }

    /** One row's values being added to the digest. */
    private static final class Row {

        private static final byte NULL = 0;
        private static final byte TEXT = 1;
        private static final byte INTEGER = 2;
        private static final byte REAL = 3;
        private static final byte BYTES = 4;
        private static final byte TIME = 5;

        private final MessageDigest digest;

        Row(String table) {
            try {
                digest = MessageDigest.getInstance("SHA-256");
            } catch (NoSuchAlgorithmException e) {
                throw new IllegalStateException("every Java runtime has SHA-256", e);
            }
            text(table);
        }

        Row id(Long id) {
            return number(id);
        }

        Row text(String value) {
            return value == null ? nothing() : tagged(TEXT, value.getBytes(StandardCharsets.UTF_8));
        }

        Row bytes(byte[] value) {
            return value == null ? nothing() : tagged(BYTES, value);
        }

        Row number(Number value) {
            if (value == null) {
                return nothing();
            }
            if (value instanceof Double real) {
                double canonical = real == 0.0 ? 0.0 : real;
                return fixed(REAL, Double.doubleToLongBits(canonical));
            }
            return fixed(INTEGER, value.longValue());
        }

        Row time(OffsetDateTime value) {
            return value == null ? nothing() : fixed(TIME, value.toInstant().toEpochMilli());
        }

        private Row nothing() {
            digest.update(NULL);
            return this;
        }

        private Row fixed(byte tag, long bits) {
            digest.update(tag);
            digest.update(ByteBuffer.allocate(Long.BYTES).putLong(bits).array());
            return this;
        }

        private Row tagged(byte tag, byte[] value) {
            digest.update(tag);
            digest.update(ByteBuffer.allocate(Integer.BYTES).putInt(value.length).array());
            digest.update(value);
            return this;
        }

        String hex() {
            return HEX.formatHex(digest.digest());
        }
    }
}
