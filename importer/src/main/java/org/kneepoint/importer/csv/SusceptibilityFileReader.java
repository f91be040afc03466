package org.kneepoint.importer.csv;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.fitter.units.Dimension;
import org.kneepoint.fitter.units.SusceptibilityForm;
import org.kneepoint.fitter.units.Unit;
import org.kneepoint.fitter.units.UnitCatalog;

/**
 * Reads a susceptibility table: metadata ({@code material} required; {@code density},
 * {@code molar-mass}, {@code source}, {@code notes}), a header with a temperature column and a
 * {@code chi} (or {@code χ}) column whose unit gives the form — {@code SI} or {@code cgs} per
 * volume, {@code m³/kg} or {@code cm³/g} per mass, {@code m³/mol} or {@code cm³/mol} per mole —
 * and rows of numbers.
 */
public final class SusceptibilityFileReader {

    private static final Pattern CHI = Pattern.compile("\\s*(chi|χ|Chi)\\s*\\[(.*)]\\s*");

    private final ReadLimits limits;

    public SusceptibilityFileReader(ReadLimits limits) {
        this.limits = limits;
    }

    /** True when a header row names a susceptibility column, so the file is a susceptibility table. */
    public static boolean isSusceptibilityTable(Path path) {
        String[] header = TableScanner.peekHeader(path);
        if (header == null) {
            return false;
        }
        for (String cell : header) {
            String name = cell.strip().toLowerCase(Locale.ROOT);
            if (name.startsWith("chi") || name.startsWith("χ")) {
                return true;
            }
        }
        return false;
    }

    public SusceptibilityTable read(Path path) {
        String source = path.getFileName().toString();
        Collector collector = new Collector(source);
        TableScanner.scan(path, limits, collector);
        return collector.result();
    }

    private static final class Collector implements TableHandler {
        private final String source;
        private final MetadataCollector metadata;
        private final List<double[]> points = new ArrayList<>();
        private ColumnHeader temperature;
        private ColumnHeader chi;
        private int temperatureColumn = -1;
        private int chiColumn = -1;
        private int columns;
        private Delimiter delimiter;

        Collector(String source) {
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
                    chi = new ColumnHeader('X', formUnit(matcher.group(2).strip(), at), cells[c].strip());
                    chiColumn = c;
                } else {
                    ColumnHeader header = ColumnHeader.parse(cells[c], at);
                    if (header.letter() != 'T') {
                        throw new BadInputException(at, "a susceptibility table has a T column and a chi column, got '" + cells[c].strip() + "'");
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

        private Unit formUnit(String text, InputLocation at) {
            for (SusceptibilityForm form : SusceptibilityForm.values()) {
                var unit = UnitCatalog.find(text, form.dimension());
                if (unit.isPresent()) {
                    return unit.get();
                }
            }
            throw new BadInputException(at, "expected a susceptibility unit: SI or cgs (volume), m³/kg or cm³/g (mass), "
                    + "m³/mol or cm³/mol (molar), got '" + text + "'");
        }

        @Override
        public void row(String[] cells, int line) {
            if (cells.length != columns) {
                throw new BadInputException(InputLocation.line(source, line), String.format(
                        "%d cells, expected %d (%s-separated, as in the header)", cells.length, columns, delimiter.word()));
            }
            double t = TableNumbers.si(source, line, temperatureColumn, cells[temperatureColumn], temperature, delimiter);
            if (!(t > 0)) {
                throw new BadInputException(InputLocation.cell(source, line, temperatureColumn + 1, temperature.text()),
                        "temperature must be above absolute zero");
            }
            points.add(new double[] {t, TableNumbers.si(source, line, chiColumn, cells[chiColumn], chi, delimiter)});
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
            return new SusceptibilityTable(source, material, metadata.quantity("density", Dimension.DENSITY),
                    metadata.quantity("molar-mass", Dimension.MOLAR_MASS), metadata.text("source"), metadata.text("notes"),
                    form, points);
        }
    }
}
