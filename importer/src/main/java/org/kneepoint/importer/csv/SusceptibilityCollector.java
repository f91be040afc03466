package org.kneepoint.importer.csv;

import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.fitter.limits.PhysicalLimits;
import org.kneepoint.fitter.units.Dimension;
import org.kneepoint.fitter.units.SusceptibilityForm;
import org.kneepoint.fitter.units.Unit;
import org.kneepoint.importer.input.Excerpt;
import org.kneepoint.importer.plausible.PlausibleInput;

/** Collects a susceptibility table's metadata, header and (T, χ) rows while it is scanned. */
final class SusceptibilityCollector implements TableHandler {

    private static final Pattern CHI = Pattern.compile("\\s*(chi|χ|Chi)\\s*\\[(.*)]\\s*");

    private final String source;
    private final MetadataCollector metadata;
    private final List<double[]> points = new ArrayList<>();
    private final List<Integer> lines = new ArrayList<>();
    private ColumnHeader temperature;
    private ColumnHeader chi;
    private int temperatureColumn = -1;
    private int chiColumn = -1;
    private int columns;
    private Delimiter delimiter;

    SusceptibilityCollector(String source) {
        this.source = source;
        this.metadata = new MetadataCollector(source, SusceptibilityTable.KEYS);
    }

    @Override
    public void metadata(MetadataLine entry, int line) {
        metadata.add(entry, line);
    }

    @Override
    public void header(String[] cells, Delimiter delimiter, int line) {
        this.delimiter = delimiter;
        this.columns = cells.length;
        for (int c = 0; c < cells.length; c++) {
            InputLocation at = InputLocation.cell(source, line, c + 1, null);
            Matcher matcher = CHI.matcher(cells[c]);
            if (matcher.matches()) {
                requireFirst(chiColumn, at, "chi");
                chi = new ColumnHeader('X', formUnit(matcher.group(2).strip(), at), Excerpt.of(cells[c]));
                chiColumn = c;
            } else {
                ColumnHeader header = ColumnHeader.parse(cells[c], at);
                if (header.letter() != 'T') {
                    throw new BadInputException(at, "a susceptibility table has a T column and a chi column, got '" + Excerpt.of(cells[c]) + "'");
                }
                requireFirst(temperatureColumn, at, "T");
                temperature = header;
                temperatureColumn = c;
            }
        }
        if (temperatureColumn < 0 || chiColumn < 0) {
            throw new BadInputException(InputLocation.line(source, line), "expected a header such as 'T [K],chi [SI]'");
        }
    }

    private static void requireFirst(int earlier, InputLocation at, String name) {
        if (earlier >= 0) {
            throw new BadInputException(at, "a second " + name + " column, after column " + (earlier + 1));
        }
    }

    private static Unit formUnit(String text, InputLocation at) {
        try {
            // the excerpt changes no unit spelling, and keeps a long cell out of the message
            return SusceptibilityForm.unitOf(Excerpt.of(text));
        } catch (IllegalArgumentException wrongUnit) {
            throw new BadInputException(at, wrongUnit.getMessage());
        }
    }

    @Override
    public void row(String[] cells, int line) {
        if (cells.length != columns) {
            throw new BadInputException(InputLocation.line(source, line), String.format(
                    "%d cells, expected %d (%s-separated, as in the header)", cells.length, columns, delimiter.word()));
        }
        double t = TableNumbers.si(source, line, temperatureColumn, cells[temperatureColumn], temperature, delimiter);
        InputLocation at = InputLocation.cell(source, line, temperatureColumn + 1, temperature.text());
        if (!(t > 0)) {
            throw new BadInputException(at, "temperature must be above absolute zero");
        }
        PlausibleInput.within(at, "temperature", t, PhysicalLimits.SUSCEPTIBILITY_TEMPERATURE);
        points.add(new double[] {t, TableNumbers.si(source, line, chiColumn, cells[chiColumn], chi, delimiter)});
        lines.add(line);
    }

    SusceptibilityTable result() {
        String material = metadata.text("material");
        if (material == null) {
            throw new BadInputException(InputLocation.of(source), "no material; add a line '# material: NAME' before the header");
        }
        SusceptibilityForm form = switch (chi.unit().dimension()) {
            case MASS_SUSCEPTIBILITY -> SusceptibilityForm.MASS;
            case MOLAR_SUSCEPTIBILITY -> SusceptibilityForm.MOLAR;
            default -> SusceptibilityForm.VOLUME;
        };
        Double density = metadata.quantity("density", Dimension.DENSITY, PhysicalLimits.DENSITY);
        Double molarMass = metadata.quantity("molar-mass", Dimension.MOLAR_MASS, PhysicalLimits.MOLAR_MASS);
        SusceptibilityPlausibility.check(source, chiColumn, chi.text(), form, density, molarMass, points, lines);
        return new SusceptibilityTable(source, material, density, molarMass, metadata.text("source"), metadata.text("notes"), form, points);
    }
}
