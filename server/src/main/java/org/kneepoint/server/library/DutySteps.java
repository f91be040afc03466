package org.kneepoint.server.library;

import java.util.ArrayList;
import java.util.List;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.loadline.DutyStep;
import org.kneepoint.fitter.units.Dimension;
import org.kneepoint.fitter.units.QuantityParser;

/**
 * Duty steps written "TEMPERATURE:OPPOSING_FIELD, ..." such as "20C:0, 150C:300kA/m, 20C:0", as the
 * command line's {@code --steps} and the HTTP {@code steps} parameter take them. A bare 0 is no field.
 */
public final class DutySteps {

    private DutySteps() {
    }

    public static List<DutyStep> parse(String text) {
        if (text == null || text.isBlank()) {
            throw new BadInputException("steps: give at least one step TEMPERATURE:FIELD such as 150C:300kA/m");
        }
        List<DutyStep> steps = new ArrayList<>();
        String[] parts = text.split(",", -1);
        for (int i = 0; i < parts.length; i++) {
            String[] pair = parts[i].split(":", -1);
            if (pair.length != 2) {
                throw new BadInputException("step " + (i + 1) + " must be TEMPERATURE:FIELD such as 150C:300kA/m, got '"
                        + parts[i].strip() + "'");
            }
            double temperature = quantity(i, pair[0], Dimension.TEMPERATURE);
            double field = pair[1].strip().equals("0") ? 0.0 : quantity(i, pair[1], Dimension.FIELD_STRENGTH);
            if (!(field >= 0)) {
                throw new BadInputException("step " + (i + 1) + ": the opposing field must be zero or positive, got '" + pair[1].strip() + "'");
            }
            try {
                steps.add(new DutyStep(temperature, field));
            } catch (BadInputException e) {
                throw new BadInputException("step " + (i + 1) + ": " + e.getMessage());
            }
        }
        return List.copyOf(steps);
    }

    private static double quantity(int index, String text, Dimension dimension) {
        try {
            return QuantityParser.parse(text, dimension);
        } catch (IllegalArgumentException e) {
            throw new BadInputException("step " + (index + 1) + ": " + e.getMessage());
        }
    }
}
