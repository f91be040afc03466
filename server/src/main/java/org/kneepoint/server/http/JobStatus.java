package org.kneepoint.server.http;

import java.util.Map;
import java.util.Objects;

/**
 * What is known of one background job at one moment.
 *
 * @param kind     what the job does
 * @param state    queued, running, done or failed
 * @param progress how far it has got (when done: fraction 1 with the last counts; when failed: where it stopped)
 * @param result   the result document when done, else null
 * @param error    the one-line error message when failed, else null
 */
public record JobStatus(JobKind kind, State state, JobProgress progress, Map<String, Object> result, String error) {

    /** The states of a job, in order. */
    public enum State { QUEUED, RUNNING, DONE, FAILED }

    public JobStatus {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(state, "state");
        Objects.requireNonNull(progress, "progress");
    }

    /** True while the job has still to end. */
    public boolean pending() {
        return state == State.QUEUED || state == State.RUNNING;
    }
}
