package org.kneepoint.server.text;

import java.util.Locale;
import java.util.Map;
import org.kneepoint.fitter.study.OutputSummary;
import org.kneepoint.fitter.study.ToleranceStudyResult;
import org.kneepoint.server.app.design.CheckRun;
import org.kneepoint.server.app.wording.EngineeringUnits;

/**
 * A check's tolerance study as a readable table under the check's own ({@link CheckView}): the spread of each output,
 * the probability over the loss limit, the worst corner and the sensitivity shares. Empty without a study.
 */
public final class ToleranceView {

    private static final Map<String, String> LABELS = Map.of("b", "B (T)", "h", "H (A/m)", "j", "J (T)",
            "irreversibleLossPercent", "irreversible loss (%)", "reversibleLossPercent", "reversible change (%)",
            "maxWorkingTemperatureK", "max working temp. (K)");

    private ToleranceView() {
    }

    /** The table, or an empty string when the check ran without tolerances. */
    public static String table(CheckRun run) {
        ToleranceStudyResult study = run.tolerance();
        if (study == null) {
            return "";
        }
        StringBuilder out = new StringBuilder();
        out.append(String.format(Locale.ROOT, "Tolerance study: %d samples, %s bands (a band is a 3σ process limit), seed %d%n",
                study.samples(), study.distribution().label(), study.seed()));
        out.append(String.format(Locale.ROOT, "  %-24s %12s %12s %12s %12s %12s %12s %12s%n", "output", "mean", "sd", "p05", "p50",
                "p95", "min", "max"));
        study.results().forEach((key, summary) -> out.append(row(LABELS.get(key), summary)));
        out.append(String.format(Locale.ROOT, "  %-24s %s of the samples%n", "over the loss limit",
                EngineeringUnits.percent(study.probabilityOverLossLimit())));
        StringBuilder corner = new StringBuilder();
        study.worstCase().inputs().forEach((name, value) -> corner.append(corner.length() == 0 ? "" : ", ").append(name).append(" = ")
                .append(EngineeringUnits.number(value)));
        Double loss = study.worstCase().results().get("irreversibleLossPercent");
        out.append(String.format(Locale.ROOT, "  %-24s %s (SI) gives B = %s, irreversible loss %s%n", "worst corner", corner,
                EngineeringUnits.tesla(study.worstCase().results().get("b")),
                loss == null ? "none" : EngineeringUnits.number(loss) + " %"));
        StringBuilder shares = new StringBuilder();
        study.sensitivity().forEach(share -> shares.append(shares.length() == 0 ? "" : ", ").append(share.input()).append(' ')
                .append(EngineeringUnits.percent(share.share())));
        out.append(String.format(Locale.ROOT, "  %-24s %s (of the variance of %s)%n", "sensitivity", shares, study.sensitivityOutput()));
        return out.toString();
    }

    private static String row(String label, OutputSummary summary) {
        if (summary == null) {
            return String.format(Locale.ROOT, "  %-24s none in any sample%n", label);
        }
        return String.format(Locale.ROOT, "  %-24s %12.6g %12.6g %12.6g %12.6g %12.6g %12.6g %12.6g%n", label, summary.mean(),
                summary.sd(), summary.p05(), summary.p50(), summary.p95(), summary.min(), summary.max());
    }
}
