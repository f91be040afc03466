package org.kneepoint.server.app.jobs;

import java.util.Objects;

/**
 * What is known of one background job at one moment.
 *
 * @param kind     what the job does
 * @param state    queued, running, done or failed
 * @param progress how far it has got (when done: fraction 1 with the last counts; when failed: where it stopped)
 * @param result   the result record when done (a fit document, an import report), else null
 * @param failure  why it failed, when failed, else null
 */
public record JobStatus(JobKind kind, State state, JobProgress progress, Object result, Failure failure) {

    /** The states of a job, in order. */
    public enum State { QUEUED, RUNNING, DONE, FAILED }

    /**
     * Why a job failed: the error's code as {@code ErrorMapper} names it ({@code BAD_INPUT}, {@code CONFLICT}, ...,
     * {@code INTERNAL} for a bug or a broken database) and its one-line message.
     */
    public record Failure(String code, String message) {

        /** True for a bug or a broken database, whose effects the job cannot vouch for. */
        public boolean internal() {
            return code.equals(INTERNAL);
        }
    }

    /** The code of a failure that is not one of the program's known errors. */
    public static final String INTERNAL = "INTERNAL";

    public JobStatus {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(state, "state");
        Objects.requireNonNull(progress, "progress");
        if ((state == State.FAILED) != (failure != null)) {
            throw new IllegalArgumentException("a failure belongs to a failed job, and only to one");
        }
    }

    /** True while the job has still to end. */
    public boolean pending() {
        return state == State.QUEUED || state == State.RUNNING;
    }
}
