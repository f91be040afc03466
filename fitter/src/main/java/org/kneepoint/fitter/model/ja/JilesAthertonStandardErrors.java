package org.kneepoint.fitter.model.ja;

/**
 * One-sigma standard errors of fitted Jiles–Atherton parameters, in the parameters' own units.
 *
 * @param ms    of Ms, A/m
 * @param a     of a, A/m
 * @param k     of k, A/m
 * @param c     of c
 * @param alpha of α
 */
public record JilesAthertonStandardErrors(double ms, double a, double k, double c, double alpha) {

    /** The errors in the order Ms, a, k, c, α. */
    public double[] toArray() {
        return new double[] {ms, a, k, c, alpha};
    }
}
