package org.kneepoint.fitter.qualification;

/**
 * One specified quantity of one measured curve against its lower limit.
 *
 * @param quantity    the quantity
 * @param value       the measured value (SI; a ratio for squareness), or null when the curve does not reach it
 * @param limit       the specification's minimum
 * @param uncertainty the expanded uncertainty the guard band gives the value (0 without one)
 * @param margin      value − limit, or null with the value
 * @param verdict     fail below the limit; inconclusive when not reached or within the uncertainty of it; else pass
 */
public record QuantityCheck(SpecifiedQuantity quantity, Double value, double limit, double uncertainty, Double margin, Verdict verdict) {

    /**
     * A value this close to its limit, as a share of the limit, is at the limit: the characterization
     * finds a field where J or B crosses a level by bisection to 1e-13 of the field
     * ({@link org.kneepoint.fitter.curve.DemagnetizationBranch}), so a curve made to reach the limit
     * exactly may come out a few ulps short of it.
     */
    static final double AT_LIMIT_SHARE = 1e-12;

    /** Compares the value with its limit under the guard band. */
    public static QuantityCheck of(SpecifiedQuantity quantity, Double value, double limit, GuardBand band) {
        if (value == null) {
            return new QuantityCheck(quantity, null, limit, 0.0, null, Verdict.INCONCLUSIVE);
        }
        double uncertainty = band.uncertainty(quantity, value);
        double reached = value + AT_LIMIT_SHARE * limit;
        Verdict verdict = reached < limit ? Verdict.FAIL : reached - uncertainty < limit ? Verdict.INCONCLUSIVE : Verdict.PASS;
        return new QuantityCheck(quantity, value, limit, uncertainty, value - limit, verdict);
    }
}
