package org.kneepoint.importer.csv;

/**
 * The column separator of a table, told from its header row: tab, then semicolon, then comma.
 * With tabs or semicolons a comma inside a number is a decimal comma.
 */
public enum Delimiter {
    TAB('\t', "tab"),
    SEMICOLON(';', "semicolon"),
    COMMA(',', "comma");

    private final char character;
    private final String word;

    Delimiter(char character, String word) {
        this.character = character;
        this.word = word;
    }

    static Delimiter of(String header) {
        for (Delimiter delimiter : values()) {
            if (header.indexOf(delimiter.character) >= 0) {
                return delimiter;
            }
        }
        return null;
    }

    boolean allowsDecimalComma() {
        return this != COMMA;
    }

    /** The cells of a line, empty cells kept. */
    String[] split(String line) {
        int count = 1;
        for (int i = 0; i < line.length(); i++) {
            if (line.charAt(i) == character) {
                count++;
            }
        }
        String[] cells = new String[count];
        int start = 0;
        for (int cell = 0; cell < count - 1; cell++) {
            int end = line.indexOf(character, start);
            cells[cell] = line.substring(start, end);
            start = end + 1;
        }
        cells[count - 1] = line.substring(start);
        return cells;
    }

    String word() {
        return word;
    }
}
