package org.kneepoint.server.http;

import org.kneepoint.server.app.jobs.JobDocument;
import org.kneepoint.server.app.jobs.JobRegistry;
import org.kneepoint.server.app.jobs.JobStatus;

import io.javalin.http.Context;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.error.NotFoundException;

/**
 * {@code POST /api/jobs/ja-fit} and {@code POST /api/jobs/import} start a fit or an import in the
 * background; {@code GET /api/jobs/{id}} tells how it is going.
 */
final class JobApi {

    private final Library library;
    private final JobRegistry jobs;

    JobApi(Library library, JobRegistry jobs) {
        this.library = library;
        this.jobs = jobs;
    }

    void jilesAthertonFit(Context context) {
        started(context, JobRequests.jilesAthertonFit(context, library, jobs));
    }

    void importFiles(Context context) {
        started(context, JobRequests.importFiles(library, Uploads.of(context), jobs));
    }

    /** 202 Accepted with the job's id, its status route (also as Location) and its page. */
    private static void started(Context context, String id) {
        context.status(202).header("Location", "/api/jobs/" + id);
        LibraryApi.json(context, JobDocument.Started.of(id));
    }

    void job(Context context) {
        String id = context.pathParam("id");
        JobStatus status = jobs.status(id).orElseThrow(() -> new NotFoundException("no job with id '" + id + "' (jobs are kept for a while only)"));
        LibraryApi.json(context, JobDocument.of(status));
    }
}
