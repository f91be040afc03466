package org.kneepoint.server.app.design;

import org.kneepoint.fitter.loadline.AppliedField;
import org.kneepoint.fitter.study.TemperatureSweep;

/** A sweep that ran: where its model came from, the load line, its Pc, the field, the loss limit and the result. */
public record SweepRun(GradeModel model, LoadLineSpec loadLine, double pc, AppliedField field, double lossLimit,
        TemperatureSweep sweep) {

    /** Whether any step rests on an extrapolated curve. */
    public boolean extrapolated() {
        return sweep.points().stream().anyMatch(point -> point.extrapolated());
    }

    /** Whether any step's point lies below the field range its curve was measured to. */
    public boolean beyondMeasuredField() {
        return sweep.points().stream().anyMatch(point -> point.beyondMeasuredField());
    }

    /** Whether every temperature swept stays within the loss limit with B above zero and above the knee ({@link Verdicts#sweep}). */
    public Verdict verdict() {
        return Verdicts.sweep(this);
    }

    /** The sweep's JSON document, the same for {@code sweep --json} and {@code /api/sweep}. */
    public SweepDocument document() {
        return SweepDocument.of(this);
    }
}
