package org.kneepoint.db;

import static org.kneepoint.db.jooq.Tables.CURVE;
import static org.kneepoint.db.jooq.Tables.CURVE_PIECE;
import static org.kneepoint.db.jooq.Tables.FIT;
import static org.kneepoint.db.jooq.Tables.GRADE;
import static org.kneepoint.db.jooq.Tables.IMPORT_RECORD;
import static org.kneepoint.db.jooq.Tables.MATERIAL_FAMILY;
import static org.kneepoint.db.jooq.Tables.SUSCEPTIBILITY_POINT;

import org.flywaydb.core.api.MigrationVersion;
import org.flywaydb.core.api.migration.Context;
import org.flywaydb.core.api.migration.JavaMigration;
import org.jooq.DSLContext;
import org.jooq.conf.RenderQuotedNames;
import org.jooq.conf.Settings;
import org.jooq.impl.DSL;
import org.jooq.tools.jdbc.JDBCUtils;

/**
 * Migration 5 (Java, after the columns of V4): the checksums of the rows stored before version 4,
 * computed from their values as they are, in the migration's transaction. From then on every
 * write stores its rows' checksums itself, and a row without one is damage.
 */
final class FillRowChecksums implements JavaMigration {

    @Override
    public MigrationVersion getVersion() {
        return MigrationVersion.fromVersion("5");
    }

    @Override
    public String getDescription() {
        return "fill row checksums";
    }

    @Override
    public Integer getChecksum() {
        return null;
    }

    @Override
    public boolean canExecuteInTransaction() {
        return true;
    }

    @Override
    public void migrate(Context context) {
        DSLContext tx = DSL.using(context.getConnection(), JDBCUtils.dialect(context.getConnection()),
                new Settings().withRenderQuotedNames(RenderQuotedNames.EXPLICIT_DEFAULT_UNQUOTED).withExecuteLogging(false));
        tx.selectFrom(IMPORT_RECORD).where(IMPORT_RECORD.CHECKSUM.isNull()).forEach(row -> tx.update(IMPORT_RECORD)
                .set(IMPORT_RECORD.CHECKSUM, RowChecksums.of(row)).where(IMPORT_RECORD.ID.eq(row.getId())).execute());
        tx.selectFrom(MATERIAL_FAMILY).where(MATERIAL_FAMILY.CHECKSUM.isNull()).forEach(row -> tx.update(MATERIAL_FAMILY)
                .set(MATERIAL_FAMILY.CHECKSUM, RowChecksums.of(row)).where(MATERIAL_FAMILY.ID.eq(row.getId())).execute());
        tx.selectFrom(GRADE).where(GRADE.CHECKSUM.isNull()).forEach(row -> tx.update(GRADE)
                .set(GRADE.CHECKSUM, RowChecksums.of(row)).where(GRADE.ID.eq(row.getId())).execute());
        tx.selectFrom(CURVE).where(CURVE.CHECKSUM.isNull()).forEach(row -> {
            row.setPointsChecksum(RowChecksums.pointsOf(row));
            tx.update(CURVE).set(CURVE.POINTS_CHECKSUM, row.getPointsChecksum()).set(CURVE.CHECKSUM, RowChecksums.of(row))
                    .where(CURVE.ID.eq(row.getId())).execute();
        });
        tx.selectFrom(CURVE_PIECE).where(CURVE_PIECE.CHECKSUM.isNull()).forEach(row -> tx.update(CURVE_PIECE)
                .set(CURVE_PIECE.CHECKSUM, RowChecksums.of(row))
                .where(CURVE_PIECE.CURVE_ID.eq(row.getCurveId())).and(CURVE_PIECE.PIECE.eq(row.getPiece())).execute());
        tx.selectFrom(SUSCEPTIBILITY_POINT).where(SUSCEPTIBILITY_POINT.CHECKSUM.isNull()).forEach(row -> tx.update(SUSCEPTIBILITY_POINT)
                .set(SUSCEPTIBILITY_POINT.CHECKSUM, RowChecksums.of(row)).where(SUSCEPTIBILITY_POINT.ID.eq(row.getId())).execute());
        tx.selectFrom(FIT).where(FIT.CHECKSUM.isNull()).forEach(row -> tx.update(FIT)
                .set(FIT.CHECKSUM, RowChecksums.of(row)).where(FIT.ID.eq(row.getId())).execute());
    }
}
