package org.kneepoint.db;

import java.sql.Connection;
import java.sql.SQLException;
import java.util.concurrent.locks.Lock;
import java.util.function.Function;
import org.jooq.DSLContext;
import org.jooq.SQLDialect;
import org.jooq.impl.DefaultConnectionProvider;

/**
 * Runs a read of several statements on one connection in one snapshot transaction, so it sees the
 * library as one commit left it: REPEATABLE READ, which on PostgreSQL is a snapshot of the whole
 * database; H2 fixes each table only at its first read, so there the read also holds its
 * database's read turn ({@link SharedTurns}) and no write commits while it runs. Under the default read-committed isolation each
 * statement sees its own moment: a read of families and then of grades could meet a grade whose
 * family another program stored in between, and take a sound library for a damaged one.
 * A read already inside a transaction (a write's own check) runs in that transaction.
 */
final class Snapshot {

    private Snapshot() {
    }

    static <T> T read(DSLContext pool, Function<DSLContext, T> read) {
        try {
            return pool.connectionResult(connection -> inSnapshot(pool, connection, read));
        } catch (RuntimeException e) {
            throw ConnectionFailures.translate(pool.configuration(), e);
        }
    }

    private static <T> T inSnapshot(DSLContext pool, Connection connection, Function<DSLContext, T> read) throws SQLException {
        if (!connection.getAutoCommit()) {
            return read.apply(bound(pool, connection));
        }
        int isolation = connection.getTransactionIsolation();
        Lock turn = pool.dialect().family() == SQLDialect.H2 ? SharedTurns.of(connection.getMetaData().getURL()).readLock() : null;
        if (turn != null) {
            turn.lock();
        }
        T result;
        try {
            connection.setTransactionIsolation(Connection.TRANSACTION_REPEATABLE_READ);
            connection.setAutoCommit(false);
            result = read.apply(bound(pool, connection));
            connection.commit();
        } catch (RuntimeException | SQLException e) {
            // a lost connection fails here too; the first failure is the one to report
            suppressInto(e, () -> connection.rollback());
            suppressInto(e, () -> restore(connection, isolation));
            unlock(turn);
            throw e;
        }
        try {
            restore(connection, isolation);
        } finally {
            unlock(turn);
        }
        return result;
    }

    private interface SqlStep {
        void run() throws SQLException;
    }

    private static void suppressInto(Exception first, SqlStep step) {
        try {
            step.run();
        } catch (SQLException | RuntimeException later) {
            first.addSuppressed(later);
        }
    }

    private static void restore(Connection connection, int isolation) throws SQLException {
        connection.setAutoCommit(true);
        connection.setTransactionIsolation(isolation);
    }

    private static void unlock(Lock turn) {
        if (turn != null) {
            turn.unlock();
        }
    }

    private static DSLContext bound(DSLContext pool, Connection connection) {
        return pool.configuration().derive(new DefaultConnectionProvider(connection)).dsl();
    }
}
