package org.kneepoint.server.app.design;

import java.util.List;
import org.kneepoint.fitter.loadline.DutyStepResult;

/** A duty sequence that ran: where its model came from, the load line, its Pc and the result of each step. */
public record DutyRun(GradeModel model, LoadLineSpec loadLine, double pc, List<DutyStepResult> results, boolean extrapolated) {

    public DutyRun {
        results = List.copyOf(results);
    }

    /** Whether any step's point on its curve lies below the field range the curve was measured to. */
    public boolean beyondMeasuredField() {
        return results.stream().anyMatch(DutyStepResult::beyondMeasuredField);
    }

    /** The sequence's JSON document, the same for {@code duty --json} and {@code /api/duty}. */
    public DutyDocument document() {
        return DutyDocument.of(this);
    }
}
