package org.kneepoint.server.web;

import java.util.ArrayList;
import java.util.List;
import java.util.function.UnaryOperator;
import org.kneepoint.db.LibraryReader;
import org.kneepoint.fitter.select.RankedGrade;
import org.kneepoint.server.http.DesignRequests.SelectionRun;
import org.kneepoint.server.library.SelectionRow;
import org.kneepoint.server.library.SelectionSort;
import org.kneepoint.server.text.SelectionView;
import org.kneepoint.server.text.Temperatures;

/**
 * The Select page ({@code /select}): the requirements — load line, temperature, opposing field, least flux
 * density, largest irreversible loss, family, order — and, once sent, every grade ranked with pass or fail and the
 * reasons, then the cautions. The form sends the query parameters of {@code GET /api/select}.
 */
final class SelectPage {

    private SelectPage() {
    }

    static String render(LibraryReader library, UnaryOperator<String> values, SelectionRun run, String problem, boolean demoPresent) {
        List<String[]> families = new ArrayList<>();
        families.add(new String[] {"", "all families"});
        library.families().forEach(family -> families.add(new String[] {family, family}));
        StringBuilder out = new StringBuilder("<h1>Choose a grade</h1>").append(FormFields.problem(problem));
        out.append("<form class=\"design\" method=\"get\" action=\"/select\">").append(FormFields.loadLine(values))
                .append("<fieldset><legend>Requirements</legend><div class=\"fields\">")
                .append(FormFields.text(values, "temperature", "temperature", "120C"))
                .append(FormFields.text(values, "opposingField", "opposing field", "200kA/m"))
                .append(FormFields.text(values, "minFluxDensity", "least B", "1T"))
                .append(FormFields.text(values, "maxLoss", "largest irreversible loss", "1%")).append("</div><div class=\"fields\">")
                .append(FormFields.choice(values, "family", "family", families))
                .append(FormFields.choice(values, "sort", "order", List.of(new String[] {"flux", "flux density"},
                        new String[] {"margin", "margin to the knee"}, new String[] {"loss", "irreversible loss"},
                        new String[] {"temperature", "maximum working temperature"}, new String[] {"price", "price, cheapest first"})))
                .append("</div></fieldset><button type=\"submit\" class=\"primary\">Rank the grades</button></form>");
        if (run != null) {
            out.append(results(run));
        }
        return Layout.page("Select", "Select", out.toString(), demoPresent);
    }

    private static String results(SelectionRun run) {
        StringBuilder out = new StringBuilder("<h2>Grades at ").append(Html.text(Temperatures.celsius(run.requirements().temperature())))
                .append(", Pc = ").append(CheckPage.format("%.4g", run.requirements().loadLine().pc())).append("</h2>");
        if (run.rows().isEmpty()) {
            return out.append("<p class=\"empty\">No grades in the library to select from.</p>").toString();
        }
        out.append("<table class=\"ranking\"><thead><tr><th>Grade</th><th>Family</th><th>Result</th><th>B (T)</th>"
                + "<th>Knee margin (kA/m)</th><th>Irreversible loss (%)</th><th>Max. temperature</th><th>Price /kg</th><th>Extrapolated</th>"
                + "<th>Reasons</th></tr></thead><tbody>");
        boolean anyExtrapolated = false;
        for (SelectionRow row : run.rows()) {
            anyExtrapolated |= row.extrapolated();
            RankedGrade ranked = row.ranked();
            String result = !row.assessable() ? "n/a" : row.passes() ? "pass" : "fail";
            out.append("<tr class=\"").append(result.equals("n/a") ? "unassessed" : result).append("\"><td>")
                    .append(Html.link("/grades/" + Html.pathSegment(row.grade()), row.grade())).append("</td><td>")
                    .append(Html.text(row.family())).append("</td><td>").append(result).append("</td>")
                    .append(number(ranked == null ? Double.NaN : ranked.fluxDensity(), "%.4f", 1))
                    .append(number(ranked == null ? Double.NaN : ranked.kneeMarginField(), "%.1f", 1000))
                    .append(number(ranked == null ? Double.NaN : 100 * ranked.irreversibleLoss(), "%.2f", 1))
                    .append("<td>").append(maximum(ranked)).append("</td>")
                    .append(number(ranked == null || ranked.price() == null ? Double.NaN : ranked.price(), "%.2f", 1))
                    .append("<td>").append(row.extrapolated() ? "yes" : "no")
                    .append("</td><td>").append(Html.text(String.join("; ", SelectionView.reasons(row, run.requirements()))))
                    .append("</td></tr>");
        }
        out.append("</tbody></table><p class=\"hint\">Passing grades first, each group sorted by ")
                .append(Html.text(SelectionSort.describe(run.order()))).append("; — means the grade gives no value.</p>");
        return out.append(Layout.cautions(anyExtrapolated)).toString();
    }

    private static String maximum(RankedGrade ranked) {
        if (ranked == null || !Double.isFinite(ranked.fluxDensity())) {
            return "—";
        }
        return ranked.maxWorkingTemperature() == null ? "none" : Html.text(Temperatures.celsius(ranked.maxWorkingTemperature()));
    }

    private static String number(double value, String pattern, double divisor) {
        return "<td class=\"number\">" + (Double.isFinite(value) ? CheckPage.format(pattern, value / divisor) : "—") + "</td>";
    }
}
