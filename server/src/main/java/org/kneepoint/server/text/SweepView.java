package org.kneepoint.server.text;

import java.util.Locale;
import org.kneepoint.fitter.study.SweepPoint;
import org.kneepoint.server.app.design.SweepRun;
import org.kneepoint.server.app.wording.Cautions;
import org.kneepoint.server.app.wording.EngineeringUnits;

/** A temperature sweep as a readable table and as CSV (its JSON document is {@link org.kneepoint.server.app.design.SweepDocument}). */
public final class SweepView {

    /** The CSV header: SI units in the column names. */
    public static final String CSV_HEADER = "temperature_K,H_A_per_m,B_T,J_T,reversible_loss_percent,irreversible_loss_percent,"
            + "knee_margin_A_per_m,extrapolated";

    private SweepView() {
    }

    /** One row per temperature, then the working temperatures and the cautions. */
    public static String table(SweepRun run) {
        StringBuilder out = new StringBuilder();
        out.append("Temperature sweep, ").append(run.loadLine().describe()).append(", Pc = ").append(EngineeringUnits.number(run.pc()))
                .append('\n').append(VerdictView.lines(run.verdict())).append(String.format(Locale.ROOT, "  grade %s%n", run.model().description()));
        out.append(String.format(Locale.ROOT, "  %10s %12s %8s %8s %12s %12s %14s%n", "T", "H (kA/m)", "B (T)", "J (T)",
                "reversible", "irreversible", "knee margin"));
        for (SweepPoint point : run.sweep().points()) {
            out.append(String.format(Locale.ROOT, "  %10s %12.2f %8.4f %8.4f %11.3f%% %11.3f%% %14s%s%n",
                    EngineeringUnits.celsius(point.temperature()), point.h() / 1000.0, point.b(), point.j(),
                    100.0 * point.reversibleChange(), 100.0 * point.irreversibleLoss(),
                    point.kneeMarginH() == null ? "no knee" : String.format(Locale.ROOT, "%.1f kA/m", point.kneeMarginH() / 1000.0),
                    point.extrapolated() ? " (extrapolated)" : ""));
        }
        Double minimum = run.sweep().working().minimum().temperature();
        Double maximum = run.sweep().working().maximum().temperature();
        out.append(String.format(Locale.ROOT, "  working temperatures for a loss limit of %s: %s to %s%n",
                EngineeringUnits.percent(run.lossLimit()), minimum == null ? "not found in the model's range" : EngineeringUnits.celsius(minimum),
                maximum == null ? "not found in the model's range" : EngineeringUnits.celsius(maximum)));
        return out.append(Cautions.table(run.extrapolated(), run.beyondMeasuredField())).toString();
    }

    /** The sweep as CSV: {@link #CSV_HEADER}, then one row per temperature (SI, full precision). */
    public static String csv(SweepRun run) {
        StringBuilder out = new StringBuilder(CSV_HEADER).append('\n');
        for (SweepPoint point : run.sweep().points()) {
            out.append(point.temperature()).append(',').append(point.h()).append(',').append(point.b()).append(',').append(point.j())
                    .append(',').append(100.0 * point.reversibleChange()).append(',').append(100.0 * point.irreversibleLoss()).append(',')
                    .append(point.kneeMarginH() == null ? "" : point.kneeMarginH().toString()).append(',').append(point.extrapolated())
                    .append('\n');
        }
        return out.toString();
    }
}
