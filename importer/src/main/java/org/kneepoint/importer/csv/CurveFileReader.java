package org.kneepoint.importer.csv;

import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.kneepoint.fitter.curve.CurveKind;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.curve.Quantity;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.fitter.units.DecimalNumber;

/**
 * Reads a curve file (see the package description) into SI curves. Every problem is reported
 * with the file name, line and column and what was expected; nothing is guessed. A file with a
 * temperature column holds one curve per distinct temperature.
 */
public final class CurveFileReader {

    private final ReadLimits limits;

    public CurveFileReader(ReadLimits limits) {
        this.limits = limits;
    }

    /** Reads a file from disk after checking its size against the limit. */
    public CurveFile read(Path path) {
        String source = path.getFileName().toString();
        try {
            long size = Files.size(path);
            if (size > limits.maxBytes()) {
                throw new BadInputException(InputLocation.of(source), String.format(
                        "the file is %d bytes, larger than the limit of %d bytes", size, limits.maxBytes()));
            }
            var decoder = StandardCharsets.UTF_8.newDecoder()
                    .onMalformedInput(CodingErrorAction.REPORT).onUnmappableCharacter(CodingErrorAction.REPORT);
            try (BufferedReader reader = new BufferedReader(new InputStreamReader(Files.newInputStream(path), decoder))) {
                return read(source, reader);
            }
        } catch (java.nio.file.NoSuchFileException e) {
            throw new BadInputException(InputLocation.of(source), "no such file (looked for " + path + ")");
        } catch (CharacterCodingException e) {
            throw new BadInputException(InputLocation.of(source), "the file is not UTF-8 text");
        } catch (IOException e) {
            throw new BadInputException(InputLocation.of(source), "cannot read the file: " + e.getMessage());
        }
    }

    /** Reads curve-file text; {@code source} names it in messages. */
    public CurveFile read(String source, BufferedReader reader) throws IOException {
        MetadataCollector metadata = new MetadataCollector(source);
        TableLayout layout = null;
        Delimiter delimiter = null;
        Map<Double, PointColumns> groups = new LinkedHashMap<>();
        int lineNumber = 0;
        for (String line = reader.readLine(); line != null; line = reader.readLine()) {
            lineNumber++;
            if (lineNumber == 1 && line.startsWith("\uFEFF")) {
                line = line.substring(1);
            }
            if (line.isBlank()) {
                continue;
            }
            if (line.strip().startsWith("#")) {
                MetadataLine entry = MetadataLine.parse(line);
                if (entry != null && layout != null) {
                    throw new BadInputException(InputLocation.line(source, lineNumber), "metadata lines must come before the header row");
                }
                if (entry != null) {
                    metadata.add(entry, lineNumber);
                }
                continue;
            }
            if (layout == null) {
                delimiter = Delimiter.of(line);
                if (delimiter == null) {
                    throw new BadInputException(InputLocation.line(source, lineNumber),
                            "expected a header row of at least two columns separated by commas, semicolons or tabs, such as 'H [kOe],J [kG]'");
                }
                layout = TableLayout.of(source, lineNumber, delimiter.split(line));
                continue;
            }
            readRow(source, lineNumber, delimiter.split(line), layout, delimiter, groups);
        }
        if (lineNumber == 0) {
            throw new BadInputException(InputLocation.of(source), "the file is empty; expected a header such as 'H [kOe],J [kG]' followed by rows of numbers");
        }
        if (layout == null) {
            throw new BadInputException(InputLocation.of(source), "the file has no header row; expected a header such as 'H [kOe],J [kG]' followed by rows of numbers");
        }
        if (groups.isEmpty()) {
            throw new BadInputException(InputLocation.of(source), "the file has a header but no data rows");
        }
        CurveMetadata meta = metadata.metadata();
        return new CurveFile(source, meta, curves(source, meta, layout, groups));
    }

    private static void readRow(String source, int line, String[] cells, TableLayout layout, Delimiter delimiter,
            Map<Double, PointColumns> groups) {
        if (cells.length != layout.columns()) {
            throw new BadInputException(InputLocation.line(source, line), String.format(
                    "%d cells, expected %d (%s-separated, as in the header)", cells.length, layout.columns(), delimiter.word()));
        }
        double h = number(source, line, cells, layout.hColumn(), layout, delimiter);
        double value = number(source, line, cells, layout.valueColumn(), layout, delimiter);
        if (layout.magnetization()) {
            value = MU0 * value;
        }
        Double temperature = layout.temperatureColumn() < 0 ? null
                : number(source, line, cells, layout.temperatureColumn(), layout, delimiter);
        if (temperature != null && !(temperature > 0)) {
            throw new BadInputException(InputLocation.cell(source, line, layout.temperatureColumn() + 1,
                    layout.name(layout.temperatureColumn())), "temperature must be above absolute zero");
        }
        groups.computeIfAbsent(temperature, key -> new PointColumns()).add(h, value, line);
    }

    private static double number(String source, int line, String[] cells, int column, TableLayout layout, Delimiter delimiter) {
        String text = cells[column].strip();
        double parsed = DecimalNumber.parseOrNaN(text, delimiter.allowsDecimalComma());
        if (Double.isNaN(parsed)) {
            throw new BadInputException(InputLocation.cell(source, line, column + 1, layout.name(column)),
                    "expected a finite number, got '" + text + "'");
        }
        double si = layout.headers()[column].unit().toSi(parsed);
        if (!Double.isFinite(si)) {
            throw new BadInputException(InputLocation.cell(source, line, column + 1, layout.name(column)),
                    "the number '" + text + "' is out of range");
        }
        return si;
    }

    private static List<DemagnetizationCurve> curves(String source, CurveMetadata metadata, TableLayout layout,
            Map<Double, PointColumns> groups) {
        CurveKind kind = CurveKinds.of(source, metadata.kind(), layout.quantity());
        if (metadata.temperatureK() != null && layout.temperatureColumn() >= 0) {
            throw new BadInputException(InputLocation.of(source), "the temperature is given both as metadata and as a T column; keep one");
        }
        List<DemagnetizationCurve> curves = new ArrayList<>();
        for (Map.Entry<Double, PointColumns> group : groups.entrySet()) {
            PointColumns points = group.getValue();
            if (kind != CurveKind.LOOP) {
                ConflictingDuplicates.check(source, points, layout.quantity());
            }
            Double temperature = group.getKey() != null ? group.getKey() : metadata.temperatureK();
            curves.add(new DemagnetizationCurve(kind, layout.quantity(), points.h(), points.values(), temperature));
        }
        return curves;
    }
}
