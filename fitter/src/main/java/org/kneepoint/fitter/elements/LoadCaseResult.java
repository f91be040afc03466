package org.kneepoint.fitter.elements;

/**
 * One load case as the check met it, in order.
 *
 * @param source                 the table it came from
 * @param averageFieldParallel   volume average of H along the magnetization where the elements worked, A/m (for B given,
 *                               on each element's recoil line once it has lost flux)
 * @param volumeFractionPastKnee share of the volume whose field in this case lies past the knee
 * @param extrapolated           whether a curve of this case rests on data beyond the measured temperatures
 */
public record LoadCaseResult(String source, double averageFieldParallel, double volumeFractionPastKnee, boolean extrapolated) {
}
