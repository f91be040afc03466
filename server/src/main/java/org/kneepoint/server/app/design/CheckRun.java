package org.kneepoint.server.app.design;

import org.kneepoint.fitter.loadline.DesignCheckResult;
import org.kneepoint.fitter.loadline.LocalKneeResult;
import org.kneepoint.fitter.study.ToleranceStudyResult;

/**
 * A check that ran: where its model came from, the load line, the result, the loss limit (a fraction), whether the
 * model was extrapolated, the local check of the shape (null when the load line was given by its Pc) and the
 * tolerance study (null when none was asked for).
 */
public record CheckRun(GradeModel model, LoadLineSpec loadLine, DesignCheckResult result, double lossLimit, boolean extrapolated,
        LocalKneeResult local, ToleranceStudyResult tolerance) {

    /** Whether the check meets its loss limit at its temperature, in words ({@link Verdicts#check}). */
    public Verdict verdict() {
        return Verdicts.check(this);
    }

    /** The check's JSON document, the same for {@code check --json} and {@code /api/check}. */
    public CheckDocument document() {
        return CheckDocument.of(this);
    }
}
