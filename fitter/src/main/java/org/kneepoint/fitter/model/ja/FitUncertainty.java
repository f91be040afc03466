package org.kneepoint.fitter.model.ja;

import java.util.stream.IntStream;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.QRDecomposition;
import org.hipparchus.linear.RealMatrix;

/**
 * Standard errors and correlations at the optimum by the usual linearization:
 * cov(q) = s²·(JᵀJ)⁻¹, s² = RSS/(n − 5) (Press et al., Numerical Recipes, 3rd ed., §15.5), with
 * J by central differences in fit coordinates and (JᵀJ)⁻¹ from the QR pseudo-inverse of J with
 * unit-norm columns; then cov(p) = G·cov(q)·Gᵀ with G = ∂p/∂q (the delta method). A coordinate
 * the data do not constrain at all (a zero Jacobian column, e.g. α driven to 0) is left out; every
 * parameter that depends on it gets an infinite error and NaN correlations.
 */
final class FitUncertainty {

    private static final double STEP = 1e-4;

    private FitUncertainty() {
    }

    static JilesAthertonFit assess(LoopResidual residual, double[] q, int iterations, int earlierEvaluations,
            double fieldMin, double fieldMax) {
        double[] r = residual.residuals(q);
        int n = r.length;
        double sum = 0;
        for (double value : r) {
            sum += value * value;
        }
        double[][] jacobian = centralJacobian(residual, q);
        boolean[] free = new boolean[5];
        for (int j = 0; j < 5; j++) {
            free[j] = new Array2DRowRealMatrix(jacobian, false).getColumnVector(j).getNorm() > 0;
        }
        double[][] covarianceQ = unitCovariance(jacobian, free);
        double[][] g = FitParameterization.parameterDerivatives(q);
        double[][] covariance = new double[5][5];
        boolean[] bounded = new boolean[5];
        for (int i = 0; i < 5; i++) {
            bounded[i] = true;
            for (int j = 0; j < 5; j++) {
                bounded[i] &= free[j] || g[i][j] == 0;
            }
        }
        for (int i = 0; i < 5; i++) {
            for (int k = 0; k < 5; k++) {
                double entry = 0;
                for (int j = 0; j < 5; j++) {
                    for (int l = 0; l < 5; l++) {
                        entry += free[j] && free[l] ? g[i][j] * covarianceQ[j][l] * g[k][l] : 0;
                    }
                }
                covariance[i][k] = entry * sum / (n - 5);
            }
        }
        double[] errors = new double[5];
        double[][] correlation = new double[5][5];
        for (int i = 0; i < 5; i++) {
            errors[i] = bounded[i] ? Math.sqrt(covariance[i][i]) : Double.POSITIVE_INFINITY;
        }
        for (int i = 0; i < 5; i++) {
            for (int k = 0; k < 5; k++) {
                correlation[i][k] = bounded[i] && bounded[k] ? covariance[i][k] / (errors[i] * errors[k]) : Double.NaN;
            }
        }
        return new JilesAthertonFit(FitParameterization.toParameters(q),
                new JilesAthertonStandardErrors(errors[0], errors[1], errors[2], errors[3], errors[4]), correlation,
                Math.sqrt(sum / n), earlierEvaluations + residual.evaluations(), iterations, 0, n - 1, fieldMin, fieldMax);
    }

    private static double[][] centralJacobian(LoopResidual residual, double[] q) {
        double[][] jacobian = new double[residual.size()][5];
        for (int j = 0; j < 5; j++) {
            double[] up = q.clone();
            double[] down = q.clone();
            up[j] += STEP;
            down[j] -= STEP;
            double[] high = residual.modelled(up);
            double[] low = residual.modelled(down);
            for (int i = 0; i < high.length; i++) {
                jacobian[i][j] = (high[i] - low[i]) / (2 * STEP);
            }
        }
        return jacobian;
    }

    /** (JᵀJ)⁻¹ over the free coordinates (zero elsewhere), through the QR pseudo-inverse of scaled J. */
    private static double[][] unitCovariance(double[][] jacobian, boolean[] free) {
        int[] columns = IntStream.range(0, 5).filter(j -> free[j]).toArray();
        double[][] result = new double[5][5];
        if (columns.length == 0) {
            return result;
        }
        RealMatrix j = new Array2DRowRealMatrix(jacobian.length, columns.length);
        double[] scale = new double[columns.length];
        for (int c = 0; c < columns.length; c++) {
            for (int i = 0; i < jacobian.length; i++) {
                j.setEntry(i, c, jacobian[i][columns[c]]);
            }
            scale[c] = j.getColumnVector(c).getNorm();
            j.setColumnVector(c, j.getColumnVector(c).mapDivide(scale[c]));
        }
        RealMatrix pseudoInverse = new QRDecomposition(j, 0).getSolver().getInverse();
        RealMatrix inverse = pseudoInverse.multiply(pseudoInverse.transpose());
        for (int r = 0; r < columns.length; r++) {
            for (int c = 0; c < columns.length; c++) {
                result[columns[r]][columns[c]] = inverse.getEntry(r, c) / (scale[r] * scale[c]);
            }
        }
        return result;
    }
}
