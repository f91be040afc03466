package org.kneepoint.server.text;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.kneepoint.fitter.select.RankedGrade;
import org.kneepoint.fitter.select.Requirements;
import org.kneepoint.server.library.SelectionRow;

/**
 * A grade selection as JSON (an array of rows {@code grade, family, assessable, pass, reasons, fluxDensity,
 * kneeMarginH, irreversibleLossPercent, maxWorkingTemperatureK, extrapolated}, SI, null where a grade gives
 * no value) and as a table that ends with the cautions.
 */
public final class SelectionView {

    private SelectionView() {
    }

    /** The JSON array, in ranked order. */
    public static List<Map<String, Object>> json(List<SelectionRow> rows, Requirements requirements) {
        List<Map<String, Object>> json = new ArrayList<>();
        for (SelectionRow row : rows) {
            RankedGrade ranked = row.ranked();
            Map<String, Object> entry = new LinkedHashMap<>();
            entry.put("grade", row.grade());
            entry.put("family", row.family());
            entry.put("assessable", row.assessable());
            entry.put("pass", row.passes());
            entry.put("reasons", reasons(row, requirements));
            entry.put("fluxDensity", ranked == null ? null : JsonNumbers.finite(ranked.fluxDensity()));
            entry.put("kneeMarginH", ranked == null ? null : JsonNumbers.finite(ranked.kneeMarginField()));
            entry.put("irreversibleLossPercent", ranked == null ? null : JsonNumbers.finite(100.0 * ranked.irreversibleLoss()));
            entry.put("maxWorkingTemperatureK", ranked == null ? null : ranked.maxWorkingTemperature());
            entry.put("extrapolated", row.extrapolated());
            entry.put("price", ranked == null ? null : ranked.price());
            json.add(entry);
        }
        return json;
    }

    /** Why a grade fails or cannot be assessed, one sentence each; empty when it passes. */
    public static List<String> reasons(SelectionRow row, Requirements requirements) {
        if (!row.assessable()) {
            return List.of("not assessable: " + row.notAssessable());
        }
        RankedGrade ranked = row.ranked();
        return ranked.shortfalls().stream().map(shortfall -> switch (shortfall.requirement()) {
            case MINIMUM_FLUX_DENSITY -> "flux density " + EngineeringUnits.tesla(ranked.fluxDensity()) + " is below the minimum "
                    + EngineeringUnits.tesla(requirements.minimumFluxDensity());
            case MAXIMUM_IRREVERSIBLE_LOSS -> "irreversible loss " + EngineeringUnits.percent(ranked.irreversibleLoss())
                    + " exceeds the maximum " + EngineeringUnits.percent(requirements.maximumIrreversibleLoss());
            case TEMPERATURE_RANGE -> EngineeringUnits.celsius(requirements.temperature()) + " lies "
                    + EngineeringUnits.number(shortfall.by()) + " K outside the range of the grade's temperature model";
        }).toList();
    }

    /** The readable table: a heading with the requirements, one row per grade, the sort key, the cautions. */
    public static String table(List<SelectionRow> rows, Requirements requirements, String loadLine, String sortedBy) {
        StringBuilder out = new StringBuilder("Grade selection at ").append(EngineeringUnits.celsius(requirements.temperature()))
                .append(", ").append(loadLine).append(", Pc = ").append(EngineeringUnits.number(requirements.loadLine().pc()))
                .append(", opposing field ").append(EngineeringUnits.field(requirements.loadLine().opposingField())).append('\n');
        out.append("  requires: B at least ").append(requirements.minimumFluxDensity() == null ? "(any)"
                : EngineeringUnits.tesla(requirements.minimumFluxDensity())).append(", irreversible loss at most ")
                .append(EngineeringUnits.percent(requirements.maximumIrreversibleLoss())).append('\n');
        if (rows.isEmpty()) {
            out.append("  No grades in the library to select from.\n");
        }
        String format = "  %-24s %-16s %-6s %-11s %-14s %-10s %-12s %-9s %-5s %s%n";
        out.append(String.format(format, "grade", "family", "result", "B", "knee margin", "irr. loss", "max temp.", "price/kg", "extr.",
                "reasons"));
        boolean anyExtrapolated = false;
        for (SelectionRow row : rows) {
            anyExtrapolated |= row.extrapolated();
            RankedGrade ranked = row.ranked();
            out.append(String.format(format, PlainText.printable(row.grade()), PlainText.printable(row.family()),
                    !row.assessable() ? "n/a" : row.passes() ? "pass" : "fail",
                    ranked == null ? "-" : value(ranked.fluxDensity(), EngineeringUnits.tesla(ranked.fluxDensity())),
                    ranked == null ? "-" : value(ranked.kneeMarginField(), EngineeringUnits.field(ranked.kneeMarginField())),
                    ranked == null ? "-" : value(ranked.irreversibleLoss(), EngineeringUnits.percent(ranked.irreversibleLoss())),
                    ranked == null || !Double.isFinite(ranked.fluxDensity()) ? "-" : ranked.maxWorkingTemperature() == null ? "none"
                            : EngineeringUnits.celsius(ranked.maxWorkingTemperature()),
                    ranked == null || ranked.price() == null ? "-" : String.format(java.util.Locale.ROOT, "%.2f", ranked.price()),
                    row.extrapolated() ? "yes" : "no", PlainText.printable(String.join("; ", reasons(row, requirements)))));
        }
        out.append("  Passing grades first, each group sorted by ").append(sortedBy)
                .append("; \"extr.\" marks a temperature model used outside its measured temperatures.\n");
        return out.append(Cautions.table(anyExtrapolated)).toString();
    }

    private static String value(double number, String text) {
        return Double.isFinite(number) ? text : "-";
    }
}
