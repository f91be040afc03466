package org.kneepoint.db;

import com.zaxxer.hikari.HikariConfig;
import com.zaxxer.hikari.HikariDataSource;
import com.zaxxer.hikari.pool.HikariPool;
import java.util.Optional;
import java.util.concurrent.locks.Lock;
import java.util.concurrent.locks.ReentrantLock;
import java.util.logging.Level;
import java.util.logging.Logger;
import org.flywaydb.core.Flyway;
import org.flywaydb.core.api.FlywayException;
import org.jooq.DSLContext;
import org.jooq.conf.RenderQuotedNames;
import org.jooq.conf.Settings;
import org.jooq.impl.DSL;
import org.jooq.impl.DefaultConfiguration;
import org.kneepoint.fitter.error.BadInputException;

/**
 * An open material library: a migrated database, its connection pool (HikariCP, for the embedded
 * H2 file and a shared PostgreSQL server alike) and the stores over it. Opening runs the Flyway
 * migrations, so a new folder or an empty PostgreSQL database becomes a library on first use; a library
 * already at this build's version is recognized from Flyway's history table without starting Flyway. A
 * lost server connection is replaced by the pool, so the library recovers by itself when the
 * server comes back.
 */
public final class Library implements AutoCloseable {

    /**
     * The schema version this build migrates to: the number of its newest migration (the scripts,
     * and the Java migration 5 that fills the checksums of V4 for rows stored before).
     */
    public static final int SCHEMA_VERSION = 7;

    /** Connections of one library (one process): enough for the web server's request threads. */
    private static final int POOL_SIZE = 8;
    /** How long a request waits for a connection before it is told the database is unavailable. */
    private static final long CONNECTION_TIMEOUT_MS = 5_000;

    /** How long opening waits for another program to let go of an embedded library. */
    static final long LOCK_WAIT_MS = 5_000;
    private static final long LOCK_POLL_MS = 250;

    /** Flyway's own log (java.util.logging when no slf4j binding is present); failures are reported by us instead. */
    private static final Logger FLYWAY_LOG = Logger.getLogger("org.flywaydb");
    /** jOOQ's start-up notes, likewise. */
    private static final Logger JOOQ_LOG = Logger.getLogger("org.jooq");

    private final DatabaseLocation location;
    private final HikariDataSource pool;
    private final DSLContext dsl;
    private final ConnectionFailures failures;
    private final int schemaVersion;
    private final Lock writeTurn;
    private final Optional<StoreVersion> storeVersion;

    private Library(DatabaseLocation location, HikariDataSource pool) {
        this.location = location;
        this.pool = pool;
        this.writeTurn = location.dialect() == org.jooq.SQLDialect.H2 ? SharedTurns.of(driverUrl(location, pool)).writeLock() : new ReentrantLock();
        this.storeVersion = StoreVersion.of(pool);
        storeVersion.ifPresent(version -> version.checkAgainstStamp(pool));
        this.failures = new ConnectionFailures(location);
        this.schemaVersion = migrate(location, pool);
        Settings settings = new Settings()
                .withRenderQuotedNames(RenderQuotedNames.EXPLICIT_DEFAULT_UNQUOTED)
                .withExecuteLogging(false);
        this.dsl = DSL.using(new DefaultConfiguration().set(failures.provider(pool)).set(location.dialect())
                .set(settings).set(failures));
    }

    /**
     * Opens (and if needed creates and migrates) the library at the location. An embedded library
     * that another program holds is waited for up to {@link #LOCK_WAIT_MS}, then reported as
     * unavailable.
     */
    public static Library open(DatabaseLocation location) {
        System.setProperty("org.jooq.no-logo", "true");
        System.setProperty("org.jooq.no-tips", "true");
        long deadline = System.nanoTime() + LOCK_WAIT_MS * 1_000_000;
        while (true) {
            try {
                return openOnce(location);
            } catch (UnavailableException e) {
                if (StorageFault.of(e).orElse(null) != StorageFault.LOCKED || System.nanoTime() > deadline) {
                    throw e;
                }
                pause();
            }
        }
    }

    private static Library openOnce(DatabaseLocation location) {
        HikariDataSource pool = connect(location);
        try {
            return new Library(location, pool);
        } catch (RuntimeException e) {
            pool.close();
            throw e;
        }
    }

    /** The URL as the driver reports it, the key of {@link SharedTurns} (the configured one, should the driver not answer). */
    private static String driverUrl(DatabaseLocation location, HikariDataSource pool) {
        try (java.sql.Connection connection = pool.getConnection()) {
            return connection.getMetaData().getURL();
        } catch (java.sql.SQLException e) {
            return location.connectionUrl();
        }
    }

    private static void pause() {
        try {
            Thread.sleep(LOCK_POLL_MS);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while waiting for another program to let go of the library", e);
        }
    }

    private static HikariDataSource connect(DatabaseLocation location) {
        HikariConfig config = new HikariConfig();
        config.setPoolName("kneepoint-library");
        config.setJdbcUrl(location.connectionUrl());
        boolean h2 = location.dialect() == org.jooq.SQLDialect.H2;
        config.setUsername(location.user() != null ? location.user() : h2 ? "sa" : null);
        config.setPassword(location.password() != null ? location.password() : h2 ? "" : null);
        config.setMaximumPoolSize(POOL_SIZE);
        config.setMinimumIdle(1);
        config.setConnectionTimeout(CONNECTION_TIMEOUT_MS);
        try {
            return new HikariDataSource(config);
        } catch (HikariPool.PoolInitializationException e) {
            throw openingFailure(location, e);
        }
    }

    private static int migrate(DatabaseLocation location, HikariDataSource dataSource) {
        FLYWAY_LOG.setLevel(Level.OFF);
        JOOQ_LOG.setLevel(Level.WARNING);
        if (CurrentSchema.isAt(dataSource, SCHEMA_VERSION)) {
            return SCHEMA_VERSION;
        }
        try {
            Flyway flyway = Flyway.configure().dataSource(dataSource).locations("classpath:db/migration")
                    .javaMigrations(new FillRowChecksums(), new SealRowCounts()).load();
            flyway.migrate();
            var current = flyway.info().current();
            return current == null ? 0 : Integer.parseInt(current.getVersion().getVersion());
        } catch (FlywayException e) {
            throw openingFailure(location, e);
        }
    }

    /** An unreachable server or a damaged file as such; anything else (a broken URL, a foreign schema) as bad input. */
    private static RuntimeException openingFailure(DatabaseLocation location, RuntimeException failure) {
        RuntimeException translated = new ConnectionFailures(location).translate(failure);
        return translated instanceof UnavailableException || translated instanceof DamagedDataException ? translated
                : new BadInputException("cannot open the library at " + location.describe() + ": " + ConnectionFailures.reason(failure));
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
        return new LibraryWriter(dsl, writeTurn, failures);
    }

    /** Specifications, lots and their curves. */
    public QualificationReader qualificationReader() {
        return new QualificationReader(dsl);
    }

    /** Writes specifications and lots, in turn with {@link #writer()}. */
    public QualificationWriter qualificationWriter() {
        return new QualificationWriter(writer());
    }

    /** Closes the pool; an embedded library gives back the space it wrote append-only ({@link SpaceReuse}) and stamps its version ({@link StoreVersion}). */
    @Override
    public void close() {
        if (location.dialect() == org.jooq.SQLDialect.H2) {
            SpaceReuse.allowBeforeClose(pool);
        }
        pool.close();
        storeVersion.ifPresent(StoreVersion::stampAfterClose);
    }
}
