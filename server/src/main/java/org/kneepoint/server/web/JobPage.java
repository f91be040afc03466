package org.kneepoint.server.web;

import java.util.List;
import java.util.Locale;
import org.kneepoint.server.app.fits.JilesAthertonFitDocument;
import org.kneepoint.server.app.imports.ImportReport;
import org.kneepoint.server.app.jobs.JobKind;
import org.kneepoint.server.app.jobs.JobProgress;
import org.kneepoint.server.app.jobs.JobStatus;

/**
 * The page of one background job ({@code /jobs/{id}}, template {@code job.jte}): while the job waits or runs it
 * shows the fraction done, the stage and the job's counts (files, curves) and reloads itself every second; when
 * done it shows the job's result (the fitted parameters, or the imported files with links to their grades), or
 * the error. The page can be bookmarked: the job goes on while nobody watches.
 */
final class JobPage {

    private JobPage() {
    }

    /**
     * What the page shows: the job's title and state (queued, running, done, failed), its progress and counts, the
     * result of a finished fit or import (the other null), and a failure's lead and message.
     */
    record View(Layout.Frame frame, String state, String percent, String fraction, String stage, List<String> counts,
            FitJobResult.View fit, ImportJobResult.View imported, String failureLead, String failure, boolean pending) {
    }

    static String render(JobStatus status, boolean demoPresent) {
        JobProgress progress = status.progress();
        boolean done = status.state() == JobStatus.State.DONE;
        View view = new View(new Layout.Frame(title(status.kind()), status.kind() == JobKind.IMPORT ? "Import" : "Library", demoPresent,
                status.pending()), status.state().name().toLowerCase(Locale.ROOT), String.format(Locale.ROOT, "%.0f %%", 100 * progress.fraction()),
                String.format(Locale.ROOT, "%.3f", progress.fraction()), progress.stage(), counts(progress),
                done && status.result() instanceof JilesAthertonFitDocument fit ? FitJobResult.of(fit) : null,
                done && status.result() instanceof ImportReport report ? ImportJobResult.of(report) : null,
                status.failure() == null ? null : failureLead(status), status.failure() == null ? null : status.failure().message(),
                status.pending());
        return Templates.render("job.jte", view);
    }

    /**
     * What a failed import left behind: nothing, for the program's own errors (the import is one
     * transaction); after an internal error that is not vouched for.
     */
    private static String failureLead(JobStatus status) {
        if (status.kind() != JobKind.IMPORT) {
            return null;
        }
        return status.failure().internal() ? "The import failed; look at the library before importing these files again."
                : "Nothing was imported.";
    }

    private static String title(JobKind kind) {
        return switch (kind) {
            case JA_FIT -> "Jiles–Atherton fit";
            case IMPORT -> "Import";
        };
    }

    /** The counts as lines such as "files: 2 of 5". */
    private static List<String> counts(JobProgress progress) {
        return progress.counts().stream().map(count -> count.name() + ": " + count.done() + (count.total() == null ? "" : " of " + count.total()))
                .toList();
    }
}
