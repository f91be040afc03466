package org.kneepoint.db;

import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.util.UUID;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.curve.Quantity;
import org.kneepoint.fitter.library.ImportInfo;

/**
 * Fresh libraries on both engines and small invented content for db tests. H2: a uniquely named
 * in-memory database. PostgreSQL: a new schema in the server tests/run starts and names in
 * {@code KNEEPOINT_TEST_POSTGRES_URL}; without it the PostgreSQL cases fail (run them with tests/run).
 */
final class TestLibraries {

    /** The database engines every db test runs on. */
    enum Engine { H2, POSTGRESQL }

    private TestLibraries() {
    }

    static Library fresh() {
        return fresh(Engine.H2);
    }

    static Library fresh(Engine engine) {
        return Library.open(freshLocation(engine));
    }

    /** A new, empty database of the engine; open it twice for two independent library instances. */
    static DatabaseLocation freshLocation(Engine engine) {
        if (engine == Engine.H2) {
            return new DatabaseLocation("jdbc:h2:mem:kneepoint-" + UUID.randomUUID() + ";DB_CLOSE_DELAY=-1");
        }
        String url = System.getenv("KNEEPOINT_TEST_POSTGRES_URL");
        if (url == null) {
            throw new IllegalStateException("KNEEPOINT_TEST_POSTGRES_URL is not set: run the tests with tests/run, which starts PostgreSQL");
        }
        String schema = "kp_" + UUID.randomUUID().toString().replace("-", "");
        try (Connection connection = DriverManager.getConnection(url); Statement statement = connection.createStatement()) {
            statement.execute("CREATE SCHEMA " + schema);
        } catch (SQLException e) {
            throw new IllegalStateException("cannot create a test schema on " + url, e);
        }
        return new DatabaseLocation(url + "&currentSchema=" + schema);
    }

    static ImportInfo importInfo(String fileName, int seed, int curves, int points) {
        String sha = String.format("%064x", seed);
        return new ImportInfo(fileName, sha, Instant.parse("2026-12-02T10:15:30.123Z"), curves, points, 0);
    }

    /** An invented straight J line from +50 to −500 kA/m at the given temperature. */
    static DemagnetizationCurve curve(double temperatureK, int points) {
        double[] h = new double[points];
        double[] j = new double[points];
        for (int i = 0; i < points; i++) {
            h[i] = 5e4 - 5.5e5 * i / (points - 1);
            j[i] = 1.3 + 6.3e-8 * h[i] - 1e-4 * (temperatureK - 293.15);
        }
        return DemagnetizationCurve.of(Quantity.J, h, j, temperatureK);
    }
}
