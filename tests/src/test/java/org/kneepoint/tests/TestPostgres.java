package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertNotNull;

import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.UUID;

/**
 * The PostgreSQL server tests/run starts on loopback (its URL in KNEEPOINT_TEST_POSTGRES_URL), and
 * a fresh schema in it for each test that needs an empty library.
 */
final class TestPostgres {

    private TestPostgres() {
    }

    /** The URL of a new, empty schema on the test server. */
    static String freshSchemaUrl() {
        String url = System.getenv("KNEEPOINT_TEST_POSTGRES_URL");
        assertNotNull(url, "KNEEPOINT_TEST_POSTGRES_URL is not set: run the tests with tests/run, which starts PostgreSQL");
        return freshSchemaUrl(url);
    }

    /** The URL of a new, empty schema on the server at {@code serverUrl}. */
    static String freshSchemaUrl(String serverUrl) {
        String schema = "kp_" + UUID.randomUUID().toString().replace("-", "");
        try (Connection connection = DriverManager.getConnection(serverUrl); Statement statement = connection.createStatement()) {
            statement.execute("CREATE SCHEMA " + schema);
        } catch (SQLException e) {
            throw new IllegalStateException("cannot create a schema on " + serverUrl, e);
        }
        return serverUrl + "&currentSchema=" + schema;
    }
}
