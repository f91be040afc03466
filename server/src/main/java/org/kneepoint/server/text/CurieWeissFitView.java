package org.kneepoint.server.text;

import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import org.kneepoint.fitter.model.curieweiss.CurieWeissFit;
import org.kneepoint.fitter.model.curieweiss.CurieWeissParameters;
import org.kneepoint.fitter.units.QuantityFormatter;

/**
 * A Curie–Weiss fit as JSON (keys {@code curieConstant} in K, {@code weissTemperatureK},
 * {@code chi0} in SI volume susceptibility, {@code behaviour}, then standard errors, correlation
 * in the order C, θ, χ0, residual and data range; null where the data do not determine a value)
 * and as a readable table.
 */
public final class CurieWeissFitView {

    private CurieWeissFitView() {
    }

    /** The three parameters as a JSON object, SI. */
    public static Map<String, Object> parameters(CurieWeissParameters p) {
        Map<String, Object> json = new LinkedHashMap<>();
        json.put("curieConstant", p.curieConstant());
        json.put("weissTemperatureK", p.weissTemperature());
        json.put("chi0", p.temperatureIndependentSusceptibility());
        return json;
    }

    /** The fit's keys, to be followed by the caller's provenance keys. */
    public static Map<String, Object> json(CurieWeissFit fit) {
        Map<String, Object> json = parameters(fit.parameters());
        json.put("behaviour", behaviour(fit));
        json.put("curieWeissSignificant", fit.curieWeissSignificant());
        Map<String, Object> errors = new LinkedHashMap<>();
        errors.put("curieConstant", JsonNumbers.finite(fit.curieConstantError()));
        errors.put("weissTemperatureK", JsonNumbers.finite(fit.weissTemperatureError()));
        errors.put("chi0", JsonNumbers.finite(fit.temperatureIndependentError()));
        json.put("standardErrors", errors);
        json.put("correlation", JsonNumbers.matrix(fit.correlation()));
        json.put("rmsResidual", fit.rmsResidual());
        json.put("points", fit.points());
        json.put("temperatureMinK", fit.temperatureMin());
        json.put("temperatureMaxK", fit.temperatureMax());
        json.put("evaluations", fit.evaluations());
        return json;
    }

    /** A readable table, headed by {@code title}. */
    public static String table(String title, CurieWeissFit fit) {
        CurieWeissParameters p = fit.parameters();
        StringBuilder out = new StringBuilder(title).append('\n');
        row(out, "C", QuantityFormatter.number(p.curieConstant(), 5) + " K", error(fit.curieConstantError(), " K"));
        row(out, "θ", QuantityFormatter.number(p.weissTemperature(), 5) + " K", error(fit.weissTemperatureError(), " K"));
        row(out, "χ0 (SI volume)", QuantityFormatter.number(p.temperatureIndependentSusceptibility(), 5),
                error(fit.temperatureIndependentError(), ""));
        row(out, "behaviour", behaviour(fit) + (fit.curieWeissSignificant() ? ", Curie–Weiss term significant"
                : ", Curie–Weiss term not significant (|C| < 3 standard errors)"), "");
        row(out, "rms residual", QuantityFormatter.number(fit.rmsResidual(), 3), "");
        row(out, "data", fit.points() + " points, " + QuantityFormatter.number(fit.temperatureMin(), 5) + " K to "
                + QuantityFormatter.number(fit.temperatureMax(), 5) + " K", "");
        return out.toString();
    }

    private static String behaviour(CurieWeissFit fit) {
        return fit.behaviour().name().toLowerCase(Locale.ROOT).replace('_', '-');
    }

    private static String error(double value, String unit) {
        return Double.isFinite(value) ? "± " + QuantityFormatter.number(value, 2) + unit : "± not determined by the data";
    }

    private static void row(StringBuilder out, String name, String value, String error) {
        out.append(String.format("  %-16s %-24s %s", name, value, error).stripTrailing()).append('\n');
    }
}
