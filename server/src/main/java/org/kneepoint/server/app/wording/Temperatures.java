package org.kneepoint.server.app.wording;

import org.kneepoint.fitter.units.Dimension;
import org.kneepoint.fitter.units.QuantityFormatter;
import org.kneepoint.fitter.units.Unit;
import org.kneepoint.fitter.units.UnitCatalog;

/** Temperatures for people: kelvin inside, °C on screen. */
public final class Temperatures {

    private static final Unit CELSIUS = UnitCatalog.require("°C", Dimension.TEMPERATURE);

    private Temperatures() {
    }

    /** "20 °C, 80 °C, 150 °C", or for more than six "50 temperatures from -23.15 °C to 172.85 °C". */
    public static String list(java.util.List<Double> kelvins) {
        if (kelvins.size() > 6) {
            return kelvins.size() + " temperatures from " + celsius(kelvins.get(0)) + " to " + celsius(kelvins.get(kelvins.size() - 1));
        }
        return String.join(", ", kelvins.stream().map(Temperatures::celsius).toList());
    }

    /** "120 °C" for 393.15 K. */
    public static String celsius(double kelvin) {
        return QuantityFormatter.format(kelvin, CELSIUS, 5);
    }
}
