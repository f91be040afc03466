package org.kneepoint.server.text;

import org.kneepoint.fitter.shape.DemagnetizingFactors;
import org.kneepoint.fitter.shape.PermeanceCoefficients;
import org.kneepoint.fitter.units.QuantityFormatter;

/** Demagnetizing factors and permeance coefficients as a table; their JSON document is {@code app.design.PermeanceDocument}. */
public final class PermeanceView {

    private PermeanceView() {
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
