package org.kneepoint.fitter.units;

import java.util.regex.Pattern;

/**
 * Strict parsing of decimal numbers as they appear in data files and on the command line.
 * Unlike {@link Double#parseDouble} it refuses "NaN", "Infinity", hexadecimal and Java suffixes
 * such as "1d", and it accepts the Unicode minus sign. A decimal comma is accepted only when
 * asked for (files whose columns are separated by semicolons or tabs).
 */
public final class DecimalNumber {

    private static final Pattern POINT = Pattern.compile("[+-]?(\\d+\\.?\\d*|\\.\\d+)([eE][+-]?\\d+)?");
    private static final Pattern COMMA = Pattern.compile("[+-]?(\\d+,?\\d*|,\\d+)([eE][+-]?\\d+)?");

    private DecimalNumber() {
    }

    /**
     * Parses {@code text} (already stripped of surrounding blanks) or returns NaN when it is not a
     * finite decimal number; callers turn NaN into a message that says where.
     */
    public static double parseOrNaN(String text, boolean decimalComma) {
        String normalized = text.replace('\u2212', '-');
        if (POINT.matcher(normalized).matches()) {
            return finiteOrNaN(Double.parseDouble(normalized));
        }
        if (decimalComma && COMMA.matcher(normalized).matches()) {
            return finiteOrNaN(Double.parseDouble(normalized.replace(',', '.')));
        }
        return Double.NaN;
    }

    private static double finiteOrNaN(double value) {
        return Double.isFinite(value) ? value : Double.NaN;
    }
}
