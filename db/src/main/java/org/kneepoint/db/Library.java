package org.kneepoint.db;

import javax.sql.DataSource;
import org.flywaydb.core.Flyway;
import org.flywaydb.core.api.FlywayException;
import org.h2.jdbcx.JdbcConnectionPool;
import org.jooq.DSLContext;
import org.jooq.conf.RenderQuotedNames;
import org.jooq.conf.Settings;
import org.jooq.impl.DSL;
import org.kneepoint.fitter.error.BadInputException;
import org.postgresql.ds.PGSimpleDataSource;

/**
 * An open material library: a migrated database and the stores over it. Opening runs the Flyway
 * migrations, so a new folder or an empty PostgreSQL database becomes a library on first use.
 */
public final class Library implements AutoCloseable {

    /** The schema version this build migrates to: the number of its newest migration script. */
    public static final int SCHEMA_VERSION = 1;

    /** Flyway's own log (java.util.logging when no slf4j binding is present); failures are reported by us instead. */
    private static final java.util.logging.Logger FLYWAY_LOG = java.util.logging.Logger.getLogger("org.flywaydb");
    /** jOOQ's start-up notes, likewise. */
    private static final java.util.logging.Logger JOOQ_LOG = java.util.logging.Logger.getLogger("org.jooq");

    private final DatabaseLocation location;
    private final JdbcConnectionPool pool;
    private final DSLContext dsl;
    private final int schemaVersion;
    private final java.util.concurrent.locks.ReentrantLock writeTurn = new java.util.concurrent.locks.ReentrantLock();

    private Library(DatabaseLocation location, DataSource dataSource, JdbcConnectionPool pool) {
        this.location = location;
        this.pool = pool;
        this.schemaVersion = migrate(location, dataSource);
        Settings settings = new Settings()
                .withRenderQuotedNames(RenderQuotedNames.EXPLICIT_DEFAULT_UNQUOTED)
                .withExecuteLogging(false);
        this.dsl = DSL.using(dataSource, location.dialect(), settings);
    }

    /** Opens (and if needed creates and migrates) the library at the location. */
    public static Library open(DatabaseLocation location) {
        System.setProperty("org.jooq.no-logo", "true");
        System.setProperty("org.jooq.no-tips", "true");
        if (location.dialect() == org.jooq.SQLDialect.POSTGRES) {
            PGSimpleDataSource postgres = new PGSimpleDataSource();
            postgres.setURL(location.jdbcUrl());
            return new Library(location, postgres, null);
        }
        JdbcConnectionPool pool = JdbcConnectionPool.create(location.jdbcUrl(), "sa", "");
        try {
            return new Library(location, pool, pool);
        } catch (RuntimeException e) {
            pool.dispose();
            throw e;
        }
    }

    private static int migrate(DatabaseLocation location, DataSource dataSource) {
        FLYWAY_LOG.setLevel(java.util.logging.Level.OFF);
        JOOQ_LOG.setLevel(java.util.logging.Level.WARNING);
        try {
            Flyway flyway = Flyway.configure().dataSource(dataSource).locations("classpath:db/migration").load();
            flyway.migrate();
            var current = flyway.info().current();
            return current == null ? 0 : Integer.parseInt(current.getVersion().getVersion());
        } catch (FlywayException e) {
            throw new BadInputException("cannot open the library at " + location.describe() + ": " + firstLine(e));
        }
    }

    private static String firstLine(Throwable error) {
        Throwable root = error;
        while (root.getCause() != null && root.getCause() != root) {
            root = root.getCause();
        }
        String message = String.valueOf(root.getMessage());
        int newline = message.indexOf('\n');
        return newline < 0 ? message : message.substring(0, newline);
    }

    public DatabaseLocation location() {
        return location;
    }

    /** The version of the newest migration applied. */
    public int schemaVersion() {
        return schemaVersion;
    }

    public LibraryReader reader() {
        return new LibraryReader(dsl);
    }

    public LibraryWriter writer() {
        return new LibraryWriter(dsl, writeTurn);
    }

    @Override
    public void close() {
        if (pool != null) {
            pool.dispose();
        }
    }
}
