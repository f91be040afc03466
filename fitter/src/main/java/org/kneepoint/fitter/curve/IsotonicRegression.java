package org.kneepoint.fitter.curve;

/**
 * Weighted least-squares isotonic (non-decreasing) regression by the pool-adjacent-violators
 * algorithm (M. Ayer, H. D. Brunk, G. M. Ewing, W. T. Reid, E. Silverman, "An empirical
 * distribution function for sampling with incomplete information", Ann. Math. Statist. 26(4),
 * 641–647, 1955 — from memory). Used to take measurement noise out of a J(H) branch, which must
 * not decrease with H, without moving points that already obey that order. O(n).
 */
final class IsotonicRegression {

    private IsotonicRegression() {
    }

    /** The non-decreasing sequence closest to {@code values} in weighted least squares. */
    static double[] fit(double[] values, double[] weights) {
        int n = values.length;
        double[] blockMean = new double[n];
        double[] blockWeight = new double[n];
        int[] blockEnd = new int[n];
        int blocks = 0;
        for (int i = 0; i < n; i++) {
            blockMean[blocks] = values[i];
            blockWeight[blocks] = weights[i];
            blockEnd[blocks] = i;
            blocks++;
            while (blocks > 1 && blockMean[blocks - 2] > blockMean[blocks - 1]) {
                double weight = blockWeight[blocks - 2] + blockWeight[blocks - 1];
                blockMean[blocks - 2] = (blockMean[blocks - 2] * blockWeight[blocks - 2]
                        + blockMean[blocks - 1] * blockWeight[blocks - 1]) / weight;
                blockWeight[blocks - 2] = weight;
                blockEnd[blocks - 2] = blockEnd[blocks - 1];
                blocks--;
            }
        }
        double[] fitted = new double[n];
        int start = 0;
        for (int b = 0; b < blocks; b++) {
            for (int i = start; i <= blockEnd[b]; i++) {
                fitted[i] = blockMean[b];
            }
            start = blockEnd[b] + 1;
        }
        return fitted;
    }
}
