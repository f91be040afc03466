package org.kneepoint.server.text;

import org.kneepoint.server.app.wording.EngineeringUnits;
import org.kneepoint.server.app.wording.Cautions;
import org.kneepoint.server.app.wording.CheckWording;
import org.kneepoint.fitter.loadline.DesignCheckResult;
import org.kneepoint.server.app.design.CheckRun;
import org.kneepoint.fitter.loadline.LocalKneeResult;
import org.kneepoint.fitter.loadline.OperatingPoint;

/**
 * A design check as a readable table (its JSON document is {@link org.kneepoint.server.app.design.CheckDocument}).
 */
public final class CheckView {

    private CheckView() {
    }

    /** A readable table of a check that ran, with the local check when the load line came from a shape. */
    public static String table(CheckRun run) {
        String model = run.model().description();
        String loadLine = run.loadLine().describe();
        DesignCheckResult result = run.result();
        double lossLimit = run.lossLimit();
        LocalKneeResult local = run.local();
        boolean extrapolated = run.extrapolated();
        OperatingPoint point = result.point();
        StringBuilder out = new StringBuilder();
        out.append("Design check at ").append(EngineeringUnits.celsius(result.temperature())).append(", ").append(loadLine)
                .append(", Pc = ").append(EngineeringUnits.number(result.loadLine().pc())).append('\n');
        out.append(VerdictView.lines(run.verdict()));
        row(out, "grade", model);
        if (extrapolated) {
            row(out, "extrapolated", "yes: T, T0 or a working temperature lies outside the measured temperatures");
        }
        if (result.beyondMeasuredField()) {
            row(out, "beyond measured H", "yes: the operating point lies below the field the curve was measured to;"
                    + " the fitted knee model stands in there");
        }
        row(out, "field", CheckWording.field(result));
        row(out, "operating point", "H = " + EngineeringUnits.field(point.h()) + ", B = " + EngineeringUnits.tesla(point.b())
                + ", J = " + EngineeringUnits.tesla(point.j()) + ", -B·H = " + EngineeringUnits.energy(point.energyProduct()));
        if (result.kneeField() == null) {
            row(out, "knee (J = 0.9 Br)", "none: the curve does not fall to 0.9·Br");
        } else {
            row(out, "knee (J = 0.9 Br)", "H = " + EngineeringUnits.field(result.kneeField()) + " at this temperature");
            row(out, "margin to the knee", EngineeringUnits.field(result.kneeMarginField()) + ", " + kelvin(result.kneeMarginTemperature()));
        }
        row(out, "reversible change", EngineeringUnits.percent(result.reversibleChange()) + " of Br, "
                + EngineeringUnits.percent(result.fluxChange()) + " of B at the point (against the reference temperature)");
        row(out, "irreversible loss", EngineeringUnits.percent(result.irreversibleLoss()) + " of Br (the same share at the reference;"
                + " recoil line through the operating point)");
        row(out, "min working temp.", CheckWording.limit(result.working().minimum(), false) + " for a loss limit of "
                + EngineeringUnits.percent(lossLimit));
        row(out, "max working temp.", CheckWording.limit(result.working().maximum(), true) + " for a loss limit of "
                + EngineeringUnits.percent(lossLimit));
        if (local != null) {
            row(out, "local check", EngineeringUnits.percent(local.fractionBelowKnee()) + " of the volume below the knee ("
                    + local.resolution() + " cells per edge, " + local.cells() + " inside)");
            row(out, "lowest local H", EngineeringUnits.field(local.worstField()) + " at x = " + EngineeringUnits.millimetres(local.worstX())
                    + ", y = " + EngineeringUnits.millimetres(local.worstY()) + ", z = " + EngineeringUnits.millimetres(local.worstZ())
                    + " (" + local.worstRegion().name().toLowerCase().replace('_', ' ') + ")");
        }
        return out.append(Cautions.table(extrapolated, result.beyondMeasuredField())).toString();
    }

    private static String kelvin(Double margin) {
        if (margin == null) {
            return "the knee does not reach the point within the model's temperature range";
        }
        return margin >= 0 ? EngineeringUnits.number(margin) + " K hotter reaches the knee"
                : EngineeringUnits.number(-margin) + " K cooler leaves the knee";
    }

    private static void row(StringBuilder out, String name, String value) {
        out.append(String.format("  %-20s %s%n", name, value));
    }
}
