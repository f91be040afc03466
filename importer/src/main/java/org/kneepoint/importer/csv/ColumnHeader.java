package org.kneepoint.importer.csv;

import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.fitter.units.Dimension;
import org.kneepoint.fitter.units.Unit;
import org.kneepoint.fitter.units.UnitCatalog;
import org.kneepoint.importer.input.Excerpt;

/**
 * One header cell such as {@code H [kOe]}: the quantity letter and its unit. H is a field
 * strength, B and J flux densities, M a magnetization, T a temperature.
 *
 * @param letter the quantity: H, B, J, M or T
 * @param unit   the unit its numbers are written in
 * @param text   the cell as written, for messages
 */
record ColumnHeader(char letter, Unit unit, String text) {

    private static final Pattern CELL = Pattern.compile("\\s*([^\\[\\]\\s]+)\\s*(?:\\[(.*)])?\\s*");
    private static final String LETTERS = "HBJMT";

    static ColumnHeader parse(String cell, InputLocation at) {
        Matcher matcher = CELL.matcher(cell);
        if (!matcher.matches()) {
            throw new BadInputException(at, "expected a column name with its unit in brackets such as 'H [kA/m]', got '" + Excerpt.of(cell) + "'");
        }
        String name = matcher.group(1);
        if (name.length() != 1 || LETTERS.indexOf(name.charAt(0)) < 0) {
            throw new BadInputException(at, "unknown column '" + Excerpt.of(name) + "'; expected H, B, J, M or T with a unit, such as 'J [T]'");
        }
        char letter = name.charAt(0);
        Dimension dimension = dimensionOf(letter);
        if (matcher.group(2) == null) {
            throw new BadInputException(at, "column " + name + " has no unit; write it as '" + name + " [" + example(letter) + "]'");
        }
        String unitText = matcher.group(2).strip();
        Unit unit = UnitCatalog.find(unitText, dimension).orElseThrow(() -> new BadInputException(at,
                "column " + name + ": expected " + dimension.expectation() + ", got '" + Excerpt.of(unitText) + "'"
                        + UnitCatalog.dimensionOf(unitText).map(other -> " (a " + other.description() + " unit)")
                                .orElse(" (not a unit Kneepoint knows)")));
        return new ColumnHeader(letter, unit, Excerpt.of(cell));
    }

    private static Dimension dimensionOf(char letter) {
        return switch (letter) {
            case 'H' -> Dimension.FIELD_STRENGTH;
            case 'B', 'J' -> Dimension.FLUX_DENSITY;
            case 'M' -> Dimension.MAGNETIZATION;
            default -> Dimension.TEMPERATURE;
        };
    }

    private static String example(char letter) {
        return switch (letter) {
            case 'H' -> "kA/m";
            case 'B', 'J' -> "T";
            case 'M' -> "kA/m";
            default -> "°C";
        };
    }
}
