package org.kneepoint.importer.csv;

import org.kneepoint.fitter.curve.Quantity;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;

/**
 * Which column holds what: exactly one H column, exactly one value column (B, J or M) and at
 * most one temperature column; anything else is refused at its header cell.
 */
record TableLayout(ColumnHeader[] headers, int hColumn, int valueColumn, int temperatureColumn) {

    static TableLayout of(String source, int line, String[] cells) {
        ColumnHeader[] headers = new ColumnHeader[cells.length];
        int h = -1;
        int value = -1;
        int temperature = -1;
        for (int c = 0; c < cells.length; c++) {
            InputLocation at = InputLocation.cell(source, line, c + 1, null);
            headers[c] = ColumnHeader.parse(cells[c], at);
            char letter = headers[c].letter();
            int earlier = letter == 'H' ? h : letter == 'T' ? temperature : value;
            if (earlier >= 0) {
                throw new BadInputException(at, "a second " + (letter == 'H' || letter == 'T' ? letter + " column" : "value column (" + letter + ")")
                        + ", after '" + headers[earlier].text() + "' in column " + (earlier + 1)
                        + "; a curve file has one H column, one of B, J or M, and at most one T");
            }
            switch (letter) {
                case 'H' -> h = c;
                case 'T' -> temperature = c;
                default -> value = c;
            }
        }
        InputLocation headerLine = InputLocation.line(source, line);
        if (h < 0) {
            throw new BadInputException(headerLine, "no H column; expected a header such as 'H [kOe],J [kG]'");
        }
        if (value < 0) {
            throw new BadInputException(headerLine, "no B, J or M column; expected a header such as 'H [kOe],J [kG]'");
        }
        return new TableLayout(headers, h, value, temperature);
    }

    int columns() {
        return headers.length;
    }

    /** B for a B column; J for J and M columns (M is read as J = μ0·M). */
    Quantity quantity() {
        return headers[valueColumn].letter() == 'B' ? Quantity.B : Quantity.J;
    }

    boolean magnetization() {
        return headers[valueColumn].letter() == 'M';
    }

    String name(int column) {
        return headers[column].text();
    }
}
