package org.kneepoint.server.http;

import org.kneepoint.server.app.jobs.JobProgress;
import org.kneepoint.server.app.jobs.JobWork;
import org.kneepoint.server.app.serving.ServerSettings;

import java.util.List;
import java.util.function.Consumer;
import org.kneepoint.db.Library;
import org.kneepoint.importer.csv.ReadLimits;
import org.kneepoint.server.app.imports.ImportReport;
import org.kneepoint.server.app.imports.ImportRun;
import org.kneepoint.server.app.imports.ImportStep;

/**
 * An import of uploaded files as a background job: the same run as {@code POST /api/import}, one
 * transaction, its steps shown as job progress (the file being read, validated or characterized,
 * files checked of all, curves characterized), its result the document of {@code kneepoint import
 * --json}. The job owns the uploads and deletes them when it ends or is discarded.
 */
public final class ImportJob implements JobWork {

    private final Library library;
    private final Uploads uploads;

    ImportJob(Library library, Uploads uploads) {
        this.library = library;
        this.uploads = uploads;
    }

    @Override
    public ImportReport run(Consumer<JobProgress> progress) {
        try (uploads) {
            return ImportReport.of(ImportRun.run(library, new ReadLimits(ServerSettings.MAX_UPLOAD_BYTES), uploads.files(), false,
                    step -> progress.accept(progressOf(step))), false);
        }
    }

    @Override
    public void discard() {
        uploads.close();
    }

    /** An import step as job progress; storing counts as one more step after the files. */
    public static JobProgress progressOf(ImportStep step) {
        String stage = switch (step.stage()) {
            case READING -> "reading " + step.file();
            case VALIDATING -> "validating " + step.file();
            case CHARACTERIZING -> "characterizing the curves of " + step.file();
            case STORING -> "storing everything in one transaction";
        };
        List<JobProgress.Count> counts = List.of(new JobProgress.Count("files checked", step.filesChecked(), step.files()),
                new JobProgress.Count("curves characterized", step.curvesChecked(), step.everyFileChecked() ? step.curvesFound() : null));
        return new JobProgress(step.filesChecked() / (step.files() + 1.0), stage, counts);
    }
}
