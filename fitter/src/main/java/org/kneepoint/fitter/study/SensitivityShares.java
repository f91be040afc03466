package org.kneepoint.fitter.study;

import java.util.Arrays;
import org.hipparchus.stat.regression.OLSMultipleLinearRegression;

/**
 * Each input's share of an output's variance by standardized regression coefficients: a least-squares plane
 * y ≈ b0 + Σ bi·xi through the samples (Hipparchus {@link OLSMultipleLinearRegression}), then
 * SRCi² = bi²·var(xi)/var(y), normalized to sum 1 (A. Saltelli et al., "Global Sensitivity Analysis. The Primer",
 * Wiley 2008, §1.2.5; docs/references.md §10). For independent inputs and an output linear in them the shares are
 * the inputs' variance shares exactly; for a curved output they are the shares of its best linear part.
 */
public final class SensitivityShares {

    private SensitivityShares() {
    }

    /**
     * The shares of {@code output} (samples) among {@code inputs} (by column), or null when the output does not vary
     * or a sample lacks it.
     */
    public static double[] of(double[][] inputs, double[] output) {
        if (Arrays.stream(output).anyMatch(v -> !Double.isFinite(v)) || variance(output) == 0.0) {
            return null;
        }
        int samples = output.length;
        double[][] rows = new double[samples][inputs.length];
        for (int n = 0; n < samples; n++) {
            for (int i = 0; i < inputs.length; i++) {
                rows[n][i] = inputs[i][n];
            }
        }
        OLSMultipleLinearRegression regression = new OLSMultipleLinearRegression();
        regression.newSampleData(output, rows);
        double[] coefficients = regression.estimateRegressionParameters();
        double[] parts = new double[inputs.length];
        double total = 0.0;
        for (int i = 0; i < inputs.length; i++) {
            parts[i] = coefficients[i + 1] * coefficients[i + 1] * variance(inputs[i]);
            total += parts[i];
        }
        if (!(total > 0.0)) {
            return null;
        }
        for (int i = 0; i < parts.length; i++) {
            parts[i] /= total;
        }
        return parts;
    }

    private static double variance(double[] values) {
        double mean = Arrays.stream(values).average().orElse(0.0);
        return Arrays.stream(values).map(v -> (v - mean) * (v - mean)).sum() / values.length;
    }
}
