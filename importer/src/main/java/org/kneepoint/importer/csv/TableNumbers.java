package org.kneepoint.importer.csv;

import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.fitter.limits.PhysicalLimits;
import org.kneepoint.fitter.units.DecimalNumber;
import org.kneepoint.importer.input.Excerpt;

/** One cell of a table read as a finite number in its column's unit and converted to SI. */
final class TableNumbers {

    private TableNumbers() {
    }

    static double si(String source, int line, int column, String cell, ColumnHeader header, Delimiter delimiter) {
        String text = cell.strip();
        if (text.length() > PhysicalLimits.NUMBER_LENGTH) {
            throw new BadInputException(at(source, line, column, header), "'" + Excerpt.of(text)
                    + "' is too long to be a measurement; a number has at most " + PhysicalLimits.NUMBER_LENGTH + " characters");
        }
        double parsed = DecimalNumber.parseOrNaN(text, delimiter.allowsDecimalComma());
        if (Double.isNaN(parsed)) {
            throw new BadInputException(at(source, line, column, header), "expected a finite number, got '" + Excerpt.of(text) + "'");
        }
        double si = header.unit().toSi(parsed);
        if (!Double.isFinite(si)) {
            throw new BadInputException(at(source, line, column, header), "the number '" + text + "' is out of range");
        }
        return si;
    }

    /** The cell's place, made only when a message needs it (a million-row file passes here millions of times). */
    private static InputLocation at(String source, int line, int column, ColumnHeader header) {
        return InputLocation.cell(source, line, column + 1, header.text());
    }
}
