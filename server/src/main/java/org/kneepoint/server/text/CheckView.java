package org.kneepoint.server.text;

import java.util.LinkedHashMap;
import java.util.Map;
import org.kneepoint.fitter.loadline.DesignCheckResult;
import org.kneepoint.fitter.loadline.LocalKneeResult;
import org.kneepoint.fitter.loadline.OperatingPoint;

/**
 * A design check as JSON ({@code pc, operatingPoint {h, b, j}, reversibleLossPercent,
 * irreversibleLossPercent, kneeMarginH, maxWorkingTemperatureK, extrapolated, cautions}, SI) and as a table.
 * {@code reversibleLossPercent} is 100·(Br(T)/Br(T0) − 1), negative when the flux falls; {@code extrapolated}
 * says whether the grade's temperature model was used outside its measured temperatures.
 */
public final class CheckView {

    private CheckView() {
    }

    /** The JSON object of one check. */
    public static Map<String, Object> json(DesignCheckResult result, boolean extrapolated) {
        Map<String, Object> json = new LinkedHashMap<>();
        json.put("pc", result.loadLine().pc());
        json.put("operatingPoint", point(result.point()));
        json.put("reversibleLossPercent", 100.0 * result.reversibleChange());
        json.put("irreversibleLossPercent", 100.0 * result.irreversibleLoss());
        json.put("kneeMarginH", result.kneeMarginField());
        json.put("maxWorkingTemperatureK", result.maxWorkingTemperature());
        json.put("extrapolated", extrapolated);
        json.put("cautions", Cautions.of(extrapolated));
        return json;
    }

    static Map<String, Double> point(OperatingPoint point) {
        Map<String, Double> json = new LinkedHashMap<>();
        json.put("h", point.h());
        json.put("b", point.b());
        json.put("j", point.j());
        return json;
    }

    /**
     * A readable table of one check; {@code model} says where the grade's model comes from, {@code lossLimit} is
     * the fraction the maximum temperature was found for, {@code local} the local check of the shape, or null
     * when the load line was given by its Pc.
     */
    public static String table(String model, String loadLine, DesignCheckResult result, double lossLimit, LocalKneeResult local,
            boolean extrapolated) {
        OperatingPoint point = result.point();
        StringBuilder out = new StringBuilder();
        out.append("Design check at ").append(EngineeringUnits.celsius(result.temperature())).append(", ").append(loadLine)
                .append(", Pc = ").append(EngineeringUnits.number(result.loadLine().pc())).append(", opposing field ")
                .append(EngineeringUnits.field(result.loadLine().opposingField())).append('\n');
        row(out, "grade", model);
        if (extrapolated) {
            row(out, "extrapolated", "yes: T, T0 or the maximum working temperature lies outside the measured temperatures");
        }
        row(out, "operating point", "H = " + EngineeringUnits.field(point.h()) + ", B = " + EngineeringUnits.tesla(point.b())
                + ", J = " + EngineeringUnits.tesla(point.j()) + ", -B·H = " + EngineeringUnits.energy(point.energyProduct()));
        row(out, "knee (J = 0.9 Br)", "H = " + EngineeringUnits.field(result.kneeField()));
        row(out, "margin to the knee", EngineeringUnits.field(result.kneeMarginField()) + ", " + kelvin(result.kneeMarginTemperature()));
        row(out, "reversible change", EngineeringUnits.percent(result.reversibleChange()) + " of Br, "
                + EngineeringUnits.percent(result.fluxChange()) + " of B at the point (against the reference temperature)");
        row(out, "irreversible loss", EngineeringUnits.percent(result.irreversibleLoss()) + " of Br (the same share at the reference)");
        row(out, "max working temp.", maximum(result) + " for a loss limit of " + EngineeringUnits.percent(lossLimit));
        if (local != null) {
            row(out, "local check", EngineeringUnits.percent(local.fractionBelowKnee()) + " of the volume below the knee ("
                    + local.resolution() + " cells per edge, " + local.cells() + " inside)");
            row(out, "lowest local H", EngineeringUnits.field(local.worstField()) + " at x = " + EngineeringUnits.millimetres(local.worstX())
                    + ", y = " + EngineeringUnits.millimetres(local.worstY()) + ", z = " + EngineeringUnits.millimetres(local.worstZ())
                    + " (" + local.worstRegion().name().toLowerCase().replace('_', ' ') + ")");
        }
        return out.append(Cautions.table(extrapolated)).toString();
    }

    private static String kelvin(Double margin) {
        if (margin == null) {
            return "the knee does not reach the point within the model's temperature range";
        }
        return margin >= 0 ? EngineeringUnits.number(margin) + " K hotter reaches the knee"
                : EngineeringUnits.number(-margin) + " K cooler leaves the knee";
    }

    private static String maximum(DesignCheckResult result) {
        if (result.maxWorkingTemperature() == null) {
            return "none: the limit is exceeded already at the reference temperature";
        }
        String value = EngineeringUnits.celsius(result.maxWorkingTemperature());
        return result.maxAtModelLimit() ? value + " (the top of the model's temperature range)" : value;
    }

    private static void row(StringBuilder out, String name, String value) {
        out.append(String.format("  %-20s %s%n", name, value));
    }
}
