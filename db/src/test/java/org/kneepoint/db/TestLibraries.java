package org.kneepoint.db;

import java.time.Instant;
import java.util.UUID;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.curve.Quantity;
import org.kneepoint.fitter.library.ImportInfo;

/** Fresh, uniquely named in-memory libraries and small invented content for db tests. */
final class TestLibraries {

    private TestLibraries() {
    }

    static Library fresh() {
        return Library.open(new DatabaseLocation("jdbc:h2:mem:kneepoint-" + UUID.randomUUID() + ";DB_CLOSE_DELAY=-1"));
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
