package org.kneepoint.server.text;

import org.kneepoint.server.app.grades.CurveDocument;
import org.kneepoint.fitter.units.Dimension;
import org.kneepoint.fitter.units.QuantityFormatter;
import org.kneepoint.fitter.units.Unit;
import org.kneepoint.fitter.units.UnitCatalog;

/** A curve's characterization ({@link CurveDocument}) as a readable table. */
public final class CharacterizationView {

    private static final Unit TESLA = UnitCatalog.require("T", Dimension.FLUX_DENSITY);
    private static final Unit KILO_AMPERE = UnitCatalog.require("kA/m", Dimension.FIELD_STRENGTH);
    private static final Unit KILOJOULE = UnitCatalog.require("kJ/m³", Dimension.ENERGY_PRODUCT);
    private static final Unit CELSIUS = UnitCatalog.require("°C", Dimension.TEMPERATURE);
    private static final String NOT_REACHED = "not reached";

    private CharacterizationView() {
    }

    /** A readable table of one characterization. */
    public static String table(CurveDocument c) {
        StringBuilder out = new StringBuilder();
        out.append(PlainText.printable(c.source())).append(": ")
                .append(c.modeled() ? "modeled " : "").append(c.kind()).append(" curve, ")
                .append(c.points()).append(" points, ")
                .append(c.temperatureK() == null ? "temperature not given" : QuantityFormatter.format(c.temperatureK(), CELSIUS, 5))
                .append(c.extrapolated() ? " (EXTRAPOLATED beyond the measured temperatures)" : "")
                .append('\n');
        row(out, "Br", QuantityFormatter.format(c.br(), TESLA, 4));
        row(out, "HcB", field(c.hcb()));
        row(out, "HcJ", field(c.hcj()));
        row(out, "(BH)max", c.bhMax() == null ? NOT_REACHED : QuantityFormatter.format(c.bhMax(), KILOJOULE, 4)
                + " at H = " + QuantityFormatter.format(c.hAtBhMax(), KILO_AMPERE, 4)
                + ", B = " + QuantityFormatter.format(c.bAtBhMax(), TESLA, 4));
        row(out, "Hk (J = 0.9 Br)", field(c.hk()));
        row(out, "squareness Hk/HcJ", c.squareness() == null ? NOT_REACHED : QuantityFormatter.number(c.squareness(), 3));
        row(out, "recoil permeability", QuantityFormatter.number(c.muRec(), 4) + " (line fitted on H = "
                + QuantityFormatter.format(c.recoilWindow().from(), KILO_AMPERE, 4) + " to 0, "
                + (c.recoilWindow().points() > 0 ? c.recoilWindow().points() + " points)" : "interpolated)"));
        return out.toString();
    }

    private static String field(Double value) {
        return value == null ? NOT_REACHED : QuantityFormatter.format(value, KILO_AMPERE, 4);
    }

    private static void row(StringBuilder out, String name, String value) {
        out.append(String.format("  %-20s %s%n", name, value));
    }
}
