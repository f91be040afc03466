package org.kneepoint.fitter.field;

import static org.junit.jupiter.api.Assertions.assertTrue;

/** Test-only comparison of two vectors relative to the larger of their lengths. */
final class FieldAssertions {

    private FieldAssertions() {
    }

    static void assertClose(double[] expected, FieldVector actual, double relative, String where) {
        double dx = expected[0] - actual.x();
        double dy = expected[1] - actual.y();
        double dz = expected[2] - actual.z();
        double error = Math.sqrt(dx * dx + dy * dy + dz * dz);
        double size = Math.max(Math.sqrt(expected[0] * expected[0] + expected[1] * expected[1] + expected[2] * expected[2]),
                actual.magnitude());
        assertTrue(error <= relative * size, where + ": expected (" + expected[0] + ", " + expected[1] + ", " + expected[2]
                + ") but was " + actual + ", relative error " + error / size);
    }

    /** The point dipole field μ0/(4π)·(3(m·r̂)r̂ − m)/r³ for a moment m along z given as μ0·m = br·volume. */
    static double[] dipole(double brTimesVolume, double x, double y, double z) {
        double r2 = x * x + y * y + z * z;
        double r = Math.sqrt(r2);
        double scale = brTimesVolume / (4 * Math.PI * r2 * r);
        double projection = z / r;
        return new double[] {scale * 3 * projection * x / r, scale * 3 * projection * y / r, scale * (3 * projection * z / r - 1)};
    }
}
