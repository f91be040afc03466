package org.kneepoint.fitter.loadline;

/**
 * A magnet on its load line at one temperature: the operating point and what it means for flux loss.
 * Fractions are plain ratios (0.01 = 1 %). Temperatures in K, fields in A/m.
 *
 * @param temperature             T
 * @param loadLine                Pc and Ha
 * @param point                   the operating point on the curve at T
 * @param kneeField               H (negative) of the knee at T, J = 0.9·Br(T)
 * @param kneeMarginField         H_op − H_knee: positive above the knee
 * @param kneeMarginTemperature   kelvin hotter (positive) before the knee reaches the point, or cooler
 *                                (negative) before it leaves it; null if not within the model's range
 * @param reversibleChange        Br(T)/Br(T0) − 1
 * @param fluxChange              B_op(T)/B_op(T0) − 1 on the same load line
 * @param irreversibleLoss        1 − Br'/Br(T) after the exposure, the same fraction at T0
 * @param maxWorkingTemperature   highest T (above T0) with loss within the limit, null if exceeded already at T0
 * @param maxAtModelLimit         whether that is only the top of the model's temperature range
 */
public record DesignCheckResult(double temperature, LoadLine loadLine, OperatingPoint point, double kneeField,
        double kneeMarginField, Double kneeMarginTemperature, double reversibleChange, double fluxChange,
        double irreversibleLoss, Double maxWorkingTemperature, boolean maxAtModelLimit) {
}
