package org.kneepoint.fitter.loadline;

/**
 * The magnet after one duty step.
 *
 * @param step             the step
 * @param loadLine         the load line of the step (Pc and the circuit field Ha its field comes to)
 * @param point            where the magnet works during the step (on its recoil line once it has lost flux)
 * @param stepLoss         the loss this exposure alone would cause from the virgin state
 * @param irreversibleLoss the loss so far, set by the worst point so far, as a fraction of Br
 * @param extrapolated     whether the curve at the step's temperature is extrapolated
 * @param beyondMeasuredField whether the step's point on the curve lies below the field range the curve was measured to
 *                         (the fitted model stands in there)
 */
public record DutyStepResult(DutyStep step, LoadLine loadLine, OperatingPoint point, double stepLoss, double irreversibleLoss,
        boolean extrapolated, boolean beyondMeasuredField) {
}
