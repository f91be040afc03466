package org.kneepoint.fitter.model.knee;

/**
 * Dense linear algebra for the few-parameter normal equations of the knee fit: Gauss–Jordan
 * elimination with partial pivoting, allocation-light because it runs once per iteration.
 */
final class SmallLinearSystem {

    private SmallLinearSystem() {
    }

    /** Solves (A + λ·diag(A))·x = b (Marquardt's damping); null when the matrix is singular. */
    static double[] solveDamped(double[][] a, double[] b, double lambda) {
        int n = b.length;
        double[][] m = new double[n][n + 1];
        for (int i = 0; i < n; i++) {
            System.arraycopy(a[i], 0, m[i], 0, n);
            m[i][i] += lambda * a[i][i];
            m[i][n] = b[i];
        }
        if (!eliminate(m, n, n + 1)) {
            return null;
        }
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = m[i][n];
        }
        return x;
    }

    /** A⁻¹, or a matrix of +∞ when A is singular. */
    static double[][] inverse(double[][] a) {
        int n = a.length;
        double[][] m = new double[n][2 * n];
        for (int i = 0; i < n; i++) {
            System.arraycopy(a[i], 0, m[i], 0, n);
            m[i][n + i] = 1;
        }
        boolean regular = eliminate(m, n, 2 * n);
        double[][] inverse = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int k = 0; k < n; k++) {
                inverse[i][k] = regular ? m[i][n + k] : Double.POSITIVE_INFINITY;
            }
        }
        return inverse;
    }

    /** Gauss–Jordan on the n rows of an augmented matrix; false when a pivot vanishes. */
    private static boolean eliminate(double[][] m, int n, int width) {
        for (int column = 0; column < n; column++) {
            int pivot = column;
            for (int row = column + 1; row < n; row++) {
                if (Math.abs(m[row][column]) > Math.abs(m[pivot][column])) {
                    pivot = row;
                }
            }
            if (m[pivot][column] == 0 || !Double.isFinite(m[pivot][column])) {
                return false;
            }
            double[] swap = m[column];
            m[column] = m[pivot];
            m[pivot] = swap;
            double scale = m[column][column];
            for (int k = column; k < width; k++) {
                m[column][k] /= scale;
            }
            for (int row = 0; row < n; row++) {
                if (row != column && m[row][column] != 0) {
                    double factor = m[row][column];
                    for (int k = column; k < width; k++) {
                        m[row][k] -= factor * m[column][k];
                    }
                }
            }
        }
        return true;
    }
}
