package org.kneepoint.server.app.jobs;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.kneepoint.server.app.Json;
import org.kneepoint.server.app.JsonKeys;

/** A job's document: the keys of each state, the result only when done, the error only when failed. */
class JobDocumentTest {

    private static final JobProgress HALF = new JobProgress(0.5, "reading a.csv", List.of(new JobProgress.Count("files checked", 1, 2)));

    record Result(String answer) {
    }

    @Test
    void a_running_job_has_its_progress_and_no_result_or_error_keys() {
        JobDocument document = JobDocument.of(new JobStatus(JobKind.IMPORT, JobStatus.State.RUNNING, HALF, null, null));
        assertEquals(List.of("kind", "state", "fraction", "stage", "counts"), JsonKeys.of(document));
        assertEquals("import", document.kind());
        assertEquals("running", document.state());
        assertEquals(List.of("name", "done", "total"), JsonKeys.of(Json.tree(document).get("counts").get(0)));
    }

    @Test
    void a_finished_job_has_its_result_document() {
        JobDocument document = JobDocument.of(new JobStatus(JobKind.JA_FIT, JobStatus.State.DONE, HALF.finished(), new Result("42"), null));
        assertEquals(List.of("kind", "state", "fraction", "stage", "counts", "result"), JsonKeys.of(document));
        assertEquals("ja-fit", document.kind());
        assertEquals(1.0, document.fraction());
        assertNull(document.stage());
        assertEquals("42", Json.tree(document).get("result").get("answer").asText());
    }

    @Test
    void a_failed_job_has_its_message_and_code_and_no_result() {
        JobDocument document = JobDocument.of(new JobStatus(JobKind.IMPORT, JobStatus.State.FAILED, HALF, null,
                new JobStatus.Failure("BAD_INPUT", "a.csv: line 3: expected a number")));
        assertEquals(List.of("kind", "state", "fraction", "stage", "counts", "error", "errorCode"), JsonKeys.of(document));
        assertEquals("BAD_INPUT", document.errorCode());
    }

    @Test
    void a_started_job_names_its_status_route_and_its_page() {
        JobDocument.Started started = JobDocument.Started.of("abc");
        assertEquals(List.of("id", "status", "page"), JsonKeys.of(started));
        assertEquals("/api/jobs/abc", started.status());
        assertEquals("/jobs/abc", started.page());
    }

    @Test
    void a_status_keeps_a_failure_to_failed_jobs_and_progress_within_zero_and_one() {
        assertThrows(IllegalArgumentException.class, () -> new JobStatus(JobKind.IMPORT, JobStatus.State.DONE, HALF, null,
                new JobStatus.Failure("INTERNAL", "x")));
        assertThrows(IllegalArgumentException.class, () -> new JobStatus(JobKind.IMPORT, JobStatus.State.FAILED, HALF, null, null));
        assertThrows(IllegalArgumentException.class, () -> new JobProgress(1.5, null, List.of()));
        assertThrows(IllegalArgumentException.class, () -> new JobProgress.Count("files", 3, 2));
        assertTrue(new JobStatus.Failure(JobStatus.INTERNAL, "x").internal());
    }
}
