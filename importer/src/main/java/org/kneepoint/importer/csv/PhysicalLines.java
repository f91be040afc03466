package org.kneepoint.importer.csv;

import java.util.Arrays;

/**
 * The lines of a text as a reader counts them — ended by LF, CR LF or CR, a final line break
 * ending the last line rather than starting an empty one — so that positions can be named by
 * 1-based line number without copying the text.
 */
final class PhysicalLines {

    private final String text;
    private final int[] starts;
    private final int count;

    private PhysicalLines(String text, int[] starts, int count) {
        this.text = text;
        this.starts = starts;
        this.count = count;
    }

    static PhysicalLines of(String text) {
        int[] starts = new int[16];
        int count = 0;
        int position = 0;
        while (position < text.length()) {
            if (count == starts.length) {
                starts = Arrays.copyOf(starts, count * 2);
            }
            starts[count++] = position;
            int end = endOf(text, position);
            position = end < text.length() && text.charAt(end) == '\r' && end + 1 < text.length() && text.charAt(end + 1) == '\n'
                    ? end + 2 : end + 1;
        }
        return new PhysicalLines(text, starts, count);
    }

    private static int endOf(String text, int from) {
        for (int i = from; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c == '\n' || c == '\r') {
                return i;
            }
        }
        return text.length();
    }

    /** Number of lines; 0 for an empty text. */
    int count() {
        return count;
    }

    /** Offset of the first character of line {@code line} (1-based). */
    int start(int line) {
        return starts[line - 1];
    }

    /** The text of line {@code line} (1-based) without its line break. */
    String text(int line) {
        int from = starts[line - 1];
        return text.substring(from, endOf(text, from));
    }

    /** True when line {@code line} holds only white space (or nothing), found without copying it. */
    boolean blank(int line) {
        int end = endOf(text, starts[line - 1]);
        for (int i = starts[line - 1]; i < end; i++) {
            if (!Character.isWhitespace(text.charAt(i))) {
                return false;
            }
        }
        return true;
    }

    /** True when line {@code line} is empty or starts with {@code #}: a line the tokenizer passes over. */
    boolean passedOver(int line) {
        int from = starts[line - 1];
        return from >= text.length() || text.charAt(from) == '\n' || text.charAt(from) == '\r' || text.charAt(from) == '#';
    }
}
