package org.kneepoint.server.text;

import org.kneepoint.server.app.wording.EngineeringUnits;
import org.kneepoint.server.app.wording.Cautions;
import java.util.List;
import org.kneepoint.fitter.select.RankedGrade;
import org.kneepoint.fitter.select.Requirements;
import org.kneepoint.server.app.design.SelectionDocument;
import org.kneepoint.server.app.design.SelectionRow;
import org.kneepoint.server.app.design.SelectionRun;
import org.kneepoint.server.app.design.SelectionSort;

/**
 * A grade selection as a table that ends with the cautions (its JSON document is one
 * {@link SelectionDocument} per grade).
 */
public final class SelectionView {

    private SelectionView() {
    }

    /** The readable table: a heading with the requirements, one row per grade, the sort key, the cautions. */
    public static String table(SelectionRun run) {
        List<SelectionRow> rows = run.rows();
        Requirements requirements = run.requirements();
        String loadLine = run.loadLine().describe();
        String sortedBy = SelectionSort.describe(run.order());
        StringBuilder out = new StringBuilder("Grade selection at ").append(EngineeringUnits.celsius(requirements.temperature()))
                .append(", ").append(loadLine).append(", Pc = ").append(EngineeringUnits.number(requirements.loadLine().pc()))
                .append(requirements.field().convention() == org.kneepoint.fitter.loadline.FieldConvention.EXTERNAL
                        ? ", external field on a free magnet " + EngineeringUnits.field(requirements.field().field()) + " (load line Ha = "
                                + EngineeringUnits.field(requirements.loadLine().opposingField()) + ")"
                        : ", opposing field (circuit convention) " + EngineeringUnits.field(requirements.loadLine().opposingField()))
                .append('\n');
        out.append("  requires: B at least ").append(requirements.minimumFluxDensity() == null ? "(any)"
                : EngineeringUnits.tesla(requirements.minimumFluxDensity())).append(", irreversible loss at most ")
                .append(EngineeringUnits.percent(requirements.maximumIrreversibleLoss())).append('\n');
        out.append(run.verdict().passes() ? VerdictView.lines(run.verdict()) : "  Verdict: " + PlainText.printable(run.verdict().summary())
                + " (each grade's reasons are in its row)\n");
        if (rows.isEmpty()) {
            out.append("  No grades in the library to select from.\n");
        }
        String format = "  %-24s %-16s %-12s %-11s %-14s %-10s %-16s %-9s %-5s %s%n";
        out.append(String.format(format, "grade", "family", "verdict", "B", "knee margin", "irr. loss", "max temp.", "price/kg", "extr.",
                "reasons"));
        boolean anyExtrapolated = false;
        for (SelectionRow row : rows) {
            anyExtrapolated |= row.extrapolated();
            RankedGrade ranked = row.ranked();
            out.append(String.format(format, PlainText.printable(row.grade()), PlainText.printable(row.family()),
                    !row.assessable() ? "not assessed" : row.passes() ? "meets" : "falls short",
                    ranked == null ? "-" : value(ranked.fluxDensity(), EngineeringUnits.tesla(ranked.fluxDensity())),
                    ranked == null ? "-" : value(ranked.kneeMarginField(), EngineeringUnits.field(ranked.kneeMarginField())),
                    ranked == null ? "-" : value(ranked.irreversibleLoss(), EngineeringUnits.percent(ranked.irreversibleLoss())),
                    ranked == null || !Double.isFinite(ranked.fluxDensity()) ? "-" : ranked.maxWorkingTemperature() == null
                            ? "none in range" : EngineeringUnits.celsius(ranked.maxWorkingTemperature()),
                    ranked == null || ranked.price() == null ? "-" : String.format(java.util.Locale.ROOT, "%.2f", ranked.price()),
                    row.extrapolated() ? "yes" : "no", PlainText.printable(String.join("; ", SelectionDocument.reasons(row, requirements)))));
        }
        out.append("  Grades that meet every requirement first, each group sorted by ").append(sortedBy)
                .append("; \"extr.\" marks a temperature model used outside its measured temperatures; \"none in range\" as the"
                        + " max. temp.: no temperature of the grade's model keeps the loss within the limit (it is not \"no limit\").\n");
        List<String> beyond = rows.stream().filter(row -> row.assessable() && row.ranked().beyondMeasuredField())
                .map(row -> PlainText.printable(row.grade())).toList();
        if (!beyond.isEmpty()) {
            out.append("  Beyond the measured field (the fitted knee model stands in for the data at the operating point): ")
                    .append(String.join(", ", beyond)).append(".\n");
        }
        return out.append(Cautions.table(anyExtrapolated, !beyond.isEmpty())).toString();
    }

    private static String value(double number, String text) {
        return Double.isFinite(number) ? text : "-";
    }
}
