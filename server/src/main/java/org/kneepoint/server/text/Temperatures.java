package org.kneepoint.server.text;

import org.kneepoint.fitter.units.Dimension;
import org.kneepoint.fitter.units.QuantityFormatter;
import org.kneepoint.fitter.units.Unit;
import org.kneepoint.fitter.units.UnitCatalog;

/** Temperatures for people: kelvin inside, °C on screen. */
public final class Temperatures {

    private static final Unit CELSIUS = UnitCatalog.require("°C", Dimension.TEMPERATURE);

    private Temperatures() {
    }

    /** "120 °C" for 393.15 K. */
    public static String celsius(double kelvin) {
        return QuantityFormatter.format(kelvin, CELSIUS, 5);
    }
}
