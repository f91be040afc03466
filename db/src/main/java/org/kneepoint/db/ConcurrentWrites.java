package org.kneepoint.db;

import java.sql.SQLException;

/**
 * Tells a transaction that lost a race with another writer of the same database from a real
 * failure: a unique key taken meanwhile (SQL state 23505 on H2 and PostgreSQL), a serialization
 * failure (40001) or a deadlock victim (40P01). Such a transaction is safe to run again, since the
 * library's writes check for existing rows before inserting.
 */
final class ConcurrentWrites {

    private ConcurrentWrites() {
    }

    static boolean lostRace(Throwable failure) {
        for (Throwable cause = failure; cause != null; cause = cause.getCause() == cause ? null : cause.getCause()) {
            if (cause instanceof SQLException sql && sql.getSQLState() != null
                    && (sql.getSQLState().equals("23505") || sql.getSQLState().equals("40001") || sql.getSQLState().equals("40P01"))) {
                return true;
            }
        }
        return false;
    }
}
