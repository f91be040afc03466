package org.kneepoint.server.app.design;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.loadline.AppliedField;
import org.kneepoint.fitter.loadline.DutyStep;
import org.kneepoint.fitter.loadline.FieldConvention;
import org.kneepoint.fitter.units.Dimension;
import org.kneepoint.fitter.units.QuantityParser;

/**
 * Duty steps written "TEMPERATURE:FIELD[:KIND], ..." such as "20C:0, 150C:300kA/m, 120C:200kA/m:external, 20C:0",
 * as the command line's {@code --steps} and the HTTP {@code steps} parameter take them. KIND is {@code opposing}
 * (the default: the circuit convention, B = −μ0·Pc·(H + Ha)) or {@code external} (a uniform field on a free magnet,
 * H = −Hext − N·M); a bare 0 is no field.
 */
public final class DutySteps {

    private static final String FORM = "TEMPERATURE:FIELD or TEMPERATURE:FIELD:external such as 150C:300kA/m";

    private DutySteps() {
    }

    public static List<DutyStep> parse(String text) {
        if (text == null || text.isBlank()) {
            throw new BadInputException("steps: give at least one step " + FORM);
        }
        List<DutyStep> steps = new ArrayList<>();
        String[] parts = text.split(",", -1);
        for (int i = 0; i < parts.length; i++) {
            String[] pieces = parts[i].split(":", -1);
            if (pieces.length != 2 && pieces.length != 3) {
                throw new BadInputException("step " + (i + 1) + " must be " + FORM + ", got '" + parts[i].strip() + "'");
            }
            double temperature = quantity(i, pieces[0], Dimension.TEMPERATURE);
            double field = pieces[1].strip().equals("0") ? 0.0 : quantity(i, pieces[1], Dimension.FIELD_STRENGTH);
            FieldConvention convention = pieces.length == 3 ? convention(i, pieces[2]) : FieldConvention.OPPOSING;
            if (!(field >= 0)) {
                throw new BadInputException("step " + (i + 1) + ": the field against the magnetization must be zero or positive, got '"
                        + pieces[1].strip() + "'");
            }
            try {
                steps.add(new DutyStep(temperature, new AppliedField(convention, field)));
            } catch (BadInputException e) {
                throw new BadInputException("step " + (i + 1) + ": " + e.getMessage());
            }
        }
        return List.copyOf(steps);
    }

    private static FieldConvention convention(int index, String text) {
        String kind = text.strip().toLowerCase(Locale.ROOT);
        if (kind.equals("opposing")) {
            return FieldConvention.OPPOSING;
        }
        if (kind.equals("external")) {
            return FieldConvention.EXTERNAL;
        }
        throw new BadInputException("step " + (index + 1) + ": the field's kind must be 'opposing' or 'external', got '"
                + text.strip() + "'");
    }

    private static double quantity(int index, String text, Dimension dimension) {
        try {
            return QuantityParser.parse(text, dimension);
        } catch (IllegalArgumentException e) {
            throw new BadInputException("step " + (index + 1) + ": " + e.getMessage());
        }
    }
}
