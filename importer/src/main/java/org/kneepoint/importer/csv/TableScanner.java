package org.kneepoint.importer.csv;

import java.io.IOException;
import java.io.StringReader;
import java.io.UncheckedIOException;
import java.util.Iterator;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;

/**
 * Walks a delimited text table — byte-order mark, blank lines, {@code #} metadata and comments,
 * the header row (which tells the delimiter), data rows — and hands each part to a
 * {@link TableHandler}. Our layer finds the metadata, the header and the line of every record;
 * Commons CSV splits the records into cells with RFC 4180 quoting ({@code "H [kOe]"}, a quote
 * doubled inside quotes, a delimiter or line break inside a quoted cell).
 */
final class TableScanner {

    private TableScanner() {
    }

    /** Scans the text of a file; {@code source} names it in messages. */
    static void scan(String source, String content, TableHandler handler) {
        String text = unindentComments(content.startsWith("\uFEFF") ? content.substring(1) : content);
        PhysicalLines lines = PhysicalLines.of(text);
        if (lines.count() == 0) {
            throw new BadInputException(InputLocation.of(source), "the file is empty; expected a header such as 'H [kOe],J [kG]' followed by rows of numbers");
        }
        int header = preamble(source, lines, handler);
        Delimiter delimiter = Delimiter.of(lines.text(header));
        if (delimiter == null) {
            throw new BadInputException(InputLocation.line(source, header),
                    "expected a header row of at least two columns separated by commas, semicolons or tabs, such as 'H [kOe],J [kG]'");
        }
        CSVFormat format = CSVFormat.RFC4180.builder().setDelimiter(delimiter.character()).setCommentMarker('#')
                .setIgnoreEmptyLines(true).setIgnoreSurroundingSpaces(true).get();
        boolean rows = false;
        try (CSVParser parser = CSVParser.parse(new StringReader(text.substring(lines.start(header))), format)) {
            Iterator<CSVRecord> records = parser.iterator();
            int next = header;
            boolean headerSeen = false;
            while (true) {
                int start = recordStart(source, lines, next, headerSeen);
                CSVRecord record = nextRecord(source, records, start);
                if (record == null) {
                    break;
                }
                next = header + (int) parser.getCurrentLineNumber();
                String[] cells = record.values();
                if (lines.blank(Math.min(start, lines.count()))) {
                    continue;
                }
                if (!headerSeen) {
                    handler.header(cells, delimiter, start);
                    headerSeen = true;
                } else {
                    handler.row(cells, start);
                    rows = true;
                }
            }
        } catch (IOException e) {
            throw new BadInputException(InputLocation.of(source), "cannot read the file: " + e.getMessage());
        }
        if (!rows) {
            throw new BadInputException(InputLocation.of(source), "the file has a header but no data rows");
        }
    }

    /**
     * The text with the white space before a {@code #} at the start of a line removed, so that an
     * indented comment is a comment to the tokenizer too (which knows only a {@code #} in the first
     * column); the text itself when there is none. Line numbers do not change.
     */
    private static String unindentComments(String text) {
        PhysicalLines lines = PhysicalLines.of(text);
        StringBuilder unindented = null;
        int copied = 0;
        for (int line = 1; line <= lines.count(); line++) {
            int start = lines.start(line);
            int first = start;
            while (first < text.length() && (text.charAt(first) == ' ' || text.charAt(first) == '\t')) {
                first++;
            }
            if (first > start && first < text.length() && text.charAt(first) == '#') {
                unindented = unindented == null ? new StringBuilder(text.length()) : unindented;
                unindented.append(text, copied, start);
                copied = first;
            }
        }
        return unindented == null ? text : unindented.append(text, copied, text.length()).toString();
    }

    /** Hands the metadata before the header to the handler and returns the header's line. */
    private static int preamble(String source, PhysicalLines lines, TableHandler handler) {
        for (int line = 1; line <= lines.count(); line++) {
            String text = lines.text(line);
            if (text.isBlank()) {
                continue;
            }
            if (!text.strip().startsWith("#")) {
                return line;
            }
            MetadataLine entry = MetadataLine.parse(text);
            if (entry != null) {
                handler.metadata(entry, line);
            }
        }
        throw new BadInputException(InputLocation.of(source), "the file has no header row; expected a header such as 'H [kOe],J [kG]' followed by rows of numbers");
    }

    /** The line where the next record begins: the tokenizer passes over empty and {@code #} lines, and so do we. */
    private static int recordStart(String source, PhysicalLines lines, int from, boolean afterHeader) {
        int line = from;
        while (line <= lines.count() && lines.passedOver(line)) {
            if (afterHeader) {
                comment(source, lines.text(line), line);
            }
            line++;
        }
        return line;
    }

    private static void comment(String source, String text, int line) {
        if (MetadataLine.parse(text) != null) {
            throw new BadInputException(InputLocation.line(source, line), "metadata lines must come before the header row");
        }
    }

    private static CSVRecord nextRecord(String source, Iterator<CSVRecord> records, int line) {
        try {
            return records.hasNext() ? records.next() : null;
        } catch (UncheckedIOException e) {
            throw new BadInputException(InputLocation.line(source, line), "a quoted cell is not closed properly: expected its closing"
                    + " quote, then a separator or the end of the line (inside quotes, write a quote twice: \"\")");
        }
    }
}
