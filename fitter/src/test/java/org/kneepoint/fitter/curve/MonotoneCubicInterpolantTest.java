package org.kneepoint.fitter.curve;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class MonotoneCubicInterpolantTest {

    // The "RPN 14" data set used by Fritsch & Carlson (SIAM J. Numer. Anal. 17(2), 1980) to show that
    // ordinary cubic splines overshoot monotone data (values as reprinted in later PCHIP literature;
    // from memory). A monotone interpolant must stay within [0, 1] and never decrease.
    private static final double[] X = {7.99, 8.09, 8.19, 8.7, 9.2, 10, 12, 15, 20};
    private static final double[] Y = {0, 2.76429e-5, 4.37498e-2, 0.169183, 0.469428, 0.943740, 0.998636, 0.999919, 0.999994};

    @Test
    void passes_through_every_node() {
        MonotoneCubicInterpolant interpolant = new MonotoneCubicInterpolant(X, Y);
        for (int i = 0; i < X.length; i++) {
            assertEquals(Y[i], interpolant.value(X[i]), 1e-15);
        }
    }

    @Test
    void never_overshoots_and_never_decreases_on_monotone_data() {
        MonotoneCubicInterpolant interpolant = new MonotoneCubicInterpolant(X, Y);
        double previous = -1;
        for (int i = 0; i <= 10000; i++) {
            double value = interpolant.value(X[0] + (X[X.length - 1] - X[0]) * i / 10000.0);
            assertTrue(value >= previous - 1e-15 && value >= 0 && value <= 1, "at step " + i);
            previous = value;
        }
    }

    @Test
    void reproduces_straight_lines_exactly() {
        double[] x = {0, 1, 3, 3.5, 7};
        double[] y = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            y[i] = 2 * x[i] - 1;
        }
        MonotoneCubicInterpolant interpolant = new MonotoneCubicInterpolant(x, y);
        for (double at = 0; at <= 7; at += 0.01) {
            assertEquals(2 * at - 1, interpolant.value(at), 1e-12);
        }
    }

    @Test
    void isotonic_regression_pools_adjacent_violators() {
        assertArrayEquals(new double[] {1, 2.5, 2.5, 4}, IsotonicRegression.fit(new double[] {1, 3, 2, 4}, new double[] {1, 1, 1, 1}), 1e-15);
        assertArrayEquals(new double[] {2, 2, 2}, IsotonicRegression.fit(new double[] {3, 2, 1}, new double[] {1, 1, 1}), 1e-15);
        assertArrayEquals(new double[] {1.5, 1.5, 3}, IsotonicRegression.fit(new double[] {2, 1, 3}, new double[] {1, 1, 1}), 1e-15);
    }
}
