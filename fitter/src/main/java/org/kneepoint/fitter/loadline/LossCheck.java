package org.kneepoint.fitter.loadline;

/**
 * The parts of a design check ({@link DesignCheck#of}) that a grade selection ranks by, computed as the full check
 * computes them: the operating point on the curve at the temperature, the knee, the irreversible loss and the working
 * temperatures for the loss limit. The knee margin in kelvin and the reversible changes are left out.
 *
 * @param point               the operating point on the curve at the temperature
 * @param kneeField           H (negative) of the knee, J = 0.9·Br(T); null if the curve never falls that far
 * @param irreversibleLoss    1 − Br'/Br(T) after the exposure, a fraction
 * @param working             the lowest and highest working temperatures for the loss limit
 * @param beyondMeasuredField whether the operating point lies below the field range the curve was measured to
 */
public record LossCheck(OperatingPoint point, Double kneeField, double irreversibleLoss, WorkingRange working,
        boolean beyondMeasuredField) {

    /** H_op − H_knee: positive above the knee; null without a knee. */
    public Double kneeMarginField() {
        return kneeField == null ? null : point.h() - kneeField;
    }

    /** The highest working temperature, K, or null if there is none. */
    public Double maxWorkingTemperature() {
        return working.maximum().temperature();
    }
}
