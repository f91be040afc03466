package org.kneepoint.server.app.lots;

import org.kneepoint.fitter.qualification.SpecifiedQuantity;
import org.kneepoint.server.app.wording.EngineeringUnits;

/** A specified quantity for people: its trade name (Br, HcJ, (BH)max, Hk, Hk/HcJ, HcB) and a value with its unit. */
public final class QuantityWording {

    private QuantityWording() {
    }

    /** The trade name of the quantity of a JSON key (br → Br); the key itself when unknown. */
    public static String name(String key) {
        return SpecifiedQuantity.ofKey(key).map(QuantityWording::name).orElse(key);
    }

    /** A value of the quantity of a JSON key with its unit (T, kA/m, kJ/m³, or a plain ratio). */
    public static String format(String key, double value) {
        return SpecifiedQuantity.ofKey(key).map(quantity -> format(quantity, value)).orElse(EngineeringUnits.number(value));
    }

    public static String name(SpecifiedQuantity quantity) {
        return switch (quantity) {
            case BR -> "Br";
            case HCJ -> "HcJ";
            case BH_MAX -> "(BH)max";
            case HK -> "Hk";
            case SQUARENESS -> "Hk/HcJ";
            case HCB -> "HcB";
        };
    }

    public static String format(SpecifiedQuantity quantity, double value) {
        return switch (quantity) {
            case BR -> EngineeringUnits.tesla(value);
            case HCJ, HK, HCB -> EngineeringUnits.field(value);
            case BH_MAX -> EngineeringUnits.energy(value);
            case SQUARENESS -> EngineeringUnits.number(value);
        };
    }
}
