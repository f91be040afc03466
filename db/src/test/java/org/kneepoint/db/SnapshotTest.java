package org.kneepoint.db;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.lang.reflect.Proxy;
import java.sql.Connection;
import java.sql.SQLException;
import java.util.concurrent.atomic.AtomicInteger;
import org.jooq.DSLContext;
import org.jooq.SQLDialect;
import org.jooq.impl.DSL;
import org.jooq.impl.DefaultConfiguration;
import org.jooq.impl.DefaultConnectionProvider;
import org.junit.jupiter.api.Test;

/**
 * A read whose connection is lost between statements (the database server crashed) fails in the
 * connection's own calls (isolation, commit, rollback), outside any statement: it is still told as
 * the database being unreachable, never as an internal error.
 */
class SnapshotTest {

    private static final DatabaseLocation LOCATION = new DatabaseLocation("jdbc:postgresql://127.0.0.1:1/gone");

    /** A connection that answers autocommit and fails every other call as PostgreSQL's driver does once the socket is closed. */
    private static Connection lostConnection(AtomicInteger calls) {
        return (Connection) Proxy.newProxyInstance(SnapshotTest.class.getClassLoader(), new Class<?>[] {Connection.class},
                (proxy, method, arguments) -> {
                    calls.incrementAndGet();
                    if (method.getName().equals("getAutoCommit")) {
                        return true;
                    }
                    throw new SQLException("This connection has been closed.", "08003");
                });
    }

    private static DSLContext over(Connection connection) {
        return DSL.using(new DefaultConfiguration().set(new DefaultConnectionProvider(connection)).set(SQLDialect.POSTGRES)
                .set(new ConnectionFailures(LOCATION)));
    }

    @Test
    void a_connection_lost_outside_a_statement_is_told_as_unreachable() {
        AtomicInteger calls = new AtomicInteger();
        UnavailableException failure = assertThrows(UnavailableException.class,
                () -> Snapshot.read(over(lostConnection(calls)), dsl -> "never read"));
        assertTrue(failure.getMessage().startsWith("the library database at "), failure.getMessage());
        assertTrue(failure.getMessage().contains("(This connection has been closed.)"), failure.getMessage());
        assertTrue(calls.get() >= 2, "the snapshot asked the connection before failing");
    }

    @Test
    void a_read_that_fails_reports_its_own_failure_not_the_failed_clean_up() {
        AtomicInteger calls = new AtomicInteger();
        Connection connection = (Connection) Proxy.newProxyInstance(SnapshotTest.class.getClassLoader(), new Class<?>[] {Connection.class},
                (proxy, method, arguments) -> {
                    calls.incrementAndGet();
                    return switch (method.getName()) {
                        case "getAutoCommit" -> true;
                        case "getTransactionIsolation" -> Connection.TRANSACTION_READ_COMMITTED;
                        case "setTransactionIsolation", "setAutoCommit" -> null;
                        default -> throw new SQLException("This connection has been closed.", "08003");
                    };
                });
        IllegalStateException failure = assertThrows(IllegalStateException.class, () -> Snapshot.read(over(connection), dsl -> {
            throw new IllegalStateException("the read's own failure");
        }));
        assertEquals("the read's own failure", failure.getMessage());
        assertEquals(1, failure.getSuppressed().length, "the failed rollback is kept beside it");
    }
}
