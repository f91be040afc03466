package org.kneepoint.server.text;

import java.util.Locale;
import org.kneepoint.fitter.elements.ElementCheckResult;
import org.kneepoint.fitter.elements.LoadCaseResult;
import org.kneepoint.fitter.elements.TransverseRule;
import org.kneepoint.fitter.elements.WorstElement;
import org.kneepoint.server.app.elements.ElementCheckRun;
import org.kneepoint.server.app.wording.Cautions;
import org.kneepoint.server.app.wording.EngineeringUnits;

/**
 * An element check as a readable table: the summary, one row per load case, the worst elements and the cautions
 * (its JSON document is {@link org.kneepoint.server.app.elements.ElementCheckDocument}).
 */
public final class ElementCheckView {

    private ElementCheckView() {
    }

    /** A readable table of a check that ran. */
    public static String table(ElementCheckRun run) {
        ElementCheckResult result = run.result();
        StringBuilder out = new StringBuilder("Element check, ").append(result.elements()).append(" elements, ")
                .append(result.cases().size()).append(result.cases().size() == 1 ? " load case" : " load cases").append('\n')
                .append("  grade: ").append(run.model().description()).append('\n')
                .append("  curves at ").append(EngineeringUnits.celsius(run.lowestTemperature()));
        if (run.highestTemperature() > run.lowestTemperature()) {
            out.append(" to ").append(EngineeringUnits.celsius(run.highestTemperature()));
        }
        out.append("; transverse field: ").append(result.transverse() == TransverseRule.ALONG
                ? "only the component along the magnetization acts" : "Stoner-Wohlfarth astroid").append('\n');
        out.append(String.format(Locale.ROOT, "  volume: %.6g mm³%n", result.volume() * 1e9));
        out.append("  volume past the knee: ").append(EngineeringUnits.percent(result.volumeFractionPastKnee())).append('\n');
        out.append("  irreversible loss of the moment: ").append(EngineeringUnits.percent(result.irreversibleLoss()))
                .append(" (limit ").append(EngineeringUnits.percent(result.lossLimit())).append("): ")
                .append(result.withinLimit() ? "pass" : "FAIL").append('\n');
        String cases = "  %-5s %-36s %-18s %s%n";
        out.append(String.format(cases, "case", "file", "average H along", "past the knee"));
        int number = 1;
        for (LoadCaseResult loadCase : result.cases()) {
            out.append(String.format(cases, number++, loadCase.source(), EngineeringUnits.field(loadCase.averageFieldParallel()),
                    EngineeringUnits.percent(loadCase.volumeFractionPastKnee())));
        }
        out.append("  Worst elements (index from 0, in file order):\n");
        String worst = "  %-8s %-32s %-14s %-14s %s%n";
        out.append(String.format(worst, "index", "position (mm)", "H along", "knee margin", "loss"));
        for (WorstElement element : result.worstElements()) {
            out.append(String.format(worst, element.index(), String.format(Locale.ROOT, "%.4g, %.4g, %.4g", element.x() * 1e3,
                    element.y() * 1e3, element.z() * 1e3), EngineeringUnits.field(element.hParallel()),
                    element.margin() == null ? "no knee" : EngineeringUnits.field(element.margin()), EngineeringUnits.percent(element.loss())));
        }
        out.append("  The worst point of each element so far sets its recoil line; losses are shares of Br.\n");
        if (result.extrapolated()) {
            out.append("  Extrapolated: a temperature lies outside the measured temperatures.\n");
        }
        return out.append(Cautions.table(result.extrapolated())).toString();
    }
}
