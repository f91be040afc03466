package org.kneepoint.fitter.limits;

/**
 * Characters a stored name or text may not hold: control characters (NUL and the rest of Unicode
 * category Cc; tab, line feed and carriage return only in free texts such as notes), the
 * bidirectional formatting characters that reorder what a reader sees (U+061C, U+200E, U+200F,
 * U+202A–U+202E, U+2066–U+2069; Unicode Standard Annex #9, "Unicode Bidirectional Algorithm",
 * Table 4 — from memory), unpaired surrogates and the noncharacters U+FFFE and U+FFFF. A name
 * holding one cannot be shown, searched or exported faithfully.
 */
public final class NameCharacters {

    private NameCharacters() {
    }

    /**
     * The index of the first character a text may not hold, or −1 when there is none.
     *
     * @param text      the name or text
     * @param multiLine true for free texts (notes, sources), where tab and line breaks are allowed
     */
    public static int firstForbidden(String text, boolean multiLine) {
        for (int i = 0; i < text.length(); i += Character.charCount(text.codePointAt(i))) {
            if (forbidden(text.codePointAt(i), multiLine)) {
                return i;
            }
        }
        return -1;
    }

    /** True when a code point may not appear (an unpaired surrogate arrives here as itself). */
    public static boolean forbidden(int codePoint, boolean multiLine) {
        boolean allowedWhitespace = codePoint == '\t' || multiLine && (codePoint == '\n' || codePoint == '\r');
        return Character.isISOControl(codePoint) && !allowedWhitespace || bidirectionalControl(codePoint)
                || codePoint == 0xFFFE || codePoint == 0xFFFF || Character.getType(codePoint) == Character.SURROGATE;
    }

    /** How a forbidden character is named in messages: "U+202E (a bidirectional formatting character)". */
    public static String describe(int codePoint) {
        String code = String.format("U+%04X", codePoint);
        if (bidirectionalControl(codePoint)) {
            return code + " (a bidirectional formatting character)";
        }
        if (Character.isISOControl(codePoint)) {
            return code + " (a control character)";
        }
        return code + (Character.getType(codePoint) == Character.SURROGATE ? " (an unpaired surrogate)" : " (a noncharacter)");
    }

    private static boolean bidirectionalControl(int c) {
        return c == 0x061C || c == 0x200E || c == 0x200F || c >= 0x202A && c <= 0x202E || c >= 0x2066 && c <= 0x2069;
    }
}
