package org.kneepoint.server.text;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.kneepoint.fitter.model.knee.KneeFit;
import org.kneepoint.fitter.model.knee.TemperatureFit;
import org.kneepoint.fitter.units.QuantityFormatter;

/** A temperature model as JSON (coefficients in %/K and %/K², SI elsewhere) and as a table. */
public final class TemperatureFitView {

    private TemperatureFitView() {
    }

    /** What a saved temperature fit stores: the coefficients and the fitted parameters per temperature. */
    public static Map<String, Object> parameters(TemperatureFit fit) {
        Map<String, Object> json = new LinkedHashMap<>();
        json.put("referenceTemperatureK", fit.referenceTemperatureK());
        json.put("alphaPercentPerK", 100 * fit.alpha());
        json.put("betaPercentPerK", 100 * fit.beta());
        json.put("alpha2PercentPerK2", finiteOrNull(100 * fit.alpha2()));
        json.put("beta2PercentPerK2", finiteOrNull(100 * fit.beta2()));
        json.put("muRecSlopePerK", fit.muRecSlope());
        json.put("relativeKneeWidthSlopePerK", fit.relativeWidthSlope());
        List<Map<String, Object>> fits = new ArrayList<>();
        for (KneeFit knee : fit.fits()) {
            Map<String, Object> row = new LinkedHashMap<>(KneeFitView.parameters(knee));
            row.put("temperatureK", knee.temperatureK());
            row.put("hk", knee.hk());
            row.put("rmsJ", knee.rmsJ());
            fits.add(row);
        }
        json.put("fits", fits);
        return json;
    }

    public static Map<String, Object> json(TemperatureFit fit) {
        Map<String, Object> json = parameters(fit);
        List<KneeFit> fits = fit.fits();
        json.put("measuredRangeK", new double[] {fits.get(0).temperatureK(), fits.get(fits.size() - 1).temperatureK()});
        json.put("modelRangeK", new double[] {fit.model().lowestTemperature(), fit.model().highestTemperature()});
        return json;
    }

    public static String table(String source, TemperatureFit fit) {
        StringBuilder out = new StringBuilder(PlainText.printable(source)).append(": temperature model from ")
                .append(fit.fits().size()).append(" curves, T0 = ").append(Temperatures.celsius(fit.referenceTemperatureK())).append('\n');
        out.append(String.format("  α (Br)   %s %%/K%s%n", QuantityFormatter.number(100 * fit.alpha(), 4),
                Double.isNaN(fit.alpha2()) ? "" : ", quadratic " + QuantityFormatter.number(100 * fit.alpha2(), 3) + " %/K²"));
        out.append(String.format("  β (HcJ)  %s %%/K%s%n", QuantityFormatter.number(100 * fit.beta(), 4),
                Double.isNaN(fit.beta2()) ? "" : ", quadratic " + QuantityFormatter.number(100 * fit.beta2(), 3) + " %/K²"));
        out.append(String.format("  %-10s %-9s %-8s %-11s %-11s %s%n", "T", "Br [T]", "μrec", "HcJ [kA/m]", "Hk [kA/m]", "RMS [mT]"));
        for (KneeFit knee : fit.fits()) {
            out.append(String.format("  %-10s %-9s %-8s %-11s %-11s %s%n", Temperatures.celsius(knee.temperatureK()),
                    QuantityFormatter.number(knee.model().remanence(), 4), QuantityFormatter.number(knee.model().recoilPermeability(), 4),
                    QuantityFormatter.number(knee.model().intrinsicCoercivity() / 1e3, 5), QuantityFormatter.number(knee.hk() / 1e3, 5),
                    QuantityFormatter.number(knee.rmsJ() * 1e3, 3)));
        }
        out.append("  Between the measured temperatures the model interpolates; beyond them it extrapolates (flagged).\n");
        return out.toString();
    }

    private static Double finiteOrNull(double value) {
        return Double.isFinite(value) ? value : null;
    }
}
