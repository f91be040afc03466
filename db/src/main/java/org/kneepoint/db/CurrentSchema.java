package org.kneepoint.db;

import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import javax.sql.DataSource;

/**
 * Whether a library's schema is already at this build's version, read straight from Flyway's history table, so that
 * opening a current library (every command after the first) need not start Flyway at all. Any doubt — no history
 * table, a failed or newer migration, an unreadable row — answers no, and Flyway then migrates or reports.
 */
final class CurrentSchema {

    private static final String HISTORY = "select \"version\", \"success\" from \"flyway_schema_history\" where \"version\" is not null";

    private CurrentSchema() {
    }

    /** True when every recorded migration succeeded and the newest one is {@code version}. */
    static boolean isAt(DataSource dataSource, int version) {
        try (Connection connection = dataSource.getConnection();
                Statement statement = connection.createStatement();
                ResultSet rows = statement.executeQuery(HISTORY)) {
            int newest = 0;
            while (rows.next()) {
                if (!rows.getBoolean(2)) {
                    return false;
                }
                newest = Math.max(newest, Integer.parseInt(rows.getString(1)));
            }
            return newest == version;
        } catch (SQLException | NumberFormatException e) {
            return false;
        }
    }

    /** Whether Flyway's history table is there at all: a library that was ever migrated has one. */
    static boolean hasHistory(DataSource dataSource) {
        try (Connection connection = dataSource.getConnection();
                Statement statement = connection.createStatement();
                ResultSet rows = statement.executeQuery("select count(*) from \"flyway_schema_history\"")) {
            return rows.next();
        } catch (SQLException e) {
            return false;
        }
    }
}
