package org.kneepoint.fitter.loadline;

/**
 * The magnet after one duty step.
 *
 * @param step             the step
 * @param point            where the magnet works during the step (on its recoil line once it has lost flux)
 * @param stepLoss         the loss this exposure alone would cause from the virgin state
 * @param irreversibleLoss the loss so far, set by the worst point so far, as a fraction of Br
 */
public record DutyStepResult(DutyStep step, OperatingPoint point, double stepLoss, double irreversibleLoss) {
}
