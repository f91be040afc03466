package org.kneepoint.fitter.model.ja;

/**
 * A Jiles–Atherton identification and what it is worth.
 *
 * @param parameters     fitted Ms, a, k, c, α
 * @param standardErrors one-sigma errors from the linearized model at the optimum
 * @param correlation    5 × 5 correlation matrix in the order Ms, a, k, c, α
 * @param rmsB           root-mean-square B residual, tesla
 * @param evaluations    loop evaluations spent, all stages
 * @param iterations     Levenberg–Marquardt iterations
 * @param firstPoint     index of the first measured point used (0-based)
 * @param lastPoint      index of the last measured point used, inclusive
 * @param fieldMin       lowest measured H used, A/m
 * @param fieldMax       highest measured H used, A/m
 */
public record JilesAthertonFit(JilesAthertonParameters parameters, JilesAthertonStandardErrors standardErrors,
        double[][] correlation, double rmsB, int evaluations, int iterations, int firstPoint, int lastPoint,
        double fieldMin, double fieldMax) {

    public JilesAthertonFit {
        correlation = copy(correlation);
    }

    @Override
    public double[][] correlation() {
        return copy(correlation);
    }

    private static double[][] copy(double[][] matrix) {
        double[][] result = new double[matrix.length][];
        for (int i = 0; i < matrix.length; i++) {
            result[i] = matrix[i].clone();
        }
        return result;
    }
}
