package org.kneepoint.importer.csv;

import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import java.util.List;
import org.kneepoint.fitter.elements.ElementField;
import org.kneepoint.fitter.elements.GivenField;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.fitter.limits.PhysicalLimits;
import org.kneepoint.fitter.limits.PlausibleRange;
import org.kneepoint.fitter.units.DecimalNumber;
import org.kneepoint.fitter.units.Dimension;
import org.kneepoint.importer.input.Excerpt;
import org.kneepoint.importer.plausible.PlausibleInput;

/**
 * Collects an element-field table's metadata, header and rows while it is scanned, each row straight into the
 * primitive columns of an {@link ElementField}: no object is kept per row.
 */
final class ElementCollector implements TableHandler {

    /** Metadata keys an element table may carry. */
    static final List<String> KEYS = List.of("depth", "source", "notes");

    /** Positions: within 100 m of the origin (the longest length any input takes). */
    static final PlausibleRange POSITION = new PlausibleRange(-100.0, 100.0, "m");

    /** Flux density components: what the field-strength limit gives in free space, μ0·10⁸ A/m ≈ 126 T. */
    static final PlausibleRange FLUX_DENSITY = new PlausibleRange(-MU0 * PhysicalLimits.FIELD_STRENGTH.max(),
            MU0 * PhysicalLimits.FIELD_STRENGTH.max(), "T");

    private final String source;
    private final MetadataCollector metadata;
    private ElementColumns columns;
    private Delimiter delimiter;
    private double depth = Double.NaN;
    private ElementField.Builder builder;

    ElementCollector(String source) {
        this.source = source;
        this.metadata = new MetadataCollector(source, KEYS);
    }

    @Override
    public void metadata(MetadataLine entry, int line) {
        metadata.add(entry, line);
    }

    @Override
    public void header(String[] cells, Delimiter tableDelimiter, int line) {
        this.delimiter = tableDelimiter;
        this.columns = new ElementColumns(source, cells, line);
        Double given = metadata.quantity("depth", Dimension.LENGTH, POSITION);
        if (columns.present(ElementColumns.A) != (given != null)) {
            throw new BadInputException(InputLocation.line(source, given == null ? line : metadata.line("depth")), given == null
                    ? "an area column A needs the depth of the 2-D model: add a line '# depth: 50 mm' before the header"
                    : "a depth belongs to 2-D data with an area column A; this table gives volumes V");
        }
        depth = given == null ? Double.NaN : given;
        builder = ElementField.builder(source, columns.given, columns.directions, columns.temperatures);
    }

    @Override
    public void row(String[] cells, int line) {
        if (cells.length != columns.count) {
            throw new BadInputException(InputLocation.line(source, line), String.format(
                    "%d cells, expected %d (%s-separated, as in the header)", cells.length, columns.count, delimiter.word()));
        }
        int field = columns.given == GivenField.FIELD_STRENGTH ? ElementColumns.H : ElementColumns.B;
        PlausibleRange fieldRange = columns.given == GivenField.FIELD_STRENGTH ? PhysicalLimits.FIELD_STRENGTH : FLUX_DENSITY;
        double x = number(cells, line, ElementColumns.X, POSITION, "position x");
        double y = number(cells, line, ElementColumns.X + 1, POSITION, "position y");
        double z = columns.planar ? 0.0 : number(cells, line, ElementColumns.X + 2, POSITION, "position z");
        double fx = number(cells, line, field, fieldRange, "field component");
        double fy = number(cells, line, field + 1, fieldRange, "field component");
        double fz = columns.present(field + 2) ? number(cells, line, field + 2, fieldRange, "field component") : 0.0;
        double volume = columns.present(ElementColumns.V) ? positive(cells, line, ElementColumns.V, "volume")
                : positive(cells, line, ElementColumns.A, "area") * depth;
        double mx = columns.directions ? direction(cells, line, ElementColumns.M) : 0.0;
        double my = columns.directions ? direction(cells, line, ElementColumns.M + 1) : 0.0;
        double mz = columns.directions && columns.present(ElementColumns.M + 2) ? direction(cells, line, ElementColumns.M + 2) : 0.0;
        if (columns.directions && mx == 0.0 && my == 0.0 && mz == 0.0) {
            throw new BadInputException(InputLocation.cell(source, line, columns.column[ElementColumns.M] + 1, "mx"),
                    "the magnetization direction (mx, my, mz) is zero; expected a direction such as 0, 0, 1");
        }
        double temperature = columns.temperatures ? temperature(cells, line) : 0.0;
        builder.add(line, x, y, z, fx, fy, fz, volume, mx, my, mz, temperature);
    }

    private double number(String[] cells, int line, int role, PlausibleRange range, String what) {
        int c = columns.column[role];
        double value = TableNumbers.si(source, line, c, cells[c], columns.header[role], delimiter);
        if (!range.contains(value)) {
            PlausibleInput.within(InputLocation.cell(source, line, c + 1, columns.header[role].text()), what, value, range);
        }
        return value;
    }

    private double positive(String[] cells, int line, int role, String what) {
        int c = columns.column[role];
        double value = TableNumbers.si(source, line, c, cells[c], columns.header[role], delimiter);
        if (!(value > 0.0)) {
            throw new BadInputException(InputLocation.cell(source, line, c + 1, columns.header[role].text()),
                    "an element's " + what + " must be positive, got '" + Excerpt.of(cells[c]) + "'");
        }
        return value;
    }

    private double temperature(String[] cells, int line) {
        int c = columns.column[ElementColumns.T];
        double value = TableNumbers.si(source, line, c, cells[c], columns.header[ElementColumns.T], delimiter);
        InputLocation at = InputLocation.cell(source, line, c + 1, columns.header[ElementColumns.T].text());
        if (!(value > 0)) {
            throw new BadInputException(at, "temperature must be above absolute zero");
        }
        if (!PhysicalLimits.CURVE_TEMPERATURE.contains(value)) {
            PlausibleInput.within(at, "temperature", value, PhysicalLimits.CURVE_TEMPERATURE);
        }
        return value;
    }

    private double direction(String[] cells, int line, int role) {
        int c = columns.column[role];
        String text = cells[c].strip();
        double value = text.length() > PhysicalLimits.NUMBER_LENGTH ? Double.NaN
                : DecimalNumber.parseOrNaN(text, delimiter.allowsDecimalComma());
        if (Double.isNaN(value) || Math.abs(value) > 1e6) {
            throw new BadInputException(InputLocation.cell(source, line, c + 1, ElementColumns.NAMES[role]),
                    "expected a direction component (a finite number, at most 10⁶ in size), got '" + Excerpt.of(text) + "'");
        }
        return value;
    }

    ElementFile result() {
        return new ElementFile(builder.build(), columns.header[ElementColumns.X].unit(),
                columns.header[columns.given == GivenField.FIELD_STRENGTH ? ElementColumns.H : ElementColumns.B].unit(),
                Double.isNaN(depth) ? null : depth);
    }
}
