package org.kneepoint.server.cli;

import java.util.ArrayList;
import java.util.List;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.loadline.DutyStep;
import org.kneepoint.fitter.units.Dimension;
import picocli.CommandLine;
import picocli.CommandLine.TypeConversionException;

/** Reads duty steps "TEMPERATURE:OPPOSING_FIELD, ..." such as "20C:0, 150C:300kA/m, 20C:0". */
final class DutyStepsConverter implements CommandLine.ITypeConverter<DutyStepsConverter.Steps> {

    /** The steps in order (one option value, not a repeated option). */
    record Steps(List<DutyStep> list) {
    }

    @Override
    public Steps convert(String text) {
        List<DutyStep> steps = new ArrayList<>();
        String[] parts = text.split(",", -1);
        for (int i = 0; i < parts.length; i++) {
            String[] pair = parts[i].split(":", -1);
            if (pair.length != 2) {
                throw new TypeConversionException("step " + (i + 1) + " must be TEMPERATURE:FIELD such as 150C:300kA/m, got '"
                        + parts[i].strip() + "'");
            }
            double temperature = QuantityConverters.parse(pair[0], Dimension.TEMPERATURE);
            double field = QuantityConverters.fieldStrength(pair[1]);
            if (!(field >= 0)) {
                throw new TypeConversionException("step " + (i + 1) + ": the opposing field must be zero or positive, got '"
                        + pair[1].strip() + "'");
            }
            try {
                steps.add(new DutyStep(temperature, field));
            } catch (BadInputException e) {
                throw new TypeConversionException("step " + (i + 1) + ": " + e.getMessage());
            }
        }
        return new Steps(List.copyOf(steps));
    }
}
