package org.kneepoint.server.text;

import java.util.LinkedHashMap;
import java.util.Map;
import org.kneepoint.fitter.model.ja.JilesAthertonFit;
import org.kneepoint.fitter.model.ja.JilesAthertonParameters;
import org.kneepoint.fitter.model.ja.JilesAthertonStandardErrors;
import org.kneepoint.fitter.units.Dimension;
import org.kneepoint.fitter.units.QuantityFormatter;
import org.kneepoint.fitter.units.Unit;
import org.kneepoint.fitter.units.UnitCatalog;

/**
 * A Jiles–Atherton fit as JSON (keys {@code ms, a, k, c, alpha, rmsB, evaluations}, then
 * {@code standardErrors}, {@code correlation} in the order Ms, a, k, c, α, {@code iterations},
 * {@code points}, {@code fieldMin}, {@code fieldMax}; null for an error the data do not bound) and
 * as a readable table. The caller adds where the data came from.
 */
public final class JilesAthertonFitView {

    private static final Unit KILO_AMPERE = UnitCatalog.require("kA/m", Dimension.FIELD_STRENGTH);
    private static final Unit MAGNETIZATION = UnitCatalog.require("kA/m", Dimension.MAGNETIZATION);
    private static final Unit TESLA = UnitCatalog.require("T", Dimension.FLUX_DENSITY);
    private static final String[] NAMES = {"Ms", "a", "k", "c", "α"};

    private JilesAthertonFitView() {
    }

    /** The five parameters as a JSON object, SI. */
    public static Map<String, Object> parameters(JilesAthertonParameters p) {
        Map<String, Object> json = new LinkedHashMap<>();
        json.put("ms", p.ms());
        json.put("a", p.a());
        json.put("k", p.k());
        json.put("c", p.c());
        json.put("alpha", p.alpha());
        return json;
    }

    /** The fit's keys, to be followed by the caller's provenance keys. */
    public static Map<String, Object> json(JilesAthertonFit fit) {
        Map<String, Object> json = parameters(fit.parameters());
        json.put("rmsB", fit.rmsB());
        json.put("evaluations", fit.evaluations());
        JilesAthertonStandardErrors e = fit.standardErrors();
        Map<String, Object> errors = new LinkedHashMap<>();
        errors.put("ms", JsonNumbers.finite(e.ms()));
        errors.put("a", JsonNumbers.finite(e.a()));
        errors.put("k", JsonNumbers.finite(e.k()));
        errors.put("c", JsonNumbers.finite(e.c()));
        errors.put("alpha", JsonNumbers.finite(e.alpha()));
        json.put("standardErrors", errors);
        json.put("correlation", JsonNumbers.matrix(fit.correlation()));
        json.put("iterations", fit.iterations());
        json.put("points", fit.lastPoint() - fit.firstPoint() + 1);
        json.put("fieldMin", fit.fieldMin());
        json.put("fieldMax", fit.fieldMax());
        return json;
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
