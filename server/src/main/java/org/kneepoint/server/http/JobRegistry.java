package org.kneepoint.server.http;

import java.security.SecureRandom;
import java.time.Duration;
import java.util.HexFormat;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ArrayBlockingQueue;
import java.util.concurrent.RejectedExecutionException;
import java.util.concurrent.ThreadPoolExecutor;
import java.util.concurrent.TimeUnit;
import java.util.function.Function;
import java.util.function.LongSupplier;
import org.kneepoint.fitter.error.KneepointException;
import org.kneepoint.fitter.model.ja.FitProgress;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * The long jobs of one running web application: a few worker threads, a bounded queue (a job
 * beyond it is refused), random unguessable ids, and the last jobs kept for a while so that their
 * pages can be revisited. Closing stops the workers.
 */
public final class JobRegistry implements AutoCloseable {

    private static final Logger LOG = LoggerFactory.getLogger(JobRegistry.class);

    private final ThreadPoolExecutor executor;
    private final int kept;
    private final long keptNanos;
    private final LongSupplier clock;
    private final SecureRandom random = new SecureRandom();
    private final Map<String, Job> jobs = new LinkedHashMap<>();

    /**
     * {@code workers} threads, at most {@code queued} jobs waiting, the last {@code kept} jobs
     * remembered, each finished job for {@code keptFor} on {@code clock} (nanoseconds).
     */
    public JobRegistry(int workers, int queued, int kept, Duration keptFor, LongSupplier clock) {
        this.executor = new ThreadPoolExecutor(workers, workers, 0, TimeUnit.SECONDS, new ArrayBlockingQueue<>(queued), runnable -> {
            Thread thread = new Thread(runnable, "kneepoint-job");
            thread.setDaemon(true);
            return thread;
        });
        this.kept = kept;
        this.keptNanos = keptFor.toNanos();
        this.clock = clock;
    }

    /** The registry of the web application: one worker, four jobs waiting, the last hundred kept for a day. */
    public static JobRegistry standard() {
        return new JobRegistry(1, 4, 100, Duration.ofDays(1), System::nanoTime);
    }

    /** Queues the work and answers its id, or empty when the queue is full. */
    public Optional<String> submit(Function<FitProgress, Map<String, Object>> work) {
        byte[] bytes = new byte[16];
        random.nextBytes(bytes);
        String id = HexFormat.of().formatHex(bytes);
        Job job = new Job();
        synchronized (jobs) {
            forget(kept - 1);
            jobs.put(id, job);
        }
        try {
            executor.execute(() -> run(job, work, clock));
            return Optional.of(id);
        } catch (RejectedExecutionException e) {
            synchronized (jobs) {
                jobs.remove(id);
            }
            return Optional.empty();
        }
    }

    /** The job's status, or empty when the id is unknown or forgotten. */
    public Optional<JobStatus> status(String id) {
        synchronized (jobs) {
            forget(kept);
            return Optional.ofNullable(jobs.get(id)).map(Job::status);
        }
    }

    private static void run(Job job, Function<FitProgress, Map<String, Object>> work, LongSupplier clock) {
        job.update(new JobStatus(JobStatus.State.RUNNING, 0, null, null, null));
        try {
            Map<String, Object> result = work.apply((fraction, stage) ->
                    job.update(new JobStatus(JobStatus.State.RUNNING, fraction, stage.name().toLowerCase(), null, null)));
            job.finish(new JobStatus(JobStatus.State.DONE, 1, null, result, null), clock.getAsLong());
        } catch (KneepointException e) {
            job.finish(new JobStatus(JobStatus.State.FAILED, job.status().fraction(), null, null, e.getMessage()), clock.getAsLong());
        } catch (RuntimeException e) {
            LOG.error("job failed", e);
            job.finish(new JobStatus(JobStatus.State.FAILED, job.status().fraction(), null, null,
                    "internal error; the server log has the details"), clock.getAsLong());
        }
    }

    /** Forgets finished jobs kept longer than their time, then the oldest finished ones while more than {@code limit} remain. */
    private void forget(int limit) {
        long now = clock.getAsLong();
        jobs.values().removeIf(job -> !job.status().pending() && now - job.finishedAt() > keptNanos);
        Iterator<Job> oldest = jobs.values().iterator();
        while (jobs.size() > limit && oldest.hasNext()) {
            if (!oldest.next().status().pending()) {
                oldest.remove();
            }
        }
    }

    @Override
    public void close() {
        executor.shutdownNow();
    }

    /** One job's latest status, written by its worker and read by requests. */
    private static final class Job {

        private volatile JobStatus status = new JobStatus(JobStatus.State.QUEUED, 0, null, null, null);
        private volatile long finishedAt;

        JobStatus status() {
            return status;
        }

        long finishedAt() {
            return finishedAt;
        }

        void update(JobStatus next) {
            status = next;
        }

        void finish(JobStatus last, long now) {
            finishedAt = now;
            status = last;
        }
    }
}
