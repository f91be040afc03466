package org.kneepoint.fitter.model.knee;

/** Small dense linear algebra for the 4 × 4 normal equations: Gaussian elimination with partial pivoting. */
final class FourByFour {

    private FourByFour() {
    }

    /** Solves (A + λ·diag(A))·x = b. */
    static double[] solveDamped(double[][] a, double[] b, double lambda) {
        double[][] m = new double[4][5];
        for (int i = 0; i < 4; i++) {
            for (int k = 0; k < 4; k++) {
                m[i][k] = a[i][k];
            }
            m[i][i] += lambda * a[i][i];
            m[i][4] = b[i];
        }
        eliminate(m, 5);
        double[] x = new double[4];
        for (int i = 0; i < 4; i++) {
            x[i] = m[i][4];
        }
        return x;
    }

    /** A⁻¹, or a matrix of +∞ when A is singular. */
    static double[][] inverse(double[][] a) {
        double[][] m = new double[4][8];
        for (int i = 0; i < 4; i++) {
            System.arraycopy(a[i], 0, m[i], 0, 4);
            m[i][4 + i] = 1;
        }
        boolean regular = eliminate(m, 8);
        double[][] inverse = new double[4][4];
        for (int i = 0; i < 4; i++) {
            for (int k = 0; k < 4; k++) {
                inverse[i][k] = regular ? m[i][4 + k] : Double.POSITIVE_INFINITY;
            }
        }
        return inverse;
    }

    /** Gauss–Jordan on the 4 rows of an augmented matrix; false when a pivot vanishes. */
    private static boolean eliminate(double[][] m, int width) {
        for (int column = 0; column < 4; column++) {
            int pivot = column;
            for (int row = column + 1; row < 4; row++) {
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
            for (int row = 0; row < 4; row++) {
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
