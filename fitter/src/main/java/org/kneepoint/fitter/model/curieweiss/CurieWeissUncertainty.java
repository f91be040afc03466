package org.kneepoint.fitter.model.curieweiss;

import java.util.Arrays;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.QRDecomposition;
import org.hipparchus.linear.RealMatrix;

/**
 * Standard errors and correlations of a Curie–Weiss fit from the linearized model at the optimum:
 * covariance = s²·(JᵀJ)⁻¹ with s² = RSS/(n − 3), J the Jacobian in (C, θ, χ0) (the usual
 * Gauss–Newton estimate; e.g. Press et al., Numerical Recipes, 3rd ed., §15.5). (JᵀJ)⁻¹ is formed
 * from the QR pseudo-inverse of J. Where θ is not identifiable (C = 0) its row is NaN.
 */
final class CurieWeissUncertainty {

    private static final double SIGNIFICANCE = 3;

    private CurieWeissUncertainty() {
    }

    static CurieWeissFit assess(CurieWeissParameters p, double[] temperature, double[] susceptibility, int evaluations) {
        int n = temperature.length;
        double[][] jacobian = new double[n][3];
        double residualSquares = 0;
        for (int i = 0; i < n; i++) {
            double x = 1 / (temperature[i] - p.weissTemperature());
            jacobian[i][0] = x;
            jacobian[i][1] = p.curieConstant() * x * x;
            jacobian[i][2] = 1;
            double residual = susceptibility[i] - p.susceptibility(temperature[i]);
            residualSquares += residual * residual;
        }
        double variance = n > 3 ? residualSquares / (n - 3) : Double.POSITIVE_INFINITY;
        double[][] unitCovariance = unitCovariance(jacobian);
        double[] errors = new double[3];
        double[][] correlation = new double[3][3];
        for (int i = 0; i < 3; i++) {
            errors[i] = Math.sqrt(variance * unitCovariance[i][i]);
            for (int j = 0; j < 3; j++) {
                correlation[i][j] = unitCovariance[i][j] / Math.sqrt(unitCovariance[i][i] * unitCovariance[j][j]);
            }
        }
        boolean significant = Math.abs(p.curieConstant()) > SIGNIFICANCE * errors[0];
        return new CurieWeissFit(p, errors[0], errors[1], errors[2], correlation, Math.sqrt(residualSquares / n), n,
                Arrays.stream(temperature).min().orElseThrow(), Arrays.stream(temperature).max().orElseThrow(),
                behaviour(susceptibility), significant, evaluations);
    }

    private static double[][] unitCovariance(double[][] jacobian) {
        if (thetaColumnIsZero(jacobian)) {
            double[][] reduced = scaledInverse(dropColumn(jacobian));
            return new double[][] {
                {reduced[0][0], Double.NaN, reduced[0][1]},
                {Double.NaN, Double.NaN, Double.NaN},
                {reduced[1][0], Double.NaN, reduced[1][1]}};
        }
        return scaledInverse(jacobian);
    }

    private static boolean thetaColumnIsZero(double[][] jacobian) {
        return Arrays.stream(jacobian).allMatch(row -> row[1] == 0);
    }

    /** (JᵀJ)⁻¹ through the QR pseudo-inverse of J with unit-norm columns. */
    private static double[][] scaledInverse(double[][] jacobian) {
        RealMatrix j = new Array2DRowRealMatrix(jacobian, true);
        int m = j.getColumnDimension();
        double[] scale = new double[m];
        for (int c = 0; c < m; c++) {
            scale[c] = j.getColumnVector(c).getNorm();
            j.setColumnVector(c, j.getColumnVector(c).mapDivide(scale[c]));
        }
        RealMatrix pseudoInverse = new QRDecomposition(j, 0).getSolver().getInverse();
        RealMatrix inverse = pseudoInverse.multiply(pseudoInverse.transpose());
        double[][] result = new double[m][m];
        for (int r = 0; r < m; r++) {
            for (int c = 0; c < m; c++) {
                result[r][c] = inverse.getEntry(r, c) / (scale[r] * scale[c]);
            }
        }
        return result;
    }

    private static double[][] dropColumn(double[][] jacobian) {
        double[][] reduced = new double[jacobian.length][];
        for (int i = 0; i < jacobian.length; i++) {
            reduced[i] = new double[] {jacobian[i][0], jacobian[i][2]};
        }
        return reduced;
    }

    private static SusceptibilityBehaviour behaviour(double[] susceptibility) {
        boolean allNegative = Arrays.stream(susceptibility).allMatch(x -> x < 0);
        boolean allPositive = Arrays.stream(susceptibility).allMatch(x -> x > 0);
        return allNegative ? SusceptibilityBehaviour.DIAMAGNETIC
                : allPositive ? SusceptibilityBehaviour.PARAMAGNETIC : SusceptibilityBehaviour.SIGN_CHANGING;
    }
}
