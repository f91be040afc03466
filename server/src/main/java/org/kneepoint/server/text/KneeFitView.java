package org.kneepoint.server.text;

import org.kneepoint.server.app.wording.Temperatures;

import org.kneepoint.fitter.model.knee.KneeCurve;
import org.kneepoint.fitter.model.knee.KneeFit;
import org.kneepoint.fitter.units.Dimension;
import org.kneepoint.fitter.units.QuantityFormatter;
import org.kneepoint.fitter.units.Unit;
import org.kneepoint.fitter.units.UnitCatalog;

/** A knee fit as a readable table; its JSON document is {@code app.fits.KneeFitDocument}. */
public final class KneeFitView {

    private static final Unit TESLA = UnitCatalog.require("T", Dimension.FLUX_DENSITY);
    private static final Unit KILO_AMPERE = UnitCatalog.require("kA/m", Dimension.FIELD_STRENGTH);
    private static final Unit KILOJOULE = UnitCatalog.require("kJ/m³", Dimension.ENERGY_PRODUCT);

    private KneeFitView() {
    }

    public static String table(String source, KneeFit fit) {
        KneeCurve model = fit.model();
        StringBuilder out = new StringBuilder(PlainText.printable(source)).append(": knee model")
                .append(fit.temperatureK() == null ? "" : " at " + Temperatures.celsius(fit.temperatureK())).append('\n');
        row(out, "Br", QuantityFormatter.format(model.remanence(), TESLA, 5) + " ± " + QuantityFormatter.format(fit.errors()[0], TESLA, 2));
        row(out, "recoil permeability", QuantityFormatter.number(model.recoilPermeability(), 5) + " ± "
                + QuantityFormatter.number(fit.errors()[1], 2));
        row(out, "HcJ", QuantityFormatter.format(model.intrinsicCoercivity(), KILO_AMPERE, 5) + " ± "
                + QuantityFormatter.format(fit.errors()[2], KILO_AMPERE, 2));
        row(out, "knee width HcJ − Hk", QuantityFormatter.format(model.kneeWidth(), KILO_AMPERE, 4) + " ± "
                + QuantityFormatter.format(fit.kneeWidthError(), KILO_AMPERE, 2));
        row(out, "knee shape", model.shape().form() + " " + java.util.Arrays.toString(model.shape().parameters()));
        row(out, "Hk (model)", QuantityFormatter.format(fit.hk(), KILO_AMPERE, 4));
        row(out, "(BH)max (model)", QuantityFormatter.format(fit.bhMax(), KILOJOULE, 4));
        Unit milliTesla = UnitCatalog.require("mT", Dimension.FLUX_DENSITY);
        row(out, "RMS residual in J", QuantityFormatter.format(fit.rmsJ(), milliTesla, 3)
                + " over " + fit.points() + " points, " + fit.iterations() + " iterations");
        row(out, "scatter of the points", QuantityFormatter.format(fit.scatterJ(), milliTesla, 3)
                + (fit.rmsOverScatter() == null ? "" : " (RMS/scatter " + QuantityFormatter.number(fit.rmsOverScatter(), 3) + ")"));
        if (fit.approximate()) {
            out.append(String.format(java.util.Locale.ROOT, "  note: the knee model follows this curve only approximately (RMS %.2g %% of Br,"
                    + " more than %.1f× the scatter of the points)%n", 100 * fit.rmsJ() / model.remanence(), KneeFit.WITHIN_SCATTER));
        }
        return out.toString();
    }

    private static void row(StringBuilder out, String name, String value) {
        out.append(String.format("  %-20s %s%n", name, value));
    }
}
