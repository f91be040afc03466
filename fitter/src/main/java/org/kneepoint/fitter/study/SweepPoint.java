package org.kneepoint.fitter.study;

/**
 * The check at one temperature of a sweep (SI; fractions as plain ratios).
 *
 * @param temperature         T, K
 * @param h                   H of the operating point, A/m
 * @param b                   B there, T
 * @param j                   J there, T
 * @param reversibleChange    Br(T)/Br(T0) − 1
 * @param irreversibleLoss    1 − Br'/Br(T) by the recoil line through the point
 * @param kneeMarginH         H_op − H_knee, A/m (positive above the knee), null when the curve has no knee
 * @param extrapolated        whether the curve at T lies beyond the measured temperatures
 * @param beyondMeasuredField whether the point lies below the field range the curve at T was measured to
 */
public record SweepPoint(double temperature, double h, double b, double j, double reversibleChange, double irreversibleLoss,
        Double kneeMarginH, boolean extrapolated, boolean beyondMeasuredField) {
}
