package org.kneepoint.server.text;

import org.kneepoint.fitter.model.ja.JilesAthertonParameters;
import org.kneepoint.fitter.model.ja.LoopMetrics;
import org.kneepoint.fitter.model.ja.Trajectory;
import org.kneepoint.fitter.units.Dimension;
import org.kneepoint.fitter.units.QuantityFormatter;
import org.kneepoint.fitter.units.Unit;
import org.kneepoint.fitter.units.UnitCatalog;

/** A simulated Jiles–Atherton major loop as a readable table; its JSON document is {@code app.fits.JilesAthertonLoopDocument}. */
public final class JilesAthertonLoopView {

    private static final Unit TESLA = UnitCatalog.require("T", Dimension.FLUX_DENSITY);
    private static final Unit KILO_AMPERE = UnitCatalog.require("kA/m", Dimension.FIELD_STRENGTH);
    private static final Unit MAGNETIZATION = UnitCatalog.require("kA/m", Dimension.MAGNETIZATION);
    private static final Unit ENERGY = UnitCatalog.require("J/m³", Dimension.ENERGY_PRODUCT);

    private JilesAthertonLoopView() {
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
