package org.kneepoint.db;

import org.flywaydb.core.api.MigrationVersion;
import org.flywaydb.core.api.migration.Context;
import org.flywaydb.core.api.migration.JavaMigration;
import org.jooq.conf.RenderQuotedNames;
import org.jooq.conf.Settings;
import org.jooq.impl.DSL;
import org.jooq.tools.jdbc.JDBCUtils;

/**
 * Migration 7 (Java, after the table of V6): the row counts of the tables as they are
 * ({@link RowCounts}). From then on every write seals them itself, and a missing count is damage.
 */
final class SealRowCounts implements JavaMigration {

    @Override
    public MigrationVersion getVersion() {
        return MigrationVersion.fromVersion("7");
    }

    @Override
    public String getDescription() {
        return "seal row counts";
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
        RowCounts.seal(DSL.using(context.getConnection(), JDBCUtils.dialect(context.getConnection()),
                new Settings().withRenderQuotedNames(RenderQuotedNames.EXPLICIT_DEFAULT_UNQUOTED).withExecuteLogging(false)));
    }
}
