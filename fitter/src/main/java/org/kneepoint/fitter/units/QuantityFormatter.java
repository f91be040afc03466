package org.kneepoint.fitter.units;

import java.math.BigDecimal;
import java.math.MathContext;

/**
 * Formats SI values for people: a chosen unit and a number of significant digits, without
 * trailing zeros or exponent for everyday magnitudes ("955.4 kA/m", "1.234 T", "20 °C").
 */
public final class QuantityFormatter {

    private QuantityFormatter() {
    }

    /** The value in the unit, rounded to {@code digits} significant digits, followed by the symbol. */
    public static String format(double si, Unit unit, int digits) {
        return number(unit.fromSi(si), digits) + " " + unit.symbol();
    }

    /** A bare number rounded to {@code digits} significant digits; "–" for NaN. */
    public static String number(double value, int digits) {
        if (!Double.isFinite(value)) {
            return "–";
        }
        if (value == 0.0) {
            return "0";
        }
        BigDecimal rounded = new BigDecimal(value).round(new MathContext(digits)).stripTrailingZeros();
        double magnitude = Math.abs(value);
        return magnitude >= 1e-4 && magnitude < 1e9 ? rounded.toPlainString() : rounded.toString();
    }
}
