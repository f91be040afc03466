package org.kneepoint.server.http;

import io.javalin.http.Context;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
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
        Map<String, Object> body = new LinkedHashMap<>();
        body.put("id", id);
        body.put("status", "/api/jobs/" + id);
        body.put("page", "/jobs/" + id);
        LibraryApi.json(context, body);
    }

    void job(Context context) {
        String id = context.pathParam("id");
        JobStatus status = jobs.status(id).orElseThrow(() -> new NotFoundException("no job with id '" + id + "' (jobs are kept for a while only)"));
        Map<String, Object> body = new LinkedHashMap<>();
        body.put("kind", status.kind().key());
        body.put("state", status.state().name().toLowerCase());
        body.put("fraction", status.progress().fraction());
        body.put("stage", status.progress().stage());
        List<Map<String, Object>> counts = new ArrayList<>();
        for (JobProgress.Count count : status.progress().counts()) {
            Map<String, Object> item = new LinkedHashMap<>();
            item.put("name", count.name());
            item.put("done", count.done());
            item.put("total", count.total());
            counts.add(item);
        }
        body.put("counts", counts);
        if (status.state() == JobStatus.State.DONE) {
            body.put("result", status.result());
        } else if (status.state() == JobStatus.State.FAILED) {
            body.put("error", status.failure().message());
            body.put("errorCode", status.failure().code());
        }
        LibraryApi.json(context, body);
    }
}
