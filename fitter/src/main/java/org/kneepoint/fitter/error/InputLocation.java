package org.kneepoint.fitter.error;

/**
 * A place in the input: a source (file name or request field), and optionally a 1-based line and
 * column. Rendered as {@code source:line:column} or {@code source, line L, column C (name)}.
 *
 * @param source file name, "argument --x" or JSON field; never blank
 * @param line   1-based line, or 0 when not applicable
 * @param column 1-based column, or 0 when not applicable
 * @param name   column or field name, or null
 */
public record InputLocation(String source, int line, int column, String name) {

    public InputLocation {
        if (source == null || source.isBlank()) {
            throw new IllegalArgumentException("source must be named");
        }
        if (line < 0 || column < 0) {
            throw new IllegalArgumentException("line and column are 1-based, or 0 when absent");
        }
    }

    public static InputLocation of(String source) {
        return new InputLocation(source, 0, 0, null);
    }

    public static InputLocation line(String source, int line) {
        return new InputLocation(source, line, 0, null);
    }

    public static InputLocation cell(String source, int line, int column, String name) {
        return new InputLocation(source, line, column, name);
    }

    /** Human-readable form used at the start of error messages. */
    public String describe() {
        StringBuilder text = new StringBuilder(source);
        if (line > 0) {
            text.append(", line ").append(line);
        }
        if (column > 0) {
            text.append(", column ").append(column);
        }
        if (name != null) {
            text.append(" (").append(name).append(')');
        }
        return text.toString();
    }
}
