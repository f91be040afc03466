package org.kneepoint.server.text;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.kneepoint.fitter.model.ja.JilesAthertonParameters;
import org.kneepoint.fitter.model.ja.LoopMetrics;
import org.kneepoint.fitter.model.ja.Trajectory;
import org.kneepoint.fitter.units.Dimension;
import org.kneepoint.fitter.units.QuantityFormatter;
import org.kneepoint.fitter.units.Unit;
import org.kneepoint.fitter.units.UnitCatalog;

/**
 * A simulated Jiles–Atherton major loop as JSON (keys {@code hc, mr, br, hcj, hcb, mMax, bMax,
 * lossPerCycle} in SI, the parameters and Hmax, and {@code points} as [H, B] pairs when asked
 * for) and as a readable table.
 */
public final class JilesAthertonLoopView {

    private static final Unit TESLA = UnitCatalog.require("T", Dimension.FLUX_DENSITY);
    private static final Unit KILO_AMPERE = UnitCatalog.require("kA/m", Dimension.FIELD_STRENGTH);
    private static final Unit MAGNETIZATION = UnitCatalog.require("kA/m", Dimension.MAGNETIZATION);
    private static final Unit ENERGY = UnitCatalog.require("J/m³", Dimension.ENERGY_PRODUCT);

    private JilesAthertonLoopView() {
    }

    /** The JSON object; {@code loop} may be null (no points asked for). */
    public static Map<String, Object> json(JilesAthertonParameters p, LoopMetrics m, Trajectory loop) {
        Map<String, Object> json = new LinkedHashMap<>();
        json.put("hc", m.hc());
        json.put("mr", m.mr());
        json.put("br", m.br());
        json.put("hcj", m.hcj());
        json.put("hcb", m.hcb());
        json.put("mMax", m.mMax());
        json.put("bMax", m.bMax());
        json.put("lossPerCycle", m.lossPerCycle());
        json.put("hMax", m.hMax());
        json.put("parameters", JilesAthertonFitView.parameters(p));
        if (loop != null) {
            double[] h = loop.field();
            double[] b = loop.fluxDensity();
            List<double[]> points = new ArrayList<>();
            for (int i = 0; i < h.length; i++) {
                points.add(new double[] {h[i], b[i]});
            }
            json.put("points", points);
        }
        return json;
    }

    /** A readable table; with a loop, a one-line summary of its points. */
    public static String table(JilesAthertonParameters p, LoopMetrics m, Trajectory loop) {
        StringBuilder out = new StringBuilder();
        out.append(String.format("Jiles–Atherton loop 0 → +Hmax → −Hmax → +Hmax, Hmax = %s (Ms %s, a %s, k %s, c %s, α %s)%n",
                QuantityFormatter.format(m.hMax(), KILO_AMPERE, 4), QuantityFormatter.format(p.ms(), MAGNETIZATION, 4),
                QuantityFormatter.format(p.a(), KILO_AMPERE, 4), QuantityFormatter.format(p.k(), KILO_AMPERE, 4),
                QuantityFormatter.number(p.c(), 4), QuantityFormatter.number(p.alpha(), 4)));
        row(out, "Hc = HcJ", QuantityFormatter.format(m.hc(), KILO_AMPERE, 5));
        row(out, "HcB", QuantityFormatter.format(m.hcb(), KILO_AMPERE, 5));
        row(out, "Mr", QuantityFormatter.format(m.mr(), MAGNETIZATION, 5));
        row(out, "Br", QuantityFormatter.format(m.br(), TESLA, 5));
        row(out, "M at Hmax", QuantityFormatter.format(m.mMax(), MAGNETIZATION, 5));
        row(out, "B at Hmax", QuantityFormatter.format(m.bMax(), TESLA, 5));
        row(out, "loss per cycle", QuantityFormatter.format(m.lossPerCycle(), ENERGY, 5));
        if (loop != null) {
            double[] b = loop.fluxDensity();
            double low = Double.POSITIVE_INFINITY;
            double high = Double.NEGATIVE_INFINITY;
            for (double value : b) {
                low = Math.min(low, value);
                high = Math.max(high, value);
            }
            row(out, "loop points", loop.size() + " (B from " + QuantityFormatter.format(low, TESLA, 4) + " to "
                    + QuantityFormatter.format(high, TESLA, 4) + "; --json lists them)");
        }
        return out.toString();
    }

    private static void row(StringBuilder out, String name, String value) {
        out.append(String.format("  %-16s %s%n", name, value));
    }
}
