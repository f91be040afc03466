package org.kneepoint.server.app.jobs;

import java.security.SecureRandom;
import java.time.Duration;
import java.util.HexFormat;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ArrayBlockingQueue;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.RejectedExecutionException;
import java.util.concurrent.ThreadPoolExecutor;
import java.util.concurrent.TimeUnit;
import java.util.function.LongSupplier;
import org.kneepoint.fitter.error.KneepointException;
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

    /** Queues the work and answers its id, or empty when the queue is full (then the work is discarded). */
    public Optional<String> submit(JobKind kind, JobWork work) {
        byte[] bytes = new byte[16];
        random.nextBytes(bytes);
        String id = HexFormat.of().formatHex(bytes);
        Job job = new Job(kind, work);
        synchronized (jobs) {
            forget(kept - 1);
            jobs.put(id, job);
        }
        try {
            executor.execute(job);
            return Optional.of(id);
        } catch (RejectedExecutionException e) {
            synchronized (jobs) {
                jobs.remove(id);
            }
            work.discard();
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

    /**
     * Waits until the job has ended (done or failed) or {@code timeout} has passed, and answers its status then
     * (still pending after the timeout); empty when the id is unknown or forgotten. For callers that wait on a job in
     * the same process, such as tests, instead of polling its status.
     */
    public Optional<JobStatus> awaitEnd(String id, Duration timeout) throws InterruptedException {
        Job job;
        synchronized (jobs) {
            job = jobs.get(id);
        }
        if (job == null) {
            return Optional.empty();
        }
        job.ended.await(timeout.toNanos(), TimeUnit.NANOSECONDS);
        return Optional.of(job.status());
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

    /** Stops the worker and discards the work of the jobs still waiting. */
    @Override
    public void close() {
        for (Runnable waiting : executor.shutdownNow()) {
            ((Job) waiting).discard();
        }
    }

    /**
     * One job: its work, run on the worker (and let go of once run, so that a kept job does not
     * hold its data), and its latest status, written by the worker and read by requests.
     */
    private final class Job implements Runnable {

        private volatile JobWork work;
        private volatile JobStatus status;
        private volatile long finishedAt;
        private final CountDownLatch ended = new CountDownLatch(1);

        Job(JobKind kind, JobWork work) {
            this.work = work;
            this.status = new JobStatus(kind, JobStatus.State.QUEUED, JobProgress.NONE, null, null);
        }

        JobStatus status() {
            return status;
        }

        long finishedAt() {
            return finishedAt;
        }

        void discard() {
            work.discard();
        }

        @Override
        public void run() {
            JobKind kind = status.kind();
            JobWork running = work;
            work = null;
            status = new JobStatus(kind, JobStatus.State.RUNNING, JobProgress.NONE, null, null);
            try {
                Object result = running.run(progress -> status = new JobStatus(kind, JobStatus.State.RUNNING, progress, null, null));
                finish(new JobStatus(kind, JobStatus.State.DONE, status.progress().finished(), result, null));
            } catch (KneepointException e) {
                finish(new JobStatus(kind, JobStatus.State.FAILED, status.progress(), null, new JobStatus.Failure(e.code().name(), e.getMessage())));
            } catch (RuntimeException e) {
                LOG.error("job failed", e);
                finish(new JobStatus(kind, JobStatus.State.FAILED, status.progress(), null,
                        new JobStatus.Failure(JobStatus.INTERNAL, "internal error; the server log has the details")));
            }
        }

        private void finish(JobStatus last) {
            finishedAt = clock.getAsLong();
            status = last;
            ended.countDown();
        }
    }
}
