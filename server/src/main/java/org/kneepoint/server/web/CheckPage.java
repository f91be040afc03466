package org.kneepoint.server.web;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.UnaryOperator;
import org.kneepoint.db.LibraryReader;
import org.kneepoint.fitter.library.GradeSummary;
import org.kneepoint.fitter.loadline.DesignCheckResult;
import org.kneepoint.fitter.loadline.OperatingPoint;
import org.kneepoint.server.http.DesignRequests.CheckRun;
import org.kneepoint.server.text.Temperatures;

/**
 * The Check page ({@code /check}): a form — a grade of the library or one typed in, the load line, temperature,
 * opposing field, loss limit — and, once sent, the check's results, the operating-point chart and the cautions. The form sends the query
 * parameters of {@code GET /api/check}, so the page and the route compute the same check.
 */
final class CheckPage {

    private CheckPage() {
    }

    static String render(LibraryReader library, UnaryOperator<String> values, String query, CheckRun run, String problem,
            boolean demoPresent) {
        StringBuilder out = new StringBuilder("<h1>Check a design</h1>").append(FormFields.problem(problem));
        out.append("<form class=\"design\" method=\"get\" action=\"/check\">").append(grade(library, values))
                .append(FormFields.loadLine(values))
                .append("<fieldset><legend>Duty</legend><div class=\"fields\">")
                .append(FormFields.text(values, "temperature", "temperature", "120C"))
                .append(FormFields.text(values, "opposingField", "opposing field", "200kA/m"))
                .append(FormFields.text(values, "lossLimit", "loss limit", "1%"))
                .append("</div></fieldset><button type=\"submit\" class=\"primary\">Check</button></form>");
        if (run != null) {
            out.append(results(run, query));
        }
        return Layout.page("Check", "Check", out.toString(), demoPresent);
    }

    private static String grade(LibraryReader library, UnaryOperator<String> values) {
        List<String[]> options = new ArrayList<>();
        options.add(new String[] {"", "typed in below"});
        for (GradeSummary grade : library.grades(null)) {
            options.add(new String[] {grade.name(), grade.name()});
        }
        return "<fieldset><legend>Grade: from the library, or typed in</legend><div class=\"fields\">"
                + FormFields.choice(values, "grade", "grade", options) + "</div><div class=\"fields\">"
                + FormFields.text(values, "br", "Br", "1.3T") + FormFields.text(values, "muRec", "μrec", "1.05")
                + FormFields.text(values, "hcj", "HcJ", "1600kA/m") + FormFields.text(values, "knee", "Hk", "1450kA/m")
                + FormFields.text(values, "alpha", "α of Br", "-0.12%/K") + FormFields.text(values, "beta", "β of HcJ", "-0.6%/K")
                + FormFields.text(values, "referenceTemperature", "values at", "20C") + "</div></fieldset>";
    }

    private static String results(CheckRun run, String query) {
        StringBuilder out = new StringBuilder("<h2>Results at ").append(Html.text(Temperatures.celsius(run.result().temperature())))
                .append("</h2><p>").append(Html.text(run.model().description())).append("; ").append(Html.text(run.loadLine().describe()))
                .append(".</p>").append(resultsTable(run));
        out.append("<figure class=\"chart\"><img src=\"/charts/check.svg?").append(Html.text(query))
                .append("\" width=\"960\" height=\"560\" alt=\"Operating point on the load line\"><figcaption>B (solid) and J (dashed) ")
                .append("of the grade at the check's temperature, the load line and a ring at the operating point.</figcaption></figure>");
        return out.append(Layout.cautions(run.extrapolated())).toString();
    }

    /** The results of a check as an HTML table, for the page and the report. */
    static String resultsTable(CheckRun run) {
        DesignCheckResult result = run.result();
        OperatingPoint point = result.point();
        StringBuilder out = new StringBuilder("<table class=\"results\"><tbody>")
                .append(row("permeance coefficient Pc", format("%.4g", result.loadLine().pc())))
                .append(row("opposing field", kiloAmperes(result.loadLine().opposingField())))
                .append(row("operating point", "H = " + kiloAmperes(point.h()) + ", B = " + tesla(point.b()) + ", J = " + tesla(point.j())))
                .append(row("knee (J = 0.9·Br)", "H = " + kiloAmperes(result.kneeField())))
                .append(row("margin to the knee", kiloAmperes(result.kneeMarginField()) + "; " + kelvin(result.kneeMarginTemperature())))
                .append(row("reversible change of Br", format("%.2f %%", 100 * result.reversibleChange())))
                .append(row("irreversible loss", format("%.2f %%", 100 * result.irreversibleLoss())))
                .append(row("maximum working temperature", maximum(result) + " for a loss limit of " + format("%.2f %%", 100 * run.lossLimit())));
        if (run.extrapolated()) {
            out.append(row("extrapolated", "yes: T, T0 or the maximum working temperature lies outside the measured temperatures"));
        }
        return out.append("</tbody></table>").toString();
    }

    private static String row(String name, String value) {
        return "<tr><th scope=\"row\">" + name + "</th><td>" + Html.text(value) + "</td></tr>";
    }

    private static String kelvin(Double margin) {
        if (margin == null) {
            return "the knee does not reach the point within the model's temperature range";
        }
        return margin >= 0 ? format("%.1f K hotter reaches the knee", margin) : format("%.1f K cooler leaves the knee", -margin);
    }

    private static String maximum(DesignCheckResult result) {
        if (result.maxWorkingTemperature() == null) {
            return "none: the limit is exceeded already at the reference temperature";
        }
        String value = Temperatures.celsius(result.maxWorkingTemperature());
        return result.maxAtModelLimit() ? value + " (the top of the model's temperature range)" : value;
    }

    static String kiloAmperes(double field) {
        return format("%.1f kA/m", field / 1000.0);
    }

    static String tesla(double value) {
        return format("%.4f T", value);
    }

    static String format(String pattern, double value) {
        return String.format(Locale.ROOT, pattern, value);
    }
}
