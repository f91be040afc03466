package org.kneepoint.importer.csv;

import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.fitter.units.DecimalNumber;

/** One cell of a table read as a finite number in its column's unit and converted to SI. */
final class TableNumbers {

    private TableNumbers() {
    }

    static double si(String source, int line, int column, String cell, ColumnHeader header, Delimiter delimiter) {
        String text = cell.strip();
        double parsed = DecimalNumber.parseOrNaN(text, delimiter.allowsDecimalComma());
        InputLocation at = InputLocation.cell(source, line, column + 1, header.text());
        if (Double.isNaN(parsed)) {
            throw new BadInputException(at, "expected a finite number, got '" + text + "'");
        }
        double si = header.unit().toSi(parsed);
        if (!Double.isFinite(si)) {
            throw new BadInputException(at, "the number '" + text + "' is out of range");
        }
        return si;
    }
}
