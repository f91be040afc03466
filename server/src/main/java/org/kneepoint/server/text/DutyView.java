package org.kneepoint.server.text;

import org.kneepoint.server.app.wording.EngineeringUnits;
import org.kneepoint.server.app.wording.Cautions;
import org.kneepoint.fitter.loadline.DutyStepResult;
import org.kneepoint.server.app.design.DutyRun;

/**
 * A duty sequence as a readable table, one row per step (its JSON document is
 * {@link org.kneepoint.server.app.design.DutyDocument}).
 */
public final class DutyView {

    private DutyView() {
    }

    /** A readable table of a sequence that ran. */
    public static String table(DutyRun run) {
        String model = run.model().description();
        String loadLine = run.loadLine().describe();
        double pc = run.pc();
        boolean extrapolated = run.extrapolated();
        StringBuilder out = new StringBuilder("Duty sequence, ").append(loadLine).append(", Pc = ")
                .append(EngineeringUnits.number(pc)).append('\n').append(VerdictView.lines(run.verdict()))
                .append("  grade: ").append(model).append('\n');
        String format = "  %-5s %-12s %-16s %-14s %-12s %-14s %s%n";
        out.append(String.format(format, "step", "temperature", "opposing field", "H", "B", "loss this step", "loss so far"));
        int number = 1;
        for (DutyStepResult result : run.results()) {
            out.append(String.format(format, number++, EngineeringUnits.celsius(result.step().temperature()),
                    EngineeringUnits.field(result.loadLine().opposingField()), EngineeringUnits.field(result.point().h()),
                    EngineeringUnits.tesla(result.point().b()), EngineeringUnits.percent(result.stepLoss()),
                    EngineeringUnits.percent(result.irreversibleLoss())));
        }
        out.append("  The worst point so far sets the recoil line; losses are shares of Br.\n");
        if (extrapolated) {
            out.append("  Extrapolated: a step lies outside the measured temperatures.\n");
        }
        if (run.beyondMeasuredField()) {
            out.append("  Beyond the measured field: a step's point lies below the field its curve was measured to (the fitted"
                    + " knee model stands in there).\n");
        }
        return out.append(Cautions.table(extrapolated, run.beyondMeasuredField())).toString();
    }
}
