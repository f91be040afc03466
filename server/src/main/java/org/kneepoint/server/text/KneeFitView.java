package org.kneepoint.server.text;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.kneepoint.fitter.loadline.LinearRecoilKnee;
import org.kneepoint.fitter.model.knee.KneeFit;
import org.kneepoint.fitter.units.Dimension;
import org.kneepoint.fitter.units.QuantityFormatter;
import org.kneepoint.fitter.units.Unit;
import org.kneepoint.fitter.units.UnitCatalog;

/**
 * A knee fit as JSON — {@code br, muRec, hcj, hk, bhMax, rmsJ}, the model's own {@code kneeWidth},
 * standard errors, correlation and the data range — and as a table.
 */
public final class KneeFitView {

    private static final Unit TESLA = UnitCatalog.require("T", Dimension.FLUX_DENSITY);
    private static final Unit KILO_AMPERE = UnitCatalog.require("kA/m", Dimension.FIELD_STRENGTH);
    private static final Unit KILOJOULE = UnitCatalog.require("kJ/m³", Dimension.ENERGY_PRODUCT);
    private static final List<String> NAMES = List.of("br", "muRec", "hcj", "kneeWidth");

    private KneeFitView() {
    }

    /** The fitted parameters, as stored with a saved fit. */
    public static Map<String, Object> parameters(KneeFit fit) {
        LinearRecoilKnee model = fit.model();
        Map<String, Object> parameters = new LinkedHashMap<>();
        parameters.put("br", model.remanence());
        parameters.put("muRec", model.recoilPermeability());
        parameters.put("hcj", model.intrinsicCoercivity());
        parameters.put("kneeWidth", model.kneeWidth());
        return parameters;
    }

    public static Map<String, Object> json(KneeFit fit) {
        Map<String, Object> json = new LinkedHashMap<>();
        json.put("temperatureK", fit.temperatureK());
        json.putAll(parameters(fit));
        json.put("hk", fit.hk());
        json.put("bhMax", fit.bhMax());
        json.put("rmsJ", fit.rmsJ());
        Map<String, Double> errors = new LinkedHashMap<>();
        for (int i = 0; i < NAMES.size(); i++) {
            errors.put(NAMES.get(i), fit.errors()[i]);
        }
        json.put("standardErrors", errors);
        json.put("correlation", fit.correlation());
        json.put("iterations", fit.iterations());
        json.put("evaluations", fit.evaluations());
        json.put("points", fit.points());
        json.put("hRange", new double[] {fit.lowestH(), fit.highestH()});
        json.put("hcjExtrapolated", fit.lowestH() > -fit.model().intrinsicCoercivity() * (1 + 1e-9));
        json.put("approximate", fit.approximate());
        return json;
    }

    public static String table(String source, KneeFit fit) {
        LinearRecoilKnee model = fit.model();
        StringBuilder out = new StringBuilder(PlainText.printable(source)).append(": knee model")
                .append(fit.temperatureK() == null ? "" : " at " + Temperatures.celsius(fit.temperatureK())).append('\n');
        row(out, "Br", QuantityFormatter.format(model.remanence(), TESLA, 5) + " ± " + QuantityFormatter.format(fit.errors()[0], TESLA, 2));
        row(out, "recoil permeability", QuantityFormatter.number(model.recoilPermeability(), 5) + " ± "
                + QuantityFormatter.number(fit.errors()[1], 2));
        row(out, "HcJ", QuantityFormatter.format(model.intrinsicCoercivity(), KILO_AMPERE, 5) + " ± "
                + QuantityFormatter.format(fit.errors()[2], KILO_AMPERE, 2));
        row(out, "knee width w", QuantityFormatter.format(model.kneeWidth(), KILO_AMPERE, 4) + " ± "
                + QuantityFormatter.format(fit.errors()[3], KILO_AMPERE, 2));
        row(out, "Hk (model)", QuantityFormatter.format(fit.hk(), KILO_AMPERE, 4));
        row(out, "(BH)max (model)", QuantityFormatter.format(fit.bhMax(), KILOJOULE, 4));
        row(out, "RMS residual in J", QuantityFormatter.format(fit.rmsJ(), UnitCatalog.require("mT", Dimension.FLUX_DENSITY), 3)
                + " over " + fit.points() + " points, " + fit.iterations() + " iterations");
        if (fit.approximate()) {
            out.append(String.format(java.util.Locale.ROOT, "  note: the knee model follows this curve only approximately (RMS %.2g %% of Br);"
                    + " rounded curves such as cast AlNiCo need another knee shape, not yet available%n", 100 * fit.rmsJ() / model.remanence()));
        }
        return out.toString();
    }

    private static void row(StringBuilder out, String name, String value) {
        out.append(String.format("  %-20s %s%n", name, value));
    }
}
