package org.kneepoint.fitter.model.knee;

/**
 * Standard errors and correlation of a knee fit from (JᵀJ)⁻¹ scaled by the residual variance
 * s² = RSS/(n − p), and the knee width's error propagated through the covariance with a numerical
 * gradient (the delta method).
 */
record FitUncertainty(double[] errors, double[][] correlation, double[][] covariance) {

    static FitUncertainty of(KneeLeastSquares.Solution solution, int points) {
        double[][] inverse = solution.inverseNormalMatrix();
        int p = inverse.length;
        double variance = solution.rms() * solution.rms() * points / Math.max(1, points - p);
        double[] errors = new double[p];
        double[][] correlation = new double[p][p];
        double[][] covariance = new double[p][p];
        for (int i = 0; i < p; i++) {
            errors[i] = Math.sqrt(inverse[i][i] * variance);
            for (int k = 0; k < p; k++) {
                covariance[i][k] = inverse[i][k] * variance;
                correlation[i][k] = inverse[i][k] / Math.sqrt(inverse[i][i] * inverse[k][k]);
            }
        }
        return new FitUncertainty(errors, correlation, covariance);
    }

    /** Standard error of HcJ − Hk, A/m. */
    double kneeWidthError(KneeCurve model) {
        double[] p = KneeLeastSquares.parameters(model);
        double[] gradient = new double[p.length];
        double width = model.kneeWidth();
        for (int i = 0; i < p.length; i++) {
            double step = 1e-6 * Math.max(Math.abs(p[i]), 1e-3);
            double[] moved = p.clone();
            moved[i] += step;
            try {
                gradient[i] = (curve(model, moved).kneeWidth() - width) / step;
            } catch (RuntimeException e) {
                gradient[i] = 0;
            }
        }
        double sum = 0;
        for (int i = 0; i < p.length; i++) {
            for (int k = 0; k < p.length; k++) {
                sum += gradient[i] * covariance[i][k] * gradient[k];
            }
        }
        return Math.sqrt(Math.max(0, sum));
    }

    private static KneeCurve curve(KneeCurve like, double[] p) {
        return new KneeCurve(p[0], p[1], p[2], like.shape().with(java.util.Arrays.copyOfRange(p, 3, p.length)));
    }
}
