package org.kneepoint.fitter.model.ja;

import org.kneepoint.fitter.model.MatrixCopy;
import java.util.Arrays;
import java.util.Objects;

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
        correlation = MatrixCopy.of(correlation);
    }

    @Override
    public double[][] correlation() {
        return MatrixCopy.of(correlation);
    }

    @Override
    public boolean equals(Object other) {
        return other instanceof JilesAthertonFit f && parameters.equals(f.parameters)
                && standardErrors.equals(f.standardErrors) && Arrays.deepEquals(correlation, f.correlation)
                && Double.compare(rmsB, f.rmsB) == 0 && evaluations == f.evaluations && iterations == f.iterations
                && firstPoint == f.firstPoint && lastPoint == f.lastPoint
                && Double.compare(fieldMin, f.fieldMin) == 0 && Double.compare(fieldMax, f.fieldMax) == 0;
    }

    @Override
    public int hashCode() {
        return Objects.hash(parameters, standardErrors, Arrays.deepHashCode(correlation), rmsB, evaluations, iterations,
                firstPoint, lastPoint, fieldMin, fieldMax);
    }

    @Override
    public String toString() {
        return "JilesAthertonFit[" + parameters + ", errors " + standardErrors + ", rmsB " + rmsB + " T, "
                + evaluations + " evaluations, " + iterations + " iterations, points " + firstPoint + "–" + lastPoint + "]";
    }
}
