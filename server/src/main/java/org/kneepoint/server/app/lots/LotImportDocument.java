package org.kneepoint.server.app.lots;

import java.util.List;

/** What a lot import stored: per file its checksum, sample, curves and points. */
public record LotImportDocument(String grade, String lot, List<FileEntry> files) {

    /** One imported file. */
    public record FileEntry(String fileName, String sha256, String sample, List<Double> temperaturesK, int curves, int points) {
    }
}
