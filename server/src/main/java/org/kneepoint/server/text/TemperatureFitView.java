package org.kneepoint.server.text;

import org.kneepoint.server.app.wording.Temperatures;

import org.kneepoint.fitter.model.knee.KneeFit;
import org.kneepoint.fitter.model.knee.TemperatureFit;
import org.kneepoint.fitter.units.QuantityFormatter;

/** A temperature model as a readable table; its JSON document is {@code app.fits.TemperatureFitDocument}. */
public final class TemperatureFitView {

    private TemperatureFitView() {
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

}
