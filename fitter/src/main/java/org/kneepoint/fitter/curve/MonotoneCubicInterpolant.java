package org.kneepoint.fitter.curve;

import java.util.Arrays;

/**
 * Shape-preserving piecewise-cubic Hermite interpolation of non-decreasing data: F. N. Fritsch,
 * R. E. Carlson, "Monotone piecewise cubic interpolation", SIAM J. Numer. Anal. 17(2), 238–246
 * (1980), with the node derivatives of F. N. Fritsch, J. Butland, "A method for constructing local
 * monotone piecewise cubic interpolants", SIAM J. Sci. Stat. Comput. 5(2), 300–304 (1984)
 * (weighted harmonic mean of the neighbouring slopes; zero at local extrema and flat steps).
 * The interpolant is C¹, never overshoots the data and is monotone wherever the data are.
 */
final class MonotoneCubicInterpolant {

    private final double[] x;
    private final double[] y;
    private final double[] slope;

    /** @param x strictly increasing abscissae; @param y non-decreasing ordinates */
    MonotoneCubicInterpolant(double[] x, double[] y) {
        this.x = x;
        this.y = y;
        this.slope = nodeSlopes(x, y);
    }

    private static double[] nodeSlopes(double[] x, double[] y) {
        int n = x.length;
        double[] d = new double[n];
        if (n == 2) {
            double s = (y[1] - y[0]) / (x[1] - x[0]);
            d[0] = s;
            d[1] = s;
            return d;
        }
        double[] h = new double[n - 1];
        double[] delta = new double[n - 1];
        for (int k = 0; k < n - 1; k++) {
            h[k] = x[k + 1] - x[k];
            delta[k] = (y[k + 1] - y[k]) / h[k];
        }
        for (int k = 1; k < n - 1; k++) {
            if (delta[k - 1] * delta[k] <= 0) {
                d[k] = 0;
            } else {
                double w1 = 2 * h[k] + h[k - 1];
                double w2 = h[k] + 2 * h[k - 1];
                d[k] = (w1 + w2) / (w1 / delta[k - 1] + w2 / delta[k]);
            }
        }
        d[0] = endSlope(h[0], h[1], delta[0], delta[1]);
        d[n - 1] = endSlope(h[n - 2], h[n - 3], delta[n - 2], delta[n - 3]);
        return d;
    }

    /** Three-point end derivative, limited so the end interval stays monotone. */
    private static double endSlope(double h0, double h1, double del0, double del1) {
        double d = ((2 * h0 + h1) * del0 - h0 * del1) / (h0 + h1);
        if (Math.signum(d) != Math.signum(del0)) {
            return 0;
        }
        if (Math.signum(del0) != Math.signum(del1) && Math.abs(d) > Math.abs(3 * del0)) {
            return 3 * del0;
        }
        return d;
    }

    double lowest() {
        return x[0];
    }

    double highest() {
        return x[x.length - 1];
    }

    /** Value at {@code at}, which must lie within the nodes. */
    double value(double at) {
        int k = segment(at);
        double hk = x[k + 1] - x[k];
        double t = (at - x[k]) / hk;
        double t2 = t * t;
        double t3 = t2 * t;
        return (2 * t3 - 3 * t2 + 1) * y[k] + (t3 - 2 * t2 + t) * hk * slope[k]
                + (-2 * t3 + 3 * t2) * y[k + 1] + (t3 - t2) * hk * slope[k + 1];
    }

    /** Index k of the interval [x[k], x[k+1]] holding {@code at}. */
    int segment(double at) {
        int found = Arrays.binarySearch(x, at);
        int k = found >= 0 ? found : -found - 2;
        return Math.max(0, Math.min(x.length - 2, k));
    }
}
