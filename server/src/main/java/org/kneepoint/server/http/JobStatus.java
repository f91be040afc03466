package org.kneepoint.server.http;

import java.util.Map;

/**
 * What is known of one background job at one moment.
 *
 * @param state    queued, running, done or failed
 * @param fraction fraction of the work done, 0 to 1
 * @param stage    the current stage's name, or null before the work reports one
 * @param result   the result document when done, else null
 * @param error    the one-line error message when failed, else null
 */
public record JobStatus(State state, double fraction, String stage, Map<String, Object> result, String error) {

    /** The states of a job, in order. */
    public enum State { QUEUED, RUNNING, DONE, FAILED }

    /** True while the job has still to end. */
    public boolean pending() {
        return state == State.QUEUED || state == State.RUNNING;
    }
}
