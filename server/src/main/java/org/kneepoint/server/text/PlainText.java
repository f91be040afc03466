package org.kneepoint.server.text;

/**
 * Makes stored text safe to print in a terminal table: control characters (which could move the
 * cursor or recolour the terminal) are shown as backslash-u escapes (such as the escape of U+001B); everything else, any
 * script included, is printed as it is.
 */
public final class PlainText {

    private PlainText() {
    }

    public static String printable(String text) {
        if (text == null) {
            return "";
        }
        StringBuilder out = new StringBuilder(text.length());
        text.codePoints().forEach(codePoint -> {
            if (Character.isISOControl(codePoint) || Character.getType(codePoint) == Character.FORMAT) {
                out.append(String.format("\\u%04x", codePoint));
            } else {
                out.appendCodePoint(codePoint);
            }
        });
        return out.toString();
    }
}
