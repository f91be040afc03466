package org.kneepoint.server.text;

import java.util.LinkedHashMap;
import java.util.Map;
import org.kneepoint.fitter.shape.DemagnetizingFactors;
import org.kneepoint.fitter.shape.PermeanceCoefficients;
import org.kneepoint.fitter.units.QuantityFormatter;

/**
 * Demagnetizing factors and permeance coefficients as JSON ({@code demagnetizingFactor} and
 * {@code permeanceCoefficient}, each with {@code magnetometric}, {@code fluxmetric}, {@code center})
 * and as a table.
 */
public final class PermeanceView {

    private PermeanceView() {
    }

    /** The JSON object of one set of factors, keys in a fixed order. */
    public static Map<String, Object> json(DemagnetizingFactors factors) {
        PermeanceCoefficients pc = factors.permeanceCoefficients();
        Map<String, Object> json = new LinkedHashMap<>();
        json.put("demagnetizingFactor", triple(factors.magnetometric(), factors.fluxmetric(), factors.centrePoint()));
        json.put("permeanceCoefficient", triple(pc.magnetometric(), pc.fluxmetric(), pc.centrePoint()));
        return json;
    }

    private static Map<String, Double> triple(double magnetometric, double fluxmetric, double center) {
        Map<String, Double> values = new LinkedHashMap<>();
        values.put("magnetometric", magnetometric);
        values.put("fluxmetric", fluxmetric);
        values.put("center", center);
        return values;
    }

    /** A readable table of one set of factors under a one-line description of the magnet. */
    public static String table(String description, DemagnetizingFactors factors) {
        PermeanceCoefficients pc = factors.permeanceCoefficients();
        StringBuilder out = new StringBuilder(description).append('\n');
        out.append(String.format("  %-22s %-10s %s%n", "", "N", "Pc = (1 - N)/N"));
        row(out, "magnetometric Nm", factors.magnetometric(), pc.magnetometric());
        row(out, "fluxmetric Nf", factors.fluxmetric(), pc.fluxmetric());
        row(out, "centre point N0", factors.centrePoint(), pc.centrePoint());
        out.append("  Operating points use Nm unless asked otherwise.\n");
        return out.toString();
    }

    private static void row(StringBuilder out, String name, double factor, double coefficient) {
        out.append(String.format("  %-22s %-10s %s%n", name, QuantityFormatter.number(factor, 5), QuantityFormatter.number(coefficient, 5)));
    }
}
