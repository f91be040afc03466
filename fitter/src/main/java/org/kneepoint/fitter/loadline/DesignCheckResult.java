package org.kneepoint.fitter.loadline;

/**
 * A magnet on its load line at one temperature: the operating point and what it means for flux loss.
 * Fractions are plain ratios (0.01 = 1 %). Temperatures in K, fields in A/m.
 *
 * @param temperature             T
 * @param loadLine                Pc and the circuit field Ha the check worked with
 * @param appliedField            the field against the magnetization as given, with its convention
 * @param point                   the operating point on the curve at T
 * @param kneeField               H (negative) of the knee at T, J = 0.9·Br(T); null if the curve never falls that far
 * @param kneeMarginField         H_op − H_knee: positive above the knee; null without a knee
 * @param kneeMarginTemperature   kelvin hotter (positive) before the knee reaches the point, or cooler
 *                                (negative) before it leaves it; null if not within the model's range
 * @param reversibleChange        Br(T)/Br(T0) − 1
 * @param fluxChange              B_op(T)/B_op(T0) − 1 on the same load line
 * @param irreversibleLoss        1 − Br'/Br(T) after the exposure (recoil line through the point), the same fraction at T0
 * @param lossLimit               the loss limit of the working temperatures, a fraction
 * @param working                 the lowest and highest working temperatures for that limit, each with why it ended
 * @param pointExtrapolated       whether the curve at T (so the operating point and the loss) is extrapolated
 * @param referenceExtrapolated   whether the curve at T0 (behind the reversible and flux changes) is extrapolated
 * @param beyondMeasuredField     whether the operating point lies below the field range the curve at T was measured to,
 *                                so that the fitted model stands in for the data there ({@link IntrinsicCurve#beyondMeasuredField})
 */
public record DesignCheckResult(double temperature, LoadLine loadLine, AppliedField appliedField, OperatingPoint point,
        Double kneeField, Double kneeMarginField, Double kneeMarginTemperature, double reversibleChange, double fluxChange,
        double irreversibleLoss, double lossLimit, WorkingRange working, boolean pointExtrapolated,
        boolean referenceExtrapolated, boolean beyondMeasuredField) {

    /** The highest working temperature, K, or null if there is none. */
    public Double maxWorkingTemperature() {
        return working.maximum().temperature();
    }

    /** Whether the highest working temperature is only the top of the model's temperature range. */
    public boolean maxAtModelLimit() {
        return working.maximum().reason() == LimitReason.MODEL_RANGE_EDGE;
    }

    /** Whether the loss rests on an extrapolated curve (the curve at T). */
    public boolean lossExtrapolated() {
        return pointExtrapolated;
    }

    /**
     * Whether the check's answers rest on an extrapolated curve: at T, at T0, at the maximum working temperature, or at
     * a minimum where the loss reaches the limit (a minimum that is only the bottom of the model's range is flagged in
     * its own {@link WorkingLimit#extrapolated()}, not here: cooling a grade whose loss falls on cooling decides nothing).
     */
    public boolean extrapolated() {
        WorkingLimit minimum = working.minimum();
        return pointExtrapolated || referenceExtrapolated || working.maximum().extrapolated()
                || minimum.extrapolated() && minimum.reason() == LimitReason.LIMIT_REACHED;
    }
}
