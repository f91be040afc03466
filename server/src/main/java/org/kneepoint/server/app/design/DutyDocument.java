package org.kneepoint.server.app.design;

import java.util.List;
import java.util.Locale;
import org.kneepoint.fitter.loadline.AppliedField;
import org.kneepoint.fitter.loadline.DutyStepResult;
import org.kneepoint.fitter.loadline.FieldConvention;
import org.kneepoint.server.app.wording.Cautions;

/**
 * A duty sequence as one JSON document: Pc, each step with its operating point and losses, extrapolated, whether any
 * step's point lies beyond the field range its curve was measured to, cautions, the loss allowed after the sequence
 * (percent) and the verdict against it ({@link Verdicts#duty}).
 */
public record DutyDocument(double pc, List<Step> steps, boolean extrapolated, List<String> cautions, boolean beyondMeasuredField,
        double lossLimitPercent, Verdict verdict) {

    /**
     * One step: its temperature (K), the circuit field Ha of its load line (A/m; the step's own field when it was given
     * in that convention), the operating point, the step's and the total loss, the convention the field was given in
     * ({@code opposing} or {@code external}), the external field Hext (null for a circuit field), whether the curve at
     * the step's temperature is extrapolated and whether the step's point on the curve lies below the field range the
     * curve was measured to (the fitted knee model stands in there).
     */
    public record Step(double temperatureK, double opposingField, CheckDocument.Point operatingPoint, double stepLossPercent,
            double irreversibleLossPercent, String fieldConvention, Double externalFieldH, boolean extrapolated,
            boolean beyondMeasuredField) {

        static Step of(DutyStepResult result) {
            AppliedField field = result.step().field();
            return new Step(result.step().temperature(), result.loadLine().opposingField(), CheckDocument.Point.of(result.point()),
                    100.0 * result.stepLoss(), 100.0 * result.irreversibleLoss(), field.convention().name().toLowerCase(Locale.ROOT),
                    field.convention() == FieldConvention.EXTERNAL ? field.field() : null, result.extrapolated(),
                    result.beyondMeasuredField());
        }
    }

    static DutyDocument of(DutyRun run) {
        return new DutyDocument(run.pc(), run.results().stream().map(Step::of).toList(), run.extrapolated(),
                Cautions.of(run.extrapolated(), run.beyondMeasuredField()), run.beyondMeasuredField(), 100.0 * run.lossLimit(),
                run.verdict());
    }
}
