package org.kneepoint.importer.csv;

import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.kneepoint.fitter.curve.CurveKind;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.fitter.limits.PhysicalLimits;
import org.kneepoint.fitter.units.Dimension;
import org.kneepoint.importer.input.InputFile;
import org.kneepoint.importer.plausible.PlausibleInput;

/**
 * Reads a curve file (see the package description) into SI curves. Every problem is reported
 * with the file name, line and column and what was expected; nothing is guessed. A file with a
 * temperature column holds one curve per distinct temperature. Every curve must be plausible
 * ({@link org.kneepoint.fitter.limits.CurvePlausibility}).
 */
public final class CurveFileReader {

    private final ReadLimits limits;

    public CurveFileReader(ReadLimits limits) {
        this.limits = limits;
    }

    /** Reads a file from disk after checking its size against the limit. */
    public CurveFile read(Path path) {
        return read(InputFile.load(path, limits.maxBytes()));
    }

    /** Reads a file already in memory. */
    public CurveFile read(InputFile file) {
        return read(file.source(), file.text());
    }

    /** Reads curve-file text; {@code source} names it in messages. */
    public static CurveFile read(String source, String text) {
        CurveTableCollector collector = collector(source);
        TableScanner.scan(source, text, collector);
        return collector.result();
    }

    /** A fresh collector, for readers of other layouts (JSON) that feed the same parts. */
    public static CurveTableCollector collector(String source) {
        return new Collector(source);
    }

    /** Collects one file's metadata and points while it is scanned. */
    private static final class Collector implements CurveTableCollector {
        private final String source;
        private final MetadataCollector metadata;
        private final Map<Double, PointColumns> groups = new LinkedHashMap<>();
        private TableLayout layout;
        private Delimiter delimiter;

        Collector(String source) {
            this.source = source;
            this.metadata = new MetadataCollector(source, CurveMetadata.KEYS);
        }

        @Override
        public void metadata(MetadataLine entry, int line) {
            metadata.add(entry, line);
        }

        @Override
        public void header(String[] cells, Delimiter delimiter, int line) {
            if (layout != null) {
                throw new BadInputException(InputLocation.line(source, line), "a second header; a file has one header row");
            }
            this.layout = TableLayout.of(source, line, cells);
            this.delimiter = delimiter;
        }

        @Override
        public void row(String[] cells, int line) {
            if (cells.length != layout.columns()) {
                throw new BadInputException(InputLocation.line(source, line), String.format(
                        "%d cells, expected %d (%s-separated, as in the header)", cells.length, layout.columns(), delimiter.word()));
            }
            double h = number(line, cells, layout.hColumn());
            double value = number(line, cells, layout.valueColumn());
            if (layout.magnetization()) {
                value = MU0 * value;
            }
            Double temperature = layout.temperatureColumn() < 0 ? null : temperature(line, cells);
            groups.computeIfAbsent(temperature, key -> new PointColumns()).add(h, value, line);
        }

        private double temperature(int line, String[] cells) {
            double temperature = number(line, cells, layout.temperatureColumn());
            InputLocation at = InputLocation.cell(source, line, layout.temperatureColumn() + 1, layout.name(layout.temperatureColumn()));
            if (!(temperature > 0)) {
                throw new BadInputException(at, "temperature must be above absolute zero");
            }
            return PlausibleInput.within(at, "temperature", temperature, PhysicalLimits.CURVE_TEMPERATURE);
        }

        private double number(int line, String[] cells, int column) {
            return TableNumbers.si(source, line, column, cells[column], layout.headers()[column], delimiter);
        }

        @Override
        public CurveFile result() {
            CurveMetadata meta = new CurveMetadata(metadata.text("grade"), metadata.text("family"), metadata.text("supplier"),
                    metadata.quantity("density", Dimension.DENSITY, PhysicalLimits.DENSITY),
                    metadata.quantity("temperature", Dimension.TEMPERATURE, PhysicalLimits.CURVE_TEMPERATURE),
                    metadata.choice("kind", CurveMetadata.KINDS), metadata.text("source"), metadata.text("notes"));
            CurveKind kind = CurveKinds.of(source, meta.kind(), layout.quantity());
            if (meta.temperatureK() != null && layout.temperatureColumn() >= 0) {
                throw new BadInputException(InputLocation.of(source), "the temperature is given both as metadata and as a T column; keep one");
            }
            List<DemagnetizationCurve> curves = new ArrayList<>();
            for (Map.Entry<Double, PointColumns> group : groups.entrySet()) {
                PointColumns points = group.getValue();
                if (kind != CurveKind.LOOP) {
                    ConflictingDuplicates.check(source, points, layout.quantity());
                }
                Double temperature = group.getKey() != null ? group.getKey() : meta.temperatureK();
                DemagnetizationCurve curve = new DemagnetizationCurve(kind, layout.quantity(), points.h(), points.values(), temperature);
                curves.add(PlausibleInput.curve(curve, new CurvePlaces(source, layout, points, metadata.line("temperature"))::of));
            }
            return new CurveFile(source, meta, curves);
        }
    }
}
