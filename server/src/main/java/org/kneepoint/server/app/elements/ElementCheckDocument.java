package org.kneepoint.server.app.elements;

import java.util.List;
import org.kneepoint.fitter.elements.ElementCheckResult;
import org.kneepoint.fitter.elements.LoadCaseResult;
import org.kneepoint.fitter.elements.WorstElement;
import org.kneepoint.server.app.wording.Cautions;

/**
 * An element check as one JSON document (SI; percentages named in the key).
 *
 * @param elements                the number of elements
 * @param volume                  their total volume, m³
 * @param volumeFractionPastKnee  the share (0 to 1) of the volume whose field passed the knee in some load case
 * @param irreversibleLossPercent the volume-weighted irreversible loss of the magnet's moment, %
 * @param worstElements           the ten elements that fare worst, worst first
 * @param verdict                 {@code pass} when the loss stays within the limit, else {@code fail}
 * @param provenance              the curves used
 * @param lossLimitPercent        the loss limit of the verdict, %
 * @param transverseField         the transverse-field rule: {@code along} or {@code astroid}
 * @param loadCases               each load case in order
 * @param extrapolated            whether a curve used rests on data beyond the measured temperatures
 * @param cautions                the cautions of every result that feeds a safety decision
 */
public record ElementCheckDocument(int elements, double volume, double volumeFractionPastKnee, double irreversibleLossPercent,
        List<Worst> worstElements, String verdict, Provenance provenance, double lossLimitPercent, String transverseField,
        List<LoadCase> loadCases, boolean extrapolated, List<String> cautions) {

    /**
     * One of the worst elements at the point that set its recoil line: its place in the files (from 0), position (m),
     * H along the magnetization (A/m), margin to the knee (A/m, negative past it; null without a knee) and loss (%).
     */
    public record Worst(int index, double x, double y, double z, double hParallel, Double margin, double lossPercent) {

        static Worst of(WorstElement element) {
            return new Worst(element.index(), element.x(), element.y(), element.z(), element.hParallel(), element.margin(),
                    100.0 * element.loss());
        }
    }

    /**
     * The curves the check used: the grade's model as described for its table, and the lowest and highest element
     * temperature they were taken at (K).
     */
    public record Provenance(String curves, double lowestTemperatureK, double highestTemperatureK, boolean extrapolated) {
    }

    /** One load case: its file, the volume average of H along the magnetization (A/m) and its share past the knee. */
    public record LoadCase(String file, double averageFieldParallel, double volumeFractionPastKnee, boolean extrapolated) {

        static LoadCase of(LoadCaseResult result) {
            return new LoadCase(result.source(), result.averageFieldParallel(), result.volumeFractionPastKnee(), result.extrapolated());
        }
    }

    static ElementCheckDocument of(ElementCheckRun run) {
        ElementCheckResult result = run.result();
        return new ElementCheckDocument(result.elements(), result.volume(), result.volumeFractionPastKnee(),
                100.0 * result.irreversibleLoss(), result.worstElements().stream().map(Worst::of).toList(),
                result.withinLimit() ? "pass" : "fail", new Provenance(run.model().description(), run.lowestTemperature(),
                        run.highestTemperature(), result.extrapolated()), 100.0 * result.lossLimit(), result.transverse().label(),
                result.cases().stream().map(LoadCase::of).toList(), result.extrapolated(), Cautions.of(result.extrapolated()));
    }
}
