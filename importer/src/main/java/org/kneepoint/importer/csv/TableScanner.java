package org.kneepoint.importer.csv;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;

/**
 * Walks a delimited text table line by line — byte-order mark, blank lines, {@code #} metadata and
 * comments, the header row (which tells the delimiter), data rows — and hands each part to a
 * {@link TableHandler}. Files are checked against the size limit first and must be UTF-8.
 */
final class TableScanner {

    private TableScanner() {
    }

    /** Scans a file from disk. */
    static void scan(Path path, ReadLimits limits, TableHandler handler) {
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
                scan(source, reader, handler);
            }
        } catch (NoSuchFileException e) {
            throw new BadInputException(InputLocation.of(source), "no such file (looked for " + path + ")");
        } catch (CharacterCodingException e) {
            throw new BadInputException(InputLocation.of(source), "the file is not UTF-8 text");
        } catch (IOException e) {
            throw new BadInputException(InputLocation.of(source), "cannot read the file: " + e.getMessage());
        }
    }

    /** Scans text; {@code source} names it in messages. */
    static void scan(String source, BufferedReader reader, TableHandler handler) throws IOException {
        Delimiter delimiter = null;
        int lineNumber = 0;
        boolean rows = false;
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
                if (entry != null && delimiter != null) {
                    throw new BadInputException(InputLocation.line(source, lineNumber), "metadata lines must come before the header row");
                }
                if (entry != null) {
                    handler.metadata(entry, lineNumber);
                }
                continue;
            }
            if (delimiter == null) {
                delimiter = Delimiter.of(line);
                if (delimiter == null) {
                    throw new BadInputException(InputLocation.line(source, lineNumber),
                            "expected a header row of at least two columns separated by commas, semicolons or tabs, such as 'H [kOe],J [kG]'");
                }
                handler.header(delimiter.split(line), delimiter, lineNumber);
                continue;
            }
            handler.row(delimiter.split(line), lineNumber);
            rows = true;
        }
        if (lineNumber == 0) {
            throw new BadInputException(InputLocation.of(source), "the file is empty; expected a header such as 'H [kOe],J [kG]' followed by rows of numbers");
        }
        if (delimiter == null) {
            throw new BadInputException(InputLocation.of(source), "the file has no header row; expected a header such as 'H [kOe],J [kG]' followed by rows of numbers");
        }
        if (!rows) {
            throw new BadInputException(InputLocation.of(source), "the file has a header but no data rows");
        }
    }

    /** The first header row of a file, for telling curve files from susceptibility tables; null if none. */
    static String[] peekHeader(Path path) {
        try (BufferedReader reader = Files.newBufferedReader(path, StandardCharsets.UTF_8)) {
            for (String line = reader.readLine(); line != null; line = reader.readLine()) {
                String stripped = line.replace("\uFEFF", "").strip();
                if (!stripped.isEmpty() && !stripped.startsWith("#")) {
                    Delimiter delimiter = Delimiter.of(stripped);
                    return delimiter == null ? new String[] {stripped} : delimiter.split(stripped);
                }
            }
            return null;
        } catch (IOException e) {
            return null;
        }
    }
}
