package org.kneepoint.server.text;

import org.kneepoint.fitter.model.ja.JilesAthertonFit;
import org.kneepoint.fitter.model.ja.JilesAthertonParameters;
import org.kneepoint.fitter.model.ja.JilesAthertonStandardErrors;
import org.kneepoint.fitter.units.Dimension;
import org.kneepoint.fitter.units.QuantityFormatter;
import org.kneepoint.fitter.units.Unit;
import org.kneepoint.fitter.units.UnitCatalog;

/** A Jiles–Atherton fit as a readable table; its JSON document is {@code app.fits.JilesAthertonFitDocument}. */
public final class JilesAthertonFitView {

    private static final Unit KILO_AMPERE = UnitCatalog.require("kA/m", Dimension.FIELD_STRENGTH);
    private static final Unit MAGNETIZATION = UnitCatalog.require("kA/m", Dimension.MAGNETIZATION);
    private static final Unit TESLA = UnitCatalog.require("T", Dimension.FLUX_DENSITY);
    private static final String[] NAMES = {"Ms", "a", "k", "c", "α"};

    private JilesAthertonFitView() {
    }

    /** A readable table, headed by {@code title}. */
    public static String table(String title, JilesAthertonFit fit) {
        JilesAthertonParameters p = fit.parameters();
        JilesAthertonStandardErrors e = fit.standardErrors();
        StringBuilder out = new StringBuilder(title).append('\n');
        row(out, "Ms", QuantityFormatter.format(p.ms(), MAGNETIZATION, 5), error(e.ms(), MAGNETIZATION));
        row(out, "a", QuantityFormatter.format(p.a(), KILO_AMPERE, 5), error(e.a(), KILO_AMPERE));
        row(out, "k", QuantityFormatter.format(p.k(), KILO_AMPERE, 5), error(e.k(), KILO_AMPERE));
        row(out, "c", QuantityFormatter.number(p.c(), 5), error(e.c(), null));
        row(out, "α", QuantityFormatter.number(p.alpha(), 5), error(e.alpha(), null));
        row(out, "rms B residual", QuantityFormatter.format(fit.rmsB(), TESLA, 4), "");
        row(out, "data", (fit.lastPoint() - fit.firstPoint() + 1) + " points, H from "
                + QuantityFormatter.format(fit.fieldMin(), KILO_AMPERE, 4) + " to "
                + QuantityFormatter.format(fit.fieldMax(), KILO_AMPERE, 4), "");
        row(out, "work", fit.evaluations() + " loop evaluations, " + fit.iterations() + " least-squares iterations", "");
        out.append("  correlation (Ms, a, k, c, α):\n");
        double[][] r = fit.correlation();
        for (int i = 0; i < r.length; i++) {
            StringBuilder line = new StringBuilder(String.format("    %-3s", NAMES[i]));
            for (double value : r[i]) {
                line.append(String.format(" %7s", QuantityFormatter.number(value, 3)));
            }
            out.append(line).append('\n');
        }
        return out.toString();
    }

    private static String error(double value, Unit unit) {
        if (!Double.isFinite(value)) {
            return "± not determined by the data";
        }
        return "± " + (unit == null ? QuantityFormatter.number(value, 2) : QuantityFormatter.format(value, unit, 2));
    }

    private static void row(StringBuilder out, String name, String value, String error) {
        out.append(String.format("  %-16s %-28s %s", name, value, error).stripTrailing()).append('\n');
    }
}
