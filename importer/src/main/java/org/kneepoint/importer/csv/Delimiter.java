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

    char character() {
        return character;
    }

    String word() {
        return word;
    }
}
