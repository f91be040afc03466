package org.kneepoint.server.web;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.kneepoint.fitter.loadline.DesignCheckResult;
import org.kneepoint.fitter.loadline.LocalKneeResult;
import org.kneepoint.fitter.loadline.OperatingPoint;
import org.kneepoint.server.app.design.CheckRun;
import org.kneepoint.server.app.wording.CheckWording;

/** The results of a design check as rows of words and numbers with units, for the Check page and the report ({@code checkResults.jte}). */
final class CheckResults {

    private CheckResults() {
    }

    /** One result: what it is and its value with the unit. */
    record Row(String name, String value) {
    }

    static List<Row> rows(CheckRun run) {
        DesignCheckResult result = run.result();
        OperatingPoint point = result.point();
        List<Row> rows = new ArrayList<>(List.of(
                new Row("permeance coefficient Pc", format("%.4g", result.loadLine().pc())),
                new Row("field against the magnetization", CheckWording.field(result)),
                new Row("operating point", "H = " + kiloAmperes(point.h()) + ", B = " + tesla(point.b()) + ", J = " + tesla(point.j()))));
        if (result.kneeField() == null) {
            rows.add(new Row("knee (J = 0.9·Br)", "none: the curve does not fall to 0.9·Br"));
        } else {
            rows.add(new Row("knee (J = 0.9·Br) at this temperature", "H = " + kiloAmperes(result.kneeField())));
            rows.add(new Row("margin to the knee", kiloAmperes(result.kneeMarginField()) + "; " + kelvin(result.kneeMarginTemperature())));
        }
        String limit = " for a loss limit of " + format("%.2f %%", 100 * run.lossLimit());
        rows.add(new Row("reversible change of Br", format("%.2f %%", 100 * result.reversibleChange())));
        rows.add(new Row("irreversible loss", format("%.2f %%", 100 * result.irreversibleLoss()) + " (recoil line through the operating point)"));
        rows.add(new Row("minimum working temperature", CheckWording.limit(result.working().minimum(), false) + limit));
        rows.add(new Row("maximum working temperature", CheckWording.limit(result.working().maximum(), true) + limit));
        LocalKneeResult local = run.local();
        if (local != null) {
            rows.add(new Row("local check", format("%.1f %%", 100 * local.fractionBelowKnee()) + " of the volume below the knee ("
                    + local.resolution() + " cells per edge, " + local.cells() + " inside)"));
            rows.add(new Row("lowest local H", kiloAmperes(local.worstField()) + " at x = " + format("%.2f", 1000 * local.worstX())
                    + " mm, y = " + format("%.2f", 1000 * local.worstY()) + " mm, z = " + format("%.2f", 1000 * local.worstZ())
                    + " mm (" + local.worstRegion().name().toLowerCase(Locale.ROOT).replace('_', ' ') + ")"));
        }
        if (run.extrapolated()) {
            rows.add(new Row("extrapolated", "yes: T, T0 or a working temperature lies outside the measured temperatures"));
        }
        if (result.beyondMeasuredField()) {
            rows.add(new Row("beyond the measured field", "yes: the operating point lies below the field the grade's curve was"
                    + " measured to; the fitted knee model stands in there"));
        }
        return List.copyOf(rows);
    }

    private static String kelvin(Double margin) {
        if (margin == null) {
            return "the knee does not reach the point within the model's temperature range";
        }
        return margin >= 0 ? format("%.1f K hotter reaches the knee", margin) : format("%.1f K cooler leaves the knee", -margin);
    }

    private static String kiloAmperes(double field) {
        return format("%.1f kA/m", field / 1000.0);
    }

    private static String tesla(double value) {
        return format("%.4f T", value);
    }

    static String format(String pattern, double value) {
        return String.format(Locale.ROOT, pattern, value);
    }
}
