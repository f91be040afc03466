package org.kneepoint.server.app.design;

import java.util.List;
import java.util.Objects;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.loadline.DutyStep;
import org.kneepoint.server.app.InputLimits;

/**
 * A duty sequence as every front end asks for it: the grade, the load line, the steps (temperature, opposing field) and
 * the irreversible loss allowed (a fraction strictly between 0 and 1) that its verdict holds it to.
 */
public record DutyRequest(GradeChoice grade, LoadLineSpec loadLine, List<DutyStep> steps, double lossLimit) {

    public DutyRequest {
        Objects.requireNonNull(grade, "grade");
        Objects.requireNonNull(loadLine, "loadLine");
        steps = List.copyOf(steps);
        if (!(lossLimit > 0.0 && lossLimit < 1.0)) {
            throw new BadInputException("loss limit must lie strictly between 0 % and 100 %, got " + lossLimit * 100 + " %");
        }
        for (DutyStep step : steps) {
            InputLimits.temperatureProblem(step.temperature(), step.temperature() + " K").ifPresent(problem -> {
                throw new BadInputException(problem);
            });
        }
    }
}
