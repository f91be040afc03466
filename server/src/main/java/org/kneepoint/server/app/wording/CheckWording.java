package org.kneepoint.server.app.wording;

import java.util.Locale;
import org.kneepoint.fitter.loadline.AppliedField;
import org.kneepoint.fitter.loadline.DesignCheckResult;
import org.kneepoint.fitter.loadline.FieldConvention;
import org.kneepoint.fitter.loadline.WorkingLimit;

/**
 * A design check's field and working temperatures in words, the same on the command line's table, the Check page and
 * the report.
 */
public final class CheckWording {

    private CheckWording() {
    }

    /** The field against the magnetization and its convention, e.g. "external field on a free magnet 300 kA/m (...)". */
    public static String field(DesignCheckResult result) {
        AppliedField field = result.appliedField();
        double pc = result.loadLine().pc();
        if (field.convention() == FieldConvention.OPPOSING) {
            return EngineeringUnits.field(field.field()) + " in the circuit convention, B = −μ0·Pc·(H + Ha)";
        }
        return EngineeringUnits.field(field.field()) + " uniform external field on a free magnet, H = −Hext − N·M with N = "
                + String.format(Locale.ROOT, "%.4f", AppliedField.demagnetizingFactor(pc)) + ": the load line's Ha = "
                + EngineeringUnits.field(result.loadLine().opposingField());
    }

    /** One end of the working range, why it ends there and whether it is extrapolated; {@code top} for the maximum. */
    public static String limit(WorkingLimit limit, boolean top) {
        String text = switch (limit.reason()) {
            case NONE_IN_RANGE -> "none: the loss exceeds the limit at every temperature the model describes";
            case LIMIT_REACHED -> Temperatures.celsius(limit.temperature()) + " (the loss reaches the limit there)";
            case MODEL_RANGE_EDGE -> Temperatures.celsius(limit.temperature()) + " (the " + (top ? "top" : "bottom")
                    + " of the model's temperature range; the loss stays within the limit up to there)";
        };
        return limit.extrapolated() ? text + ", extrapolated beyond the measured temperatures" : text;
    }
}
