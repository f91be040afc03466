package org.kneepoint.importer.files;

import java.nio.file.Path;
import java.util.Locale;
import org.kneepoint.importer.csv.DelimitedFileReader;
import org.kneepoint.importer.csv.FileContent;
import org.kneepoint.importer.csv.ReadLimits;
import org.kneepoint.importer.input.InputFile;
import org.kneepoint.importer.json.CurveJsonReader;

/**
 * Reads any input file Kneepoint imports — a curve file as text or JSON, or a susceptibility
 * table — choosing the reader once: by the name for JSON ({@code .json}), by the header row for
 * text (a {@code chi} column makes a susceptibility table). The bytes are read from disk once;
 * their SHA-256 comes with them ({@link InputFile#sha256()}).
 */
public final class CurveFiles {

    private CurveFiles() {
    }

    /** Reads the file at {@code path} (size checked first) and what it holds. */
    public static FileContent read(Path path, ReadLimits limits) {
        return read(InputFile.load(path, limits.maxBytes()));
    }

    /** What a file already read holds. */
    public static FileContent read(InputFile file) {
        if (file.source().toLowerCase(Locale.ROOT).endsWith(".json")) {
            return CurveJsonReader.read(file);
        }
        return DelimitedFileReader.read(file.source(), file.text());
    }
}
