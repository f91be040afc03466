package org.kneepoint.server.app.jobs;

import java.util.List;
import java.util.Objects;

/**
 * How far a background job has got, in terms that fit any job: the fraction done, the current
 * stage in words, and counts of what is done (files, curves, ...).
 *
 * @param fraction fraction of the work done, 0 to 1
 * @param stage    what the job is doing now, in words, or null when it has not said
 * @param counts   what has been done so far, in the order to show it
 */
public record JobProgress(double fraction, String stage, List<Count> counts) {

    /** The progress of a job that has not started. */
    public static final JobProgress NONE = new JobProgress(0, null, List.of());

    public JobProgress {
        if (!(fraction >= 0 && fraction <= 1)) {
            throw new IllegalArgumentException("fraction must be between 0 and 1, not " + fraction);
        }
        counts = List.copyOf(counts);
    }

    /** The same counts, finished: fraction 1 and no stage. */
    public JobProgress finished() {
        return new JobProgress(1, null, counts);
    }

    /**
     * One count: {@code done} things of the kind {@code name}, of {@code total}.
     *
     * @param total how many there are, or null while that is not known yet
     */
    public record Count(String name, int done, Integer total) {

        public Count {
            Objects.requireNonNull(name, "name");
            if (done < 0 || total != null && done > total) {
                throw new IllegalArgumentException(name + ": " + done + " done of " + total);
            }
        }
    }
}
