package org.kneepoint.importer.csv;

import java.nio.file.Path;
import org.kneepoint.importer.input.InputFile;

/**
 * Reads an element-field file (docs/element-fields.md): a field solver's result, one row per element or
 * integration point — position, field (H or B), volume (or area and depth), optionally direction and temperature —
 * with the same metadata, header, delimiter, quoting and line/column errors as a curve file. Rows go straight into
 * primitive columns, so a million rows are read in a few seconds and a few arrays.
 */
public final class ElementFileReader {

    /** The size limit for element files when none is given: 256 MiB, about three million rows. */
    public static final long DEFAULT_MAX_BYTES = 256L * 1024 * 1024;

    private final ReadLimits limits;

    public ElementFileReader(ReadLimits limits) {
        this.limits = limits;
    }

    /** Reads a file from disk after checking its size against the limit. */
    public ElementFile read(Path path) {
        return read(path.getFileName().toString(), InputFile.loadText(path, limits.maxBytes()));
    }

    /** Reads a file already in memory (an upload). */
    public static ElementFile read(InputFile file) {
        return read(file.source(), file.text());
    }

    /** Reads element-table text; {@code source} names it in messages. */
    public static ElementFile read(String source, String text) {
        ElementCollector collector = new ElementCollector(source);
        TableScanner.scan(source, text, collector);
        return collector.result();
    }
}
