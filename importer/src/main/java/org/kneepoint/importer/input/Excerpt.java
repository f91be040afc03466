package org.kneepoint.importer.input;

import org.kneepoint.fitter.limits.NameCharacters;

/**
 * A short, one-line quote of input for messages: at most {@link #LENGTH} characters, then an
 * ellipsis and the full length, with control and bidirectional formatting characters written as
 * {@code \}{@code uXXXX} — so that a 10 MB cell is never echoed whole, a message stays one line,
 * and nothing in it reorders the text around it.
 */
public final class Excerpt {

    /** Most characters of the input quoted. */
    public static final int LENGTH = 40;

    /** Most characters of another program's message quoted (a parser's, a record's own check). */
    public static final int MESSAGE_LENGTH = 200;

    private Excerpt() {
    }

    /** The quote of {@code text} (stripped of surrounding white space), at most {@link #LENGTH} characters. */
    public static String of(String text) {
        return of(text, LENGTH);
    }

    /** The quote of {@code text} (stripped of surrounding white space), at most {@code length} characters. */
    public static String of(String text, int length) {
        String stripped = text.strip();
        int shown = Math.min(stripped.length(), length);
        if (shown < stripped.length() && Character.isHighSurrogate(stripped.charAt(shown - 1))) {
            shown--;
        }
        StringBuilder quote = new StringBuilder(shown + 24);
        stripped.substring(0, shown).codePoints().forEach(c -> {
            if (c == '\t' || NameCharacters.forbidden(c, false)) {
                quote.append(String.format("\\u%04X", c));
            } else {
                quote.appendCodePoint(c);
            }
        });
        if (shown < stripped.length()) {
            quote.append("… (").append(stripped.length()).append(" characters)");
        }
        return quote.toString();
    }
}
