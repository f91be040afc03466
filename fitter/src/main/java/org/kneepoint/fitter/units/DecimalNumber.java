package org.kneepoint.fitter.units;

/**
 * Strict parsing of decimal numbers as they appear in data files and on the command line:
 * {@code [sign] digits [separator digits] [e|E [sign] digits]}, with at least one digit before
 * the exponent. Unlike {@link Double#parseDouble} it refuses "NaN", "Infinity", hexadecimal and
 * Java suffixes such as "1d", and it accepts the Unicode minus sign. A decimal comma is accepted
 * only when asked for (files whose columns are separated by semicolons or tabs). A hand-written
 * scanner rather than a regular expression, because files of a million rows pass through here.
 */
public final class DecimalNumber {

    private DecimalNumber() {
    }

    /**
     * Parses {@code text} (already stripped of surrounding blanks) or returns NaN when it is not a
     * finite decimal number; callers turn NaN into a message that says where.
     */
    public static double parseOrNaN(String text, boolean decimalComma) {
        String normalized = text.indexOf('\u2212') >= 0 ? text.replace('\u2212', '-') : text;
        char separator = wellFormed(normalized, '.') ? '.' : decimalComma && wellFormed(normalized, ',') ? ',' : 0;
        if (separator == 0) {
            return Double.NaN;
        }
        double value = Double.parseDouble(separator == ',' ? normalized.replace(',', '.') : normalized);
        return Double.isFinite(value) ? value : Double.NaN;
    }

    private static boolean wellFormed(String s, char separator) {
        int n = s.length();
        int i = 0;
        if (i < n && (s.charAt(i) == '+' || s.charAt(i) == '-')) {
            i++;
        }
        int digits = 0;
        while (i < n && isDigit(s.charAt(i))) {
            i++;
            digits++;
        }
        if (i < n && s.charAt(i) == separator) {
            i++;
            while (i < n && isDigit(s.charAt(i))) {
                i++;
                digits++;
            }
        }
        if (digits == 0) {
            return false;
        }
        if (i < n && (s.charAt(i) == 'e' || s.charAt(i) == 'E')) {
            i++;
            if (i < n && (s.charAt(i) == '+' || s.charAt(i) == '-')) {
                i++;
            }
            int exponentDigits = 0;
            while (i < n && isDigit(s.charAt(i))) {
                i++;
                exponentDigits++;
            }
            if (exponentDigits == 0) {
                return false;
            }
        }
        return i == n;
    }

    private static boolean isDigit(char c) {
        return c >= '0' && c <= '9';
    }
}
