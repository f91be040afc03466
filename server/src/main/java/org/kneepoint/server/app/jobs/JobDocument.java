package org.kneepoint.server.app.jobs;

import com.fasterxml.jackson.annotation.JsonInclude;
import java.util.List;
import java.util.Locale;

/**
 * A background job as {@code GET /api/jobs/{id}} answers it: its kind, state, fraction done, stage in words and
 * counts; when done its result document, when failed the error's message and code (the keys that do not apply are
 * left out).
 *
 * @param kind   {@code ja-fit} or {@code import}
 * @param state  {@code queued}, {@code running}, {@code done} or {@code failed}
 * @param result the result record of a finished job (a Jiles–Atherton fit document or an import report)
 */
public record JobDocument(String kind, String state, double fraction, String stage, List<JobProgress.Count> counts,
        @JsonInclude(JsonInclude.Include.NON_NULL) Object result,
        @JsonInclude(JsonInclude.Include.NON_NULL) String error,
        @JsonInclude(JsonInclude.Include.NON_NULL) String errorCode) {

    /** The answer to a job's start: its id, its status route and its page. */
    public record Started(String id, String status, String page) {

        /** The routes of the job with this id. */
        public static Started of(String id) {
            return new Started(id, "/api/jobs/" + id, "/jobs/" + id);
        }
    }

    /** The document of a job's status. */
    public static JobDocument of(JobStatus status) {
        boolean failed = status.state() == JobStatus.State.FAILED;
        return new JobDocument(status.kind().key(), status.state().name().toLowerCase(Locale.ROOT), status.progress().fraction(),
                status.progress().stage(), status.progress().counts(),
                status.state() == JobStatus.State.DONE ? status.result() : null,
                failed ? status.failure().message() : null, failed ? status.failure().code() : null);
    }
}
