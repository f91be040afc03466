package org.kneepoint.importer.csv;

import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.kneepoint.fitter.elements.GivenField;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.fitter.units.Dimension;
import org.kneepoint.fitter.units.Unit;
import org.kneepoint.fitter.units.UnitCatalog;
import org.kneepoint.importer.input.Excerpt;

/**
 * The header row of an element-field table (docs/element-fields.md): which column holds which quantity, in which
 * unit. Names: {@code x y z} (length), {@code Hx Hy Hz} (field strength) or {@code Bx By Bz} (flux density),
 * {@code V} (volume) or, for 2-D data, {@code A} (area, with {@code # depth:}), {@code mx my mz} (direction, no
 * unit) and {@code T} (temperature). Names are matched without regard to case.
 */
final class ElementColumns {

    /** Column roles, in the order of the index arrays. */
    static final String[] NAMES = {"x", "y", "z", "Hx", "Hy", "Hz", "Bx", "By", "Bz", "V", "A", "mx", "my", "mz", "T"};
    static final int X = 0;
    static final int H = 3;
    static final int B = 6;
    static final int V = 9;
    static final int A = 10;
    static final int M = 11;
    static final int T = 14;

    private static final Pattern CELL = Pattern.compile("\\s*([^\\[\\]\\s]+)\\s*(?:\\[(.*)])?\\s*");

    final String source;
    final int count;
    /** The column (0-based) of each role in {@link #NAMES}, −1 when absent. */
    final int[] column = new int[NAMES.length];
    /** The header of each role present (its unit and text), null for a direction or an absent role. */
    final ColumnHeader[] header = new ColumnHeader[NAMES.length];
    final GivenField given;
    final boolean directions;
    final boolean temperatures;
    final boolean planar;

    ElementColumns(String source, String[] cells, int line) {
        this.source = source;
        this.count = cells.length;
        java.util.Arrays.fill(column, -1);
        for (int c = 0; c < cells.length; c++) {
            place(cells[c], InputLocation.cell(source, line, c + 1, null), c);
        }
        InputLocation at = InputLocation.line(source, line);
        boolean hField = present(H) || present(H + 1) || present(H + 2);
        boolean bField = present(B) || present(B + 1) || present(B + 2);
        if (hField && bField) {
            throw new BadInputException(at, "give the field as Hx, Hy, Hz or as Bx, By, Bz, not both");
        }
        if (!hField && !bField) {
            throw new BadInputException(at, "no field columns; expected Hx, Hy, Hz (or Bx, By, Bz) with units, such as 'Hx [kA/m]'");
        }
        given = hField ? GivenField.FIELD_STRENGTH : GivenField.FLUX_DENSITY;
        int field = hField ? H : B;
        planar = !present(X + 2);
        require(at, X, "x");
        require(at, X + 1, "y");
        require(at, field, NAMES[field]);
        require(at, field + 1, NAMES[field + 1]);
        if (!planar) {
            require(at, field + 2, NAMES[field + 2]);
        }
        if (present(V) == present(A)) {
            throw new BadInputException(at, present(V) ? "give either a volume column V or an area column A, not both"
                    : "no volume column; expected 'V [mm³]' (or, for 2-D data, 'A [mm²]' with a line '# depth: 50 mm')");
        }
        directions = present(M) || present(M + 1) || present(M + 2);
        if (directions) {
            require(at, M, "mx");
            require(at, M + 1, "my");
            if (!planar) {
                require(at, M + 2, "mz");
            }
        }
        temperatures = present(T);
    }

    boolean present(int role) {
        return column[role] >= 0;
    }

    private void require(InputLocation at, int role, String name) {
        if (!present(role)) {
            throw new BadInputException(at, "no column " + name + (planar ? " (a table without z is 2-D: x, y, the field's x and y"
                    + " components, A and '# depth:')" : "") + "; see docs/element-fields.md");
        }
    }

    private void place(String cell, InputLocation at, int c) {
        Matcher matcher = CELL.matcher(cell);
        if (!matcher.matches()) {
            throw new BadInputException(at, "expected a column name with its unit in brackets such as 'Hx [kA/m]', got '" + Excerpt.of(cell) + "'");
        }
        String name = matcher.group(1);
        int role = role(name);
        if (role < 0) {
            throw new BadInputException(at, "unknown column '" + Excerpt.of(name) + "'; expected x, y, z, Hx, Hy, Hz (or Bx, By, Bz), V (or A),"
                    + " mx, my, mz or T");
        }
        if (present(role)) {
            throw new BadInputException(at, "a second " + NAMES[role] + " column, after column " + (column[role] + 1));
        }
        column[role] = c;
        String unitText = matcher.group(2) == null ? null : matcher.group(2).strip();
        if (role >= M && role < T) {
            if (unitText != null && !unitText.isEmpty() && !unitText.equals("1")) {
                throw new BadInputException(at, "column " + NAMES[role] + " is a direction and has no unit, got '" + Excerpt.of(unitText) + "'");
            }
            return;
        }
        Dimension dimension = dimension(role);
        if (unitText == null) {
            throw new BadInputException(at, "column " + NAMES[role] + " has no unit; write it as '" + NAMES[role] + " [" + example(role) + "]'");
        }
        Unit unit = UnitCatalog.find(unitText, dimension).orElseThrow(() -> new BadInputException(at,
                "column " + NAMES[role] + ": expected " + dimension.expectation() + ", got '" + Excerpt.of(unitText) + "'"
                        + UnitCatalog.dimensionOf(unitText).map(other -> " (a " + other.description() + " unit)")
                                .orElse(" (not a unit Kneepoint knows)")));
        header[role] = new ColumnHeader(NAMES[role].charAt(0), unit, Excerpt.of(cell));
    }

    private static int role(String name) {
        for (int role = 0; role < NAMES.length; role++) {
            if (NAMES[role].toLowerCase(Locale.ROOT).equals(name.toLowerCase(Locale.ROOT))) {
                return role;
            }
        }
        return -1;
    }

    private static Dimension dimension(int role) {
        if (role < H) {
            return Dimension.LENGTH;
        }
        if (role < B) {
            return Dimension.FIELD_STRENGTH;
        }
        if (role < V) {
            return Dimension.FLUX_DENSITY;
        }
        return role == V ? Dimension.VOLUME : role == A ? Dimension.AREA : Dimension.TEMPERATURE;
    }

    private static String example(int role) {
        return switch (dimension(role)) {
            case LENGTH -> "mm";
            case FIELD_STRENGTH -> "kA/m";
            case FLUX_DENSITY -> "T";
            case VOLUME -> "mm³";
            case AREA -> "mm²";
            default -> "°C";
        };
    }
}
