package org.kneepoint.fitter.model.knee;

/**
 * The scatter of measured points about a smooth curve through them, without fitting any model: the
 * difference-based estimator of T. Gasser, L. Sroka and C. Jennen-Steinmetz, "Residual variance and
 * residual pattern in nonlinear regression", Biometrika 73(3), 625–633, 1986 (from memory). Each
 * inner point is compared with the straight line through its two neighbours,
 * ε_i = a_i·y_{i−1} + b_i·y_{i+1} − y_i with a_i = (x_{i+1} − x_i)/(x_{i+1} − x_{i−1}), b_i = 1 − a_i,
 * scaled by c_i = 1/√(a_i² + b_i² + 1) so that each has the noise's variance when the curve is locally
 * straight over three points. Where points are sparse on a sharp knee the curve's own curvature inflates
 * a few of them, so σ is taken robustly as 1.4826 × the median of |c_i·ε_i| (the normal distribution's
 * median absolute deviation, F. R. Hampel, J. Am. Stat. Assoc. 69, 383–393, 1974 — from memory) instead
 * of their root mean square.
 */
final class PointScatter {

    /** σ of a normal distribution over the median of its absolute values, 1/Φ⁻¹(3/4). */
    private static final double MEDIAN_TO_SIGMA = 1.482602218505602;

    private PointScatter() {
    }

    /** σ of the points (x ascending, at least 3 distinct), in the units of y. */
    static double of(double[] x, double[] y) {
        double[] scaled = new double[Math.max(0, x.length - 2)];
        int count = 0;
        for (int i = 1; i + 1 < x.length; i++) {
            double span = x[i + 1] - x[i - 1];
            if (!(span > 0)) {
                continue;
            }
            double a = (x[i + 1] - x[i]) / span;
            double b = 1.0 - a;
            double residual = a * y[i - 1] + b * y[i + 1] - y[i];
            scaled[count++] = Math.abs(residual) / Math.sqrt(a * a + b * b + 1.0);
        }
        if (count == 0) {
            return 0.0;
        }
        double[] used = java.util.Arrays.copyOf(scaled, count);
        java.util.Arrays.sort(used);
        double median = count % 2 == 1 ? used[count / 2] : 0.5 * (used[count / 2 - 1] + used[count / 2]);
        return MEDIAN_TO_SIGMA * median;
    }
}
