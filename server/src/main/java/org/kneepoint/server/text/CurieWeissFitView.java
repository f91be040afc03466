package org.kneepoint.server.text;

import java.util.Locale;
import org.kneepoint.fitter.model.curieweiss.CurieWeissFit;
import org.kneepoint.fitter.model.curieweiss.CurieWeissParameters;
import org.kneepoint.fitter.units.QuantityFormatter;

/** A Curie–Weiss fit as a readable table; its JSON document is {@code app.fits.CurieWeissFitDocument}. */
public final class CurieWeissFitView {

    private CurieWeissFitView() {
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
