package org.kneepoint.db;

import java.net.ConnectException;
import java.sql.Connection;
import java.sql.SQLException;
import java.sql.SQLTransientConnectionException;
import javax.sql.DataSource;
import org.jooq.Configuration;
import org.jooq.ExecuteContext;
import org.jooq.ExecuteListener;
import org.jooq.ExecuteListenerProvider;
import org.jooq.impl.DataSourceConnectionProvider;

/**
 * Recognizes a refused, lost or timed-out connection to the library's database, or a fault of its
 * files ({@link StorageFault}: locked, read-only, full), and turns it into an
 * {@link UnavailableException} naming the database and the reason, in one place for reads
 * (through jOOQ's execute listener and connection provider) and writes (see {@link LibraryWriter}).
 * Everything else passes through unchanged.
 */
final class ConnectionFailures implements ExecuteListener {

    private final DatabaseLocation location;

    ConnectionFailures(DatabaseLocation location) {
        this.location = location;
    }

    /** The failure as an {@link UnavailableException} when it is a connection failure, else itself. */
    RuntimeException translate(RuntimeException failure) {
        if (failure instanceof UnavailableException || failure instanceof DamagedDataException) {
            return failure;
        }
        var fault = StorageFault.of(failure);
        if (fault.isPresent()) {
            return fault.get().toException(location, failure);
        }
        var damage = FileDamage.of(location, failure);
        if (damage.isPresent()) {
            return damage.get();
        }
        if (!isConnectionFailure(failure)) {
            return failure;
        }
        return new UnavailableException("the library database at " + location.describe() + " cannot be reached ("
                + location.withoutPassword(reason(failure)) + "); nothing of this request was kept, try again when it is back", failure);
    }

    /**
     * A failure raised outside jOOQ's statements (a connection's own calls: commit, rollback, isolation)
     * translated by the configuration's {@code ConnectionFailures}, when it has one.
     */
    static RuntimeException translate(Configuration configuration, RuntimeException failure) {
        for (ExecuteListenerProvider provider : configuration.executeListenerProviders()) {
            if (provider.provide() instanceof ConnectionFailures failures) {
                return failures.translate(failure);
            }
        }
        return failure;
    }

    @Override
    public void exception(ExecuteContext context) {
        RuntimeException failure = context.exception();
        if (failure != null) {
            context.exception(translate(failure));
        }
    }

    /** A provider that hands out the pool's connections and reports a refused connection as unavailable. */
    DataSourceConnectionProvider provider(DataSource dataSource) {
        return new DataSourceConnectionProvider(dataSource) {
            @Override
            public Connection acquire() {
                try {
                    return super.acquire();
                } catch (RuntimeException e) {
                    throw translate(e);
                }
            }
        };
    }

    /**
     * SQL state class 08 (connection exception), PostgreSQL's 57P01–57P03 (server shutting down or
     * starting), the pool's timeout waiting for a connection, or a refused socket.
     */
    static boolean isConnectionFailure(Throwable failure) {
        for (Throwable cause = failure; cause != null; cause = cause.getCause() == cause ? null : cause.getCause()) {
            if (cause instanceof SQLTransientConnectionException || cause instanceof ConnectException) {
                return true;
            }
            if (cause instanceof SQLException sql && sql.getSQLState() != null
                    && (sql.getSQLState().startsWith("08") || sql.getSQLState().matches("57P0[123]"))) {
                return true;
            }
        }
        return false;
    }

    /** The first line of the innermost cause's message: what the driver or server said. */
    static String reason(Throwable failure) {
        Throwable root = failure;
        while (root.getCause() != null && root.getCause() != root) {
            root = root.getCause();
        }
        String message = String.valueOf(root.getMessage());
        int newline = message.indexOf('\n');
        return (newline < 0 ? message : message.substring(0, newline)).strip();
    }
}
