package org.kneepoint.server.app.jobs;

import java.util.function.Consumer;

/**
 * The work of one background job: it runs on the registry's worker, reports its progress and
 * answers its result document. Work that is never run (the server stopped first) is discarded,
 * so that it can give back what it holds, such as uploaded files.
 */
@FunctionalInterface
public interface JobWork {

    /** Does the work, reporting progress, and answers its result record. */
    Object run(Consumer<JobProgress> progress);

    /** Gives back what the work holds when it will never run; by default there is nothing to give back. */
    default void discard() {
    }
}
