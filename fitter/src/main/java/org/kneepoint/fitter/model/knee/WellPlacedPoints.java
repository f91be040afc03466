package org.kneepoint.fitter.model.knee;

import java.util.Arrays;

/**
 * A fixed number of well-placed points of a dense curve, for the knee fit's iterations: the measured points nearest to
 * equal steps of arc length along the curve's monotone interpolant in reduced coordinates (H/HcJ, J/Br), both ends
 * kept. The knee, where J changes fastest, gets points in proportion to its share of the curve's length rather than of
 * its field range, and the interpolant (not the noisy points) sets the spacing, so noise does not draw points to the
 * straight part. Our own choice; the fit's residual and errors are still judged on every point.
 */
final class WellPlacedPoints {

    private WellPlacedPoints() {
    }

    /**
     * Up to {@code count} of the points (h ascending), as {h, j}; all of them when there are no more than that.
     * {@code smooth} holds the interpolant's J at the same points.
     */
    static double[][] of(double[] h, double[] j, double[] smooth, double hcj, double br, int count) {
        int n = h.length;
        if (n <= count) {
            return new double[][] {h, j};
        }
        double[] length = new double[n];
        for (int i = 1; i < n; i++) {
            double dx = (h[i] - h[i - 1]) / hcj;
            double dy = (smooth[i] - smooth[i - 1]) / br;
            length[i] = length[i - 1] + Math.sqrt(dx * dx + dy * dy);
        }
        int[] picked = new int[count];
        int size = 0;
        int i = 0;
        for (int k = 0; k < count; k++) {
            double target = length[n - 1] * k / (count - 1);
            while (i < n - 1 && length[i] < target) {
                i++;
            }
            if (size == 0 || i > picked[size - 1]) {
                picked[size++] = i;
            }
        }
        double[] hs = new double[size];
        double[] js = new double[size];
        for (int k = 0; k < size; k++) {
            hs[k] = h[picked[k]];
            js[k] = j[picked[k]];
        }
        return new double[][] {Arrays.copyOf(hs, size), Arrays.copyOf(js, size)};
    }
}
