package org.kneepoint.importer.json;

import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.importer.csv.CurveFile;
import org.kneepoint.importer.csv.CurveFileReader;
import org.kneepoint.importer.csv.CurveMetadata;
import org.kneepoint.importer.csv.CurveTableCollector;
import org.kneepoint.importer.csv.Delimiter;
import org.kneepoint.importer.csv.MetadataLine;
import org.kneepoint.importer.csv.ReadLimits;
import org.kneepoint.importer.input.Excerpt;
import org.kneepoint.importer.input.InputFile;

/**
 * Reads a curve file written as JSON: one object with the metadata fields of the text format
 * ({@code grade}, {@code family}, {@code supplier}, {@code temperature}, {@code kind},
 * {@code source}, {@code notes}; strings, or null for none), {@code columns} (header cells such as "H [kOe]") and
 * {@code rows} (arrays of numbers), and nothing after it. It feeds the same checks as the text
 * reader, so both formats say the same things about the same content; positions are the JSON
 * text's lines and columns.
 */
public final class CurveJsonReader {

    private final ReadLimits limits;

    public CurveJsonReader(ReadLimits limits) {
        this.limits = limits;
    }

    /** Reads a file from disk after checking its size against the limit. */
    public CurveFile read(Path path) {
        return read(InputFile.load(path, limits.maxBytes()));
    }

    /** Reads a file already in memory. */
    public static CurveFile read(InputFile file) {
        String source = file.source();
        JsonParser parser = null;
        try {
            parser = JsonInput.FACTORY.createParser(file.bytes());
            CurveFile result = read(source, parser);
            JsonInput.requireEnd(source, parser);
            return result;
        } catch (JsonProcessingException e) {
            throw JsonInput.refusal(source, e, parser);
        } catch (IOException e) {
            throw new BadInputException(InputLocation.of(source), "cannot read the file: " + e.getMessage());
        }
    }

    private static CurveFile read(String source, JsonParser parser) throws IOException {
        CurveTableCollector collector = CurveFileReader.collector(source);
        expect(source, parser, parser.nextToken(), JsonToken.START_OBJECT, "a JSON object");
        boolean sawRows = false;
        boolean sawColumns = false;
        while (parser.nextToken() == JsonToken.FIELD_NAME) {
            String field = parser.currentName();
            JsonToken value = parser.nextToken();
            int line = parser.currentLocation().getLineNr();
            if (field.equals("columns")) {
                collector.header(strings(source, parser, value), Delimiter.COMMA, line);
                sawColumns = true;
            } else if (field.equals("rows")) {
                if (!sawColumns) {
                    throw new BadInputException(at(source, parser, field), "'columns' must come before 'rows'");
                }
                expect(source, parser, value, JsonToken.START_ARRAY, "an array of rows");
                for (JsonToken row = parser.nextToken(); row != JsonToken.END_ARRAY; row = parser.nextToken()) {
                    expect(source, parser, row, JsonToken.START_ARRAY, "a row: an array of numbers such as [-2.5, 12.81]");
                    collector.row(numbers(source, parser), parser.currentLocation().getLineNr());
                    sawRows = true;
                }
            } else if (CurveMetadata.KEYS.contains(field)) {
                if (value == JsonToken.VALUE_NULL) {
                    continue;
                }
                expect(source, parser, value, JsonToken.VALUE_STRING, "a string");
                collector.metadata(new MetadataLine(field, parser.getText().strip()), line);
            } else {
                throw new BadInputException(at(source, parser, Excerpt.of(field)), "unknown field; expected columns, rows or one of "
                        + CurveMetadata.KEYS);
            }
        }
        if (!sawColumns || !sawRows) {
            throw new BadInputException(InputLocation.of(source), "a JSON curve file needs 'columns' and at least one row in 'rows'");
        }
        return collector.result();
    }

    private static String[] strings(String source, JsonParser parser, JsonToken start) throws IOException {
        expect(source, parser, start, JsonToken.START_ARRAY, "an array of column names such as [\"H [kOe]\", \"J [kG]\"]");
        List<String> values = new ArrayList<>();
        for (JsonToken token = parser.nextToken(); token != JsonToken.END_ARRAY; token = parser.nextToken()) {
            expect(source, parser, token, JsonToken.VALUE_STRING, "a column name");
            values.add(parser.getText());
        }
        return values.toArray(String[]::new);
    }

    private static String[] numbers(String source, JsonParser parser) throws IOException {
        List<String> values = new ArrayList<>();
        for (JsonToken token = parser.nextToken(); token != JsonToken.END_ARRAY; token = parser.nextToken()) {
            if (token != JsonToken.VALUE_NUMBER_INT && token != JsonToken.VALUE_NUMBER_FLOAT) {
                throw new BadInputException(at(source, parser, "rows"), "expected a number, got "
                        + (token == JsonToken.VALUE_STRING ? "the text \"" + Excerpt.of(parser.getText()) + "\""
                                : token == null ? "the end of the file" : Excerpt.of(parser.getText())));
            }
            values.add(parser.getText());
        }
        return values.toArray(String[]::new);
    }

    private static void expect(String source, JsonParser parser, JsonToken token, JsonToken wanted, String what) {
        if (token != wanted) {
            throw new BadInputException(at(source, parser, null), "expected " + what);
        }
    }

    private static InputLocation at(String source, JsonParser parser, String field) {
        var location = parser.currentLocation();
        return InputLocation.cell(source, Math.max(0, location.getLineNr()), Math.max(0, location.getColumnNr()), field);
    }
}
