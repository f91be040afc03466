package org.kneepoint.server.app.wording;

import org.kneepoint.fitter.units.Dimension;
import org.kneepoint.fitter.units.QuantityFormatter;
import org.kneepoint.fitter.units.Unit;
import org.kneepoint.fitter.units.UnitCatalog;

/** The units of the readable tables of design checks: T, kA/m, kJ/m³, °C, mm and percent. */
public final class EngineeringUnits {

    private static final Unit TESLA = UnitCatalog.require("T", Dimension.FLUX_DENSITY);
    private static final Unit KILO_AMPERE = UnitCatalog.require("kA/m", Dimension.FIELD_STRENGTH);
    private static final Unit KILOJOULE = UnitCatalog.require("kJ/m³", Dimension.ENERGY_PRODUCT);
    private static final Unit CELSIUS = UnitCatalog.require("°C", Dimension.TEMPERATURE);
    private static final Unit MILLIMETRE = UnitCatalog.require("mm", Dimension.LENGTH);

    private EngineeringUnits() {
    }

    public static String tesla(double value) {
        return QuantityFormatter.format(value, TESLA, 4);
    }

    public static String field(double value) {
        return QuantityFormatter.format(value, KILO_AMPERE, 4);
    }

    public static String energy(double value) {
        return QuantityFormatter.format(value, KILOJOULE, 4);
    }

    public static String celsius(double kelvin) {
        return QuantityFormatter.format(kelvin, CELSIUS, 5);
    }

    public static String millimetres(double metres) {
        return QuantityFormatter.format(metres, MILLIMETRE, 5);
    }

    public static String percent(double fraction) {
        return QuantityFormatter.number(100.0 * fraction, 3) + " %";
    }

    public static String number(double value) {
        return QuantityFormatter.number(value, 5);
    }
}
