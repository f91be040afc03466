package org.kneepoint.fitter.model.ja;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.QRDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.SingularMatrixException;
import org.kneepoint.fitter.error.NumericalFailureException;

/**
 * Standard errors and correlations at the optimum by the usual linearization:
 * cov(q) = s²·(JᵀJ)⁻¹, s² = RSS/(n − 5) (Press et al., Numerical Recipes, 3rd ed., §15.5), with
 * J by central differences in fit coordinates and (JᵀJ)⁻¹ from the QR pseudo-inverse of J with
 * unit-norm columns; then cov(p) = G·cov(q)·Gᵀ with G = ∂p/∂q (the delta method).
 */
final class FitUncertainty {

    private static final double STEP = 1e-4;

    private FitUncertainty() {
    }

    static JilesAthertonFit assess(LoopResidual residual, double[] q, int iterations, double fieldMin, double fieldMax) {
        double[] r = residual.residuals(q);
        int n = r.length;
        double sum = 0;
        for (double value : r) {
            sum += value * value;
        }
        double variance = sum / (n - 5);
        RealMatrix covarianceQ = unitCovariance(centralJacobian(residual, q)).scalarMultiply(variance);
        RealMatrix g = new Array2DRowRealMatrix(FitParameterization.parameterDerivatives(q), false);
        RealMatrix covariance = g.multiply(covarianceQ).multiply(g.transpose());
        double[] errors = new double[5];
        double[][] correlation = new double[5][5];
        for (int i = 0; i < 5; i++) {
            errors[i] = Math.sqrt(covariance.getEntry(i, i));
        }
        for (int i = 0; i < 5; i++) {
            for (int j = 0; j < 5; j++) {
                correlation[i][j] = covariance.getEntry(i, j) / (errors[i] * errors[j]);
            }
        }
        return new JilesAthertonFit(FitParameterization.toParameters(q),
                new JilesAthertonStandardErrors(errors[0], errors[1], errors[2], errors[3], errors[4]), correlation,
                Math.sqrt(sum / n), residual.evaluations(), iterations, 0, n - 1, fieldMin, fieldMax);
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

    private static RealMatrix unitCovariance(double[][] jacobian) {
        RealMatrix j = new Array2DRowRealMatrix(jacobian, false);
        double[] scale = new double[5];
        for (int c = 0; c < 5; c++) {
            scale[c] = j.getColumnVector(c).getNorm();
            if (scale[c] == 0) {
                throw new NumericalFailureException("the loop does not depend on fit coordinate " + c
                        + "; the parameters cannot be identified from these data");
            }
            j.setColumnVector(c, j.getColumnVector(c).mapDivide(scale[c]));
        }
        try {
            RealMatrix pseudoInverse = new QRDecomposition(j, 1e-14).getSolver().getInverse();
            RealMatrix inverse = pseudoInverse.multiply(pseudoInverse.transpose());
            for (int r = 0; r < 5; r++) {
                for (int c = 0; c < 5; c++) {
                    inverse.setEntry(r, c, inverse.getEntry(r, c) / (scale[r] * scale[c]));
                }
            }
            return inverse;
        } catch (SingularMatrixException singular) {
            throw new NumericalFailureException("the fitted parameters are not separately identifiable from these data"
                    + " (singular Jacobian); expected a loop that shows saturation, coercivity and remanence");
        }
    }
}
