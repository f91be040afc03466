package org.kneepoint.server.app.design;

import java.util.Objects;
import org.kneepoint.fitter.loadline.AppliedField;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.server.app.InputLimits;

/**
 * A design check as every front end asks for it: the grade, the load line, the magnet's temperature (K), the
 * field against the magnetization in either convention (circuit or external, {@link AppliedField}) and the
 * irreversible loss allowed at the working temperatures (a fraction).
 */
public record CheckRequest(GradeChoice grade, LoadLineSpec loadLine, double temperature, AppliedField field, double lossLimit) {

    public CheckRequest {
        Objects.requireNonNull(grade, "grade");
        Objects.requireNonNull(loadLine, "loadLine");
        Objects.requireNonNull(field, "field");
        InputLimits.temperatureProblem(temperature, temperature + " K").ifPresent(problem -> {
            throw new BadInputException(problem);
        });
    }
}
