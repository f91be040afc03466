package org.kneepoint.server.cli;

import java.util.List;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.loadline.DutyStep;
import org.kneepoint.server.app.design.DutySteps;
import picocli.CommandLine;
import picocli.CommandLine.TypeConversionException;

/** Reads duty steps "TEMPERATURE:OPPOSING_FIELD, ..." such as "20C:0, 150C:300kA/m, 20C:0" ({@link DutySteps}). */
final class DutyStepsConverter implements CommandLine.ITypeConverter<DutyStepsConverter.Steps> {

    /** The steps in order (one option value, not a repeated option). */
    record Steps(List<DutyStep> list) {
    }

    @Override
    public Steps convert(String text) {
        try {
            return new Steps(DutySteps.parse(text));
        } catch (BadInputException e) {
            throw new TypeConversionException(e.getMessage());
        }
    }
}
