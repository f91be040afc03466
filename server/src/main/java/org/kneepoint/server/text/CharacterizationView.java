package org.kneepoint.server.text;

import java.util.LinkedHashMap;
import java.util.Map;
import org.kneepoint.fitter.curve.Characterization;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.server.library.GradeCurve;
import org.kneepoint.fitter.units.Dimension;
import org.kneepoint.fitter.units.QuantityFormatter;
import org.kneepoint.fitter.units.Unit;
import org.kneepoint.fitter.units.UnitCatalog;

/**
 * A curve's characterization as JSON (the keys {@code br, hcb, hcj, bhMax, hAtBhMax, bAtBhMax, hk,
 * squareness, muRec, temperatureK} in SI, plus where μrec came from) and as a readable table.
 */
public final class CharacterizationView {

    private static final Unit TESLA = UnitCatalog.require("T", Dimension.FLUX_DENSITY);
    private static final Unit KILO_AMPERE = UnitCatalog.require("kA/m", Dimension.FIELD_STRENGTH);
    private static final Unit KILOJOULE = UnitCatalog.require("kJ/m³", Dimension.ENERGY_PRODUCT);
    private static final Unit CELSIUS = UnitCatalog.require("°C", Dimension.TEMPERATURE);
    private static final String NOT_REACHED = "not reached";

    private CharacterizationView() {
    }

    /** The JSON object of one characterization, keys in a fixed order. */
    public static Map<String, Object> json(GradeCurve gradeCurve, Characterization c) {
        DemagnetizationCurve curve = gradeCurve.curve();
        Map<String, Object> json = new LinkedHashMap<>();
        json.put("source", gradeCurve.grade());
        json.put("modeled", gradeCurve.modeled());
        json.put("extrapolated", gradeCurve.extrapolated());
        json.put("kind", curve.kind().name().toLowerCase());
        json.put("points", curve.size());
        json.put("temperatureK", c.temperatureK());
        json.put("br", c.br());
        json.put("hcb", c.hcb());
        json.put("hcj", c.hcj());
        json.put("bhMax", c.bhMax());
        json.put("hAtBhMax", c.hAtBhMax());
        json.put("bAtBhMax", c.bAtBhMax());
        json.put("hk", c.hk());
        json.put("squareness", c.squareness());
        json.put("muRec", c.muRec());
        Map<String, Object> window = new LinkedHashMap<>();
        window.put("from", c.recoilWindow().from());
        window.put("to", c.recoilWindow().to());
        window.put("points", c.recoilWindow().points());
        json.put("recoilWindow", window);
        return json;
    }

    /** A readable table of one characterization. */
    public static String table(GradeCurve gradeCurve, Characterization c) {
        DemagnetizationCurve curve = gradeCurve.curve();
        StringBuilder out = new StringBuilder();
        out.append(PlainText.printable(gradeCurve.grade())).append(": ")
                .append(gradeCurve.modeled() ? "modeled " : "").append(curve.kind().name().toLowerCase()).append(" curve, ")
                .append(curve.size()).append(" points, ")
                .append(c.temperatureK() == null ? "temperature not given" : QuantityFormatter.format(c.temperatureK(), CELSIUS, 5))
                .append(gradeCurve.extrapolated() ? " (EXTRAPOLATED beyond the measured temperatures)" : "")
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
