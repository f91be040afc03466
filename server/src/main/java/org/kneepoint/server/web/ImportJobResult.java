package org.kneepoint.server.web;

import java.util.List;
import org.kneepoint.server.app.imports.ImportReport;

/**
 * The result of a finished import job (the report of {@code kneepoint import --json}, template
 * {@code importResult.jte}): each file with what it added, and a link to every grade it imported.
 */
final class ImportJobResult {

    private ImportJobResult() {
    }

    /** The files of the import. */
    record View(List<FileRow> files) {
    }

    /** One file: already imported (as {@code importedAs}), or the grades, curves and points it added. */
    record FileRow(String file, String importedAs, List<Links.Link> grades, String curves, String points) {
    }

    static View of(ImportReport result) {
        return new View(result.files().stream().map(ImportJobResult::row).toList());
    }

    private static FileRow row(ImportReport.FileReport file) {
        if (file.alreadyImported()) {
            return new FileRow(file.file(), file.importedAs(), List.of(), null, null);
        }
        List<Links.Link> grades = file.grades().stream().map(Links.Link::toGrade).toList();
        return new FileRow(file.file(), null, grades, String.valueOf(file.curves()), String.valueOf(file.points() + file.susceptibilityPoints()));
    }
}
