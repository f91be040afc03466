package org.kneepoint.server.web;

import java.util.Locale;
import org.kneepoint.server.http.JobKind;
import org.kneepoint.server.http.JobProgress;
import org.kneepoint.server.http.JobStatus;

/**
 * The page of one background job ({@code /jobs/{id}}): while the job waits or runs it shows the
 * fraction done, the stage and the job's counts (files, curves) and reloads itself every second;
 * when done it shows the job's result (the fitted parameters, or the imported files with links to
 * their grades), or the error. The page can be bookmarked: the job goes on while nobody watches.
 */
final class JobPage {

    private JobPage() {
    }

    static String render(JobStatus status, boolean demoPresent) {
        String title = title(status.kind());
        StringBuilder out = new StringBuilder("<h1>").append(title).append("</h1>");
        JobProgress progress = status.progress();
        switch (status.state()) {
            case QUEUED -> out.append("<p class=\"status\">Waiting for the jobs before it to finish.</p>");
            case RUNNING -> out.append("<p class=\"status\">Running: ")
                    .append(String.format(Locale.ROOT, "%.0f %%", 100 * progress.fraction()))
                    .append(progress.stage() == null ? "" : ", " + Html.text(progress.stage())).append("</p>")
                    .append("<progress max=\"1\" value=\"").append(String.format(Locale.ROOT, "%.3f", progress.fraction())).append("\"></progress>")
                    .append(counts(progress));
            case DONE -> out.append(counts(progress)).append(status.kind() == JobKind.IMPORT
                    ? ImportJobResult.render(status.result()) : FitJobResult.render(status.result()));
            case FAILED -> out.append("<div class=\"problem\" role=\"alert\">").append(failureLead(status))
                    .append(Html.text(status.failure().message())).append("</div>").append(counts(progress));
        }
        if (status.pending()) {
            out.append("<p class=\"hint\">This page reloads itself every second; it can be left and bookmarked, the job goes on.</p>");
        }
        return Layout.page(title, status.kind() == JobKind.IMPORT ? "Import" : "Library", out.toString(), demoPresent, status.pending());
    }

    /**
     * What a failed import left behind: nothing, for the program's own errors (the import is one
     * transaction); after an internal error that is not vouched for.
     */
    private static String failureLead(JobStatus status) {
        if (status.kind() != JobKind.IMPORT) {
            return "";
        }
        return status.failure().internal() ? "<strong>The import failed; look at the library before importing these files again.</strong> "
                : "<strong>Nothing was imported.</strong> ";
    }

    private static String title(JobKind kind) {
        return switch (kind) {
            case JA_FIT -> "Jiles–Atherton fit";
            case IMPORT -> "Import";
        };
    }

    /** The counts as a list of lines such as "files: 2 of 5". */
    private static String counts(JobProgress progress) {
        if (progress.counts().isEmpty()) {
            return "";
        }
        StringBuilder out = new StringBuilder("<ul class=\"counts\">");
        for (JobProgress.Count count : progress.counts()) {
            out.append("<li>").append(Html.text(count.name())).append(": ").append(count.done())
                    .append(count.total() == null ? "" : " of " + count.total()).append("</li>");
        }
        return out.append("</ul>").toString();
    }
}
