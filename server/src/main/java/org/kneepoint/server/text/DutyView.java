package org.kneepoint.server.text;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.kneepoint.fitter.loadline.DutyStepResult;

/**
 * A duty sequence as JSON ({@code pc, steps [{temperatureK, opposingField, operatingPoint {h, b, j},
 * stepLossPercent, irreversibleLossPercent}], extrapolated, cautions}, SI) and as a table, one row per step;
 * {@code extrapolated} says whether a step lies outside the grade's measured temperatures.
 */
public final class DutyView {

    private DutyView() {
    }

    /** The JSON object of a sequence. */
    public static Map<String, Object> json(double pc, List<DutyStepResult> results, boolean extrapolated) {
        List<Map<String, Object>> steps = new ArrayList<>();
        for (DutyStepResult result : results) {
            Map<String, Object> step = new LinkedHashMap<>();
            step.put("temperatureK", result.step().temperature());
            step.put("opposingField", result.step().opposingField());
            step.put("operatingPoint", CheckView.point(result.point()));
            step.put("stepLossPercent", 100.0 * result.stepLoss());
            step.put("irreversibleLossPercent", 100.0 * result.irreversibleLoss());
            steps.add(step);
        }
        Map<String, Object> json = new LinkedHashMap<>();
        json.put("pc", pc);
        json.put("steps", steps);
        json.put("extrapolated", extrapolated);
        json.put("cautions", Cautions.of(extrapolated));
        return json;
    }

    /** A readable table of a sequence; {@code model} says where the grade's model comes from. */
    public static String table(String model, String loadLine, double pc, List<DutyStepResult> results, boolean extrapolated) {
        StringBuilder out = new StringBuilder("Duty sequence, ").append(loadLine).append(", Pc = ")
                .append(EngineeringUnits.number(pc)).append('\n').append("  grade: ").append(model).append('\n');
        String format = "  %-5s %-12s %-16s %-14s %-12s %-14s %s%n";
        out.append(String.format(format, "step", "temperature", "opposing field", "H", "B", "loss this step", "loss so far"));
        int number = 1;
        for (DutyStepResult result : results) {
            out.append(String.format(format, number++, EngineeringUnits.celsius(result.step().temperature()),
                    EngineeringUnits.field(result.step().opposingField()), EngineeringUnits.field(result.point().h()),
                    EngineeringUnits.tesla(result.point().b()), EngineeringUnits.percent(result.stepLoss()),
                    EngineeringUnits.percent(result.irreversibleLoss())));
        }
        out.append("  The worst point so far sets the recoil line; losses are shares of Br.\n");
        if (extrapolated) {
            out.append("  Extrapolated: a step lies outside the measured temperatures.\n");
        }
        return out.append(Cautions.table(extrapolated)).toString();
    }
}
