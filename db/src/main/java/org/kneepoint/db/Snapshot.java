package org.kneepoint.db;

import java.sql.Connection;
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
        return pool.connectionResult(connection -> {
            if (!connection.getAutoCommit()) {
                return read.apply(bound(pool, connection));
            }
            int isolation = connection.getTransactionIsolation();
            Lock turn = pool.dialect().family() == SQLDialect.H2 ? SharedTurns.of(connection.getMetaData().getURL()).readLock() : null;
            if (turn != null) {
                turn.lock();
            }
            connection.setTransactionIsolation(Connection.TRANSACTION_REPEATABLE_READ);
            connection.setAutoCommit(false);
            try {
                T result = read.apply(bound(pool, connection));
                connection.commit();
                return result;
            } catch (RuntimeException e) {
                connection.rollback();
                throw e;
            } finally {
                connection.setAutoCommit(true);
                connection.setTransactionIsolation(isolation);
                if (turn != null) {
                    turn.unlock();
                }
            }
        });
    }

    private static DSLContext bound(DSLContext pool, Connection connection) {
        return pool.configuration().derive(new DefaultConnectionProvider(connection)).dsl();
    }
}
