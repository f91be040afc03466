package org.kneepoint.server.app.lots;

import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;

/**
 * Files of a delivered lot to store for a grade.
 *
 * @param grade      the grade the lot is of (must be in the library)
 * @param lot        the lot's identifier
 * @param files      curve files, in any format the import reads
 * @param measuredOn the day of measurement, or null
 * @param sample     the sample every file was measured on; null: each file is a sample named after the file
 * @param notes      free text, or null
 */
public record LotImportRequest(String grade, String lot, List<Path> files, LocalDate measuredOn, String sample, String notes) {

    public LotImportRequest {
        files = List.copyOf(files);
    }
}
