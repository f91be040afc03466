package org.kneepoint.server.web;

import java.util.ArrayList;
import java.util.List;
import java.util.function.UnaryOperator;
import org.kneepoint.db.LibraryReader;
import org.kneepoint.fitter.select.RankedGrade;
import org.kneepoint.server.app.design.SelectionRun;
import org.kneepoint.server.app.design.SelectionRow;
import org.kneepoint.server.app.design.SelectionSort;
import org.kneepoint.server.app.design.SelectionDocument;
import org.kneepoint.server.app.design.Verdict;
import org.kneepoint.server.app.wording.Temperatures;

/**
 * The Select page ({@code /select}, template {@code select.jte}): the requirements — load line, temperature,
 * opposing field, least flux density, largest irreversible loss, family, order — and, once sent, every grade
 * ranked with pass or fail and the reasons, then the cautions. The form sends the query parameters of
 * {@code GET /api/select}.
 */
final class SelectPage {

    private static final String MEETS = "meets";
    private static final String NOT_ASSESSED = "not assessed";

    private SelectPage() {
    }

    /** What the page shows: the problem of the request (or null), the form's fields, and the ranking once sent (or null). */
    record View(Layout.Frame frame, String problem, FormFields.LoadLine loadLine, List<FormFields.TextField> requirements,
            FormFields.Choice family, FormFields.Choice order, Ranking ranking) {
    }

    /** The ranking: its temperature and Pc, a row per grade, the order in words, whether any row is extrapolated, the verdict. */
    record Ranking(String temperature, String pc, List<Row> rows, String order, boolean extrapolated, Verdict verdict) {
    }

    /** One grade's row; {@code result} is "meets", "falls short" or "not assessed", and "—" stands where the grade gives no value. */
    record Row(Links.Link grade, String family, String result, String flux, String kneeMargin, String loss, String maximum,
            String price, boolean extrapolated, String reasons) {

        /** The row's class: "meets", "short" or "unassessed". */
        String rowClass() {
            return result.equals(NOT_ASSESSED) ? "unassessed" : result.equals(MEETS) ? "meets" : "short";
        }
    }

    static String render(LibraryReader library, UnaryOperator<String> values, SelectionRun run, String problem, boolean demoPresent) {
        List<String[]> families = new ArrayList<>();
        families.add(new String[] {"", "all families"});
        library.families().forEach(family -> families.add(new String[] {family, family}));
        List<FormFields.TextField> requirements = List.of(FormFields.text(values, "temperature", "temperature", "120C"),
                FormFields.text(values, "opposingField", "opposing field (circuit)", "200kA/m"),
                FormFields.text(values, "externalField", "or external field (free magnet)", "300kA/m"),
                FormFields.text(values, "minFluxDensity", "least B", "1T"),
                FormFields.text(values, "maxLoss", "largest irreversible loss", "1%"));
        FormFields.Choice order = FormFields.choice(values, "sort", "order", List.of(new String[] {"flux", "flux density"},
                new String[] {"margin", "margin to the knee"}, new String[] {"loss", "irreversible loss"},
                new String[] {"temperature", "maximum working temperature"}, new String[] {"price", "price, cheapest first"}));
        View view = new View(new Layout.Frame("Select", "Select", demoPresent), problem, FormFields.loadLine(values), requirements,
                FormFields.choice(values, "family", "family", families), order, run == null ? null : ranking(run));
        return Templates.render("select.jte", view);
    }

    private static Ranking ranking(SelectionRun run) {
        List<Row> rows = run.rows().stream().map(row -> row(row, run)).toList();
        return new Ranking(Temperatures.celsius(run.requirements().temperature()), CheckResults.format("%.4g", run.requirements().loadLine().pc()),
                rows, SelectionSort.describe(run.order()), rows.stream().anyMatch(Row::extrapolated), run.verdict());
    }

    private static Row row(SelectionRow row, SelectionRun run) {
        RankedGrade ranked = row.ranked();
        String result = !row.assessable() ? NOT_ASSESSED : row.passes() ? MEETS : "falls short";
        return new Row(Links.Link.toGrade(row.grade()), row.family(), result,
                number(ranked == null ? Double.NaN : ranked.fluxDensity(), "%.4f", 1),
                number(ranked == null ? Double.NaN : ranked.kneeMarginField(), "%.1f", 1000),
                number(ranked == null ? Double.NaN : 100 * ranked.irreversibleLoss(), "%.2f", 1), maximum(ranked),
                number(ranked == null || ranked.price() == null ? Double.NaN : ranked.price(), "%.2f", 1), row.extrapolated(),
                String.join("; ", SelectionDocument.reasons(row, run.requirements())));
    }

    private static String maximum(RankedGrade ranked) {
        if (ranked == null || !Double.isFinite(ranked.fluxDensity())) {
            return "—";
        }
        return ranked.maxWorkingTemperature() == null ? "none in range" : Temperatures.celsius(ranked.maxWorkingTemperature());
    }

    private static String number(double value, String pattern, double divisor) {
        return Double.isFinite(value) ? CheckResults.format(pattern, value / divisor) : "—";
    }
}
