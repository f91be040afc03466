package org.kneepoint.fitter.model;

/** Deep copies of the small matrices fit results carry (correlations), so the result records stay immutable. */
public final class MatrixCopy {

    private MatrixCopy() {
    }

    /** A copy of {@code matrix} whose rows share nothing with it. */
    public static double[][] of(double[][] matrix) {
        double[][] copy = new double[matrix.length][];
        for (int i = 0; i < matrix.length; i++) {
            copy[i] = matrix[i].clone();
        }
        return copy;
    }
}
