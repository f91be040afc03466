package org.kneepoint.server.app.jobs;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicLong;
import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.error.BadInputException;

/** The job registry: jobs run in turn on the worker, end done or failed, and are awaited without polling. */
class JobRegistryTest {

    private static final Duration WAIT = Duration.ofSeconds(60);

    @Test
    void a_job_ends_done_with_its_result_and_its_last_counts_at_fraction_one() throws InterruptedException {
        try (JobRegistry jobs = JobRegistry.standard()) {
            String id = jobs.submit(JobKind.IMPORT, progress -> {
                progress.accept(new JobProgress(0.5, "half", List.of(new JobProgress.Count("files", 1, 2))));
                return "finished";
            }).orElseThrow();
            JobStatus status = jobs.awaitEnd(id, WAIT).orElseThrow();
            assertEquals(JobStatus.State.DONE, status.state());
            assertEquals("finished", status.result());
            assertEquals(1.0, status.progress().fraction());
            assertEquals(1, status.progress().counts().get(0).done());
        }
    }

    @Test
    void bad_input_fails_the_job_with_its_code_and_message_and_a_bug_with_internal() throws InterruptedException {
        try (JobRegistry jobs = JobRegistry.standard()) {
            String bad = jobs.submit(JobKind.IMPORT, progress -> {
                throw new BadInputException("a.csv: line 3: expected a number");
            }).orElseThrow();
            String bug = jobs.submit(JobKind.IMPORT, progress -> {
                throw new IllegalStateException("a bug");
            }).orElseThrow();
            JobStatus badStatus = jobs.awaitEnd(bad, WAIT).orElseThrow();
            assertEquals(JobStatus.State.FAILED, badStatus.state());
            assertEquals("BAD_INPUT", badStatus.failure().code());
            assertEquals("a.csv: line 3: expected a number", badStatus.failure().message());
            JobStatus bugStatus = jobs.awaitEnd(bug, WAIT).orElseThrow();
            assertTrue(bugStatus.failure().internal());
            assertFalse(bugStatus.failure().message().contains("a bug"), "the details go to the log, not to the client");
        }
    }

    @Test
    void a_job_waits_in_the_queue_while_the_worker_is_busy_and_awaiting_it_with_a_short_timeout_answers_it_pending()
            throws InterruptedException {
        CountDownLatch release = new CountDownLatch(1);
        try (JobRegistry jobs = JobRegistry.standard()) {
            String first = jobs.submit(JobKind.IMPORT, progress -> {
                awaitQuietly(release);
                return "first";
            }).orElseThrow();
            String second = jobs.submit(JobKind.IMPORT, progress -> "second").orElseThrow();
            assertEquals(JobStatus.State.QUEUED, jobs.status(second).orElseThrow().state());
            assertTrue(jobs.awaitEnd(first, Duration.ofMillis(1)).orElseThrow().pending());
            release.countDown();
            assertEquals("second", jobs.awaitEnd(second, WAIT).orElseThrow().result());
            assertEquals("first", jobs.status(first).orElseThrow().result());
        } finally {
            release.countDown();
        }
    }

    @Test
    void a_full_queue_refuses_the_job_and_discards_its_work() {
        CountDownLatch release = new CountDownLatch(1);
        List<String> discarded = new ArrayList<>();
        try (JobRegistry jobs = new JobRegistry(1, 1, 10, Duration.ofDays(1), System::nanoTime)) {
            jobs.submit(JobKind.IMPORT, progress -> {
                awaitQuietly(release);
                return "busy";
            }).orElseThrow();
            jobs.submit(JobKind.IMPORT, progress -> "waiting").orElseThrow();
            Optional<String> refused = jobs.submit(JobKind.IMPORT, new JobWork() {
                @Override
                public Object run(java.util.function.Consumer<JobProgress> progress) {
                    return "never";
                }

                @Override
                public void discard() {
                    discarded.add("refused");
                }
            });
            assertTrue(refused.isEmpty());
            assertEquals(List.of("refused"), discarded);
        } finally {
            release.countDown();
        }
    }

    @Test
    void an_unknown_id_has_no_status_and_nothing_to_await() throws InterruptedException {
        try (JobRegistry jobs = JobRegistry.standard()) {
            assertTrue(jobs.status("0123").isEmpty());
            assertTrue(jobs.awaitEnd("0123", WAIT).isEmpty());
        }
    }

    @Test
    void a_finished_job_is_forgotten_after_its_time() throws InterruptedException {
        AtomicLong now = new AtomicLong();
        try (JobRegistry jobs = new JobRegistry(1, 4, 10, Duration.ofNanos(100), now::get)) {
            String id = jobs.submit(JobKind.IMPORT, progress -> "done").orElseThrow();
            jobs.awaitEnd(id, WAIT).orElseThrow();
            assertTrue(jobs.status(id).isPresent());
            now.addAndGet(101);
            assertTrue(jobs.status(id).isEmpty());
        }
    }

    private static void awaitQuietly(CountDownLatch latch) {
        try {
            latch.await(60, TimeUnit.SECONDS);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }
}
