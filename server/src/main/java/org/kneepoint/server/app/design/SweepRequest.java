package org.kneepoint.server.app.design;

import java.util.Objects;
import org.kneepoint.fitter.loadline.AppliedField;

/**
 * A temperature sweep of a check as every front end asks for it: the grade, the load line, from {@code from} to
 * {@code to} K by {@code step} K, the field against the magnetization and the loss limit (a fraction) of the working
 * temperatures marked on its chart.
 */
public record SweepRequest(GradeChoice grade, LoadLineSpec loadLine, double from, double to, double step, AppliedField field,
        double lossLimit) {

    public SweepRequest {
        Objects.requireNonNull(grade, "grade");
        Objects.requireNonNull(loadLine, "loadLine");
        Objects.requireNonNull(field, "field");
    }
}
