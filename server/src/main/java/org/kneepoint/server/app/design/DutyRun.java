package org.kneepoint.server.app.design;

import java.util.List;
import org.kneepoint.fitter.loadline.DutyStepResult;

/**
 * A duty sequence that ran: where its model came from, the load line, its Pc, the result of each step, whether any is
 * extrapolated, and the irreversible loss allowed after it (a fraction).
 */
public record DutyRun(GradeModel model, LoadLineSpec loadLine, double pc, List<DutyStepResult> results, boolean extrapolated,
        double lossLimit) {

    public DutyRun {
        results = List.copyOf(results);
    }

    /** Whether any step's point on its curve lies below the field range the curve was measured to. */
    public boolean beyondMeasuredField() {
        return results.stream().anyMatch(DutyStepResult::beyondMeasuredField);
    }

    /** Whether the sequence stays within its loss limit with B above zero and above the knee, in words ({@link Verdicts#duty}). */
    public Verdict verdict() {
        return Verdicts.duty(this);
    }

    /** The sequence's JSON document, the same for {@code duty --json} and {@code /api/duty}. */
    public DutyDocument document() {
        return DutyDocument.of(this);
    }
}
