package org.kneepoint.server.app.design;

import java.util.List;
import java.util.Objects;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.loadline.DutyStep;
import org.kneepoint.server.app.InputLimits;

/** A duty sequence as every front end asks for it: the grade, the load line and the steps (temperature, opposing field). */
public record DutyRequest(GradeChoice grade, LoadLineSpec loadLine, List<DutyStep> steps) {

    public DutyRequest {
        Objects.requireNonNull(grade, "grade");
        Objects.requireNonNull(loadLine, "loadLine");
        steps = List.copyOf(steps);
        for (DutyStep step : steps) {
            InputLimits.temperatureProblem(step.temperature(), step.temperature() + " K").ifPresent(problem -> {
                throw new BadInputException(problem);
            });
        }
    }
}
