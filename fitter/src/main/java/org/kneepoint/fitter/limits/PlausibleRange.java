package org.kneepoint.fitter.limits;

import java.util.Locale;

/**
 * A closed range of plausible SI values of one quantity.
 *
 * @param min  smallest plausible value
 * @param max  largest plausible value
 * @param unit the SI unit, for messages ("" for a pure number)
 */
public record PlausibleRange(double min, double max, String unit) {

    public PlausibleRange {
        if (!(min <= max) || !Double.isFinite(min) || !Double.isFinite(max) || unit == null) {
            throw new IllegalArgumentException("a plausible range needs finite bounds min <= max and a unit");
        }
    }

    /** True when {@code value} lies within the range (never for NaN). */
    public boolean contains(double value) {
        return value >= min && value <= max;
    }

    /** "from 1e-06 K to 1400 K", for messages. */
    public String describe() {
        return "from " + format(min) + " to " + format(max);
    }

    /** A value with the unit, in at most six significant digits ("1.3e+20 T", "12.8 T"). */
    public String format(double value) {
        String text = String.format(Locale.ROOT, "%.6g", value);
        int exponent = text.indexOf('e');
        String mantissa = exponent < 0 ? text : text.substring(0, exponent);
        if (mantissa.indexOf('.') >= 0) {
            mantissa = mantissa.replaceAll("\\.?0+$", "");
        }
        return mantissa + (exponent < 0 ? "" : text.substring(exponent)) + (unit.isEmpty() ? "" : " " + unit);
    }
}
