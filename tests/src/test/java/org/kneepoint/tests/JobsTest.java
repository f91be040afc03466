package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.Consumer;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.kneepoint.server.app.jobs.JobKind;
import org.kneepoint.server.app.jobs.JobProgress;
import org.kneepoint.server.app.jobs.JobRegistry;
import org.kneepoint.server.app.jobs.JobWork;

/** Background jobs: a Jiles–Atherton fit started over HTTP, its status, its page, and the bounds of the queue. */
class JobsTest {

    private static final String GRADE = "Invented soft iron";
    private static final String QUERY = "?grade=Invented%20soft%20iron&temperature=20C";

    @TempDir
    Path folder;

    @Test
    void a_fit_job_ends_with_the_answer_of_fit_ja_and_its_page_shows_the_table() throws Exception {
        String db = folder.resolve("library").toString();
        assertEquals(0, CliRun.of("import", Path.of("..", "examples", "invented-soft-iron-loop.csv").toString(), "--db", db).exitCode());
        CliRun cli = CliRun.of("fit", "ja", GRADE, "--temperature", "20C", "--json", "--db", db);
        assertEquals(0, cli.exitCode(), cli.err());
        JsonNode expected = new ObjectMapper().readTree(cli.out());
        try (RunningServer server = RunningServer.withJobs(folder, JobRegistry.standard())) {
            HttpResponse<String> started = post(server, "/api/jobs/ja-fit" + QUERY);
            assertEquals(202, started.statusCode(), started.body());
            String id = RunningServer.json(started).get("id").asText();
            assertEquals("/api/jobs/" + id, RunningServer.json(started).get("status").asText());
            assertEquals("/jobs/" + id, RunningServer.json(started).get("page").asText());
            JsonNode operation = RunningServer.json(server.get("/api/openapi.json")).get("paths").get("/api/jobs/ja-fit").get("post");
            assertTrue(operation.get("responses").has("202") && !operation.has("requestBody"), operation.toString());
            JsonNode status = server.jobWhenEnded(id);
            assertEquals("done", status.get("state").asText(), status.toString());
            assertEquals(expected, status.get("result"));
            assertEquals("ja-fit", status.get("kind").asText());
            assertEquals(0, status.get("counts").size());
            HttpResponse<String> page = server.get("/jobs/" + id);
            assertEquals(200, page.statusCode());
            assertFalse(page.body().contains("http-equiv=\"refresh\""));
            for (String label : new String[] {"Ms", "α", "Standard error", "rms error in B", "href=\"/grades/Invented%20soft%20iron\"",
                    String.format(Locale.ROOT, "%.4g", expected.get("ms").asDouble() / 1000)}) {
                assertTrue(page.body().contains(label), label);
            }
            String grade = server.get("/grades/Invented%20soft%20iron").body();
            assertTrue(grade.contains("action=\"/jobs/ja-fit?grade=Invented%20soft%20iron&amp;temperature=293.15K\""), grade);
            HttpResponse<String> fromForm = post(server, "/jobs/ja-fit" + QUERY);
            assertEquals(303, fromForm.statusCode());
            assertTrue(fromForm.headers().firstValue("Location").orElseThrow().startsWith("/jobs/"));
        }
    }

    @Test
    void unknown_jobs_are_not_found_and_bad_requests_start_nothing() throws Exception {
        try (RunningServer server = RunningServer.withDemo(folder, null)) {
            assertEquals(404, server.get("/api/jobs/0123456789abcdef0123456789abcdef").statusCode());
            assertEquals(404, server.get("/jobs/0123456789abcdef0123456789abcdef").statusCode());
            HttpResponse<String> unknown = post(server, "/api/jobs/ja-fit?grade=No%20such%20grade");
            assertEquals(404, unknown.statusCode(), unknown.body());
            HttpResponse<String> noLoop = post(server, "/api/jobs/ja-fit?grade=DEMO%20NdFeB%2042%2F100");
            assertEquals(400, noLoop.statusCode(), noLoop.body());
            assertTrue(RunningServer.json(noLoop).get("error").get("message").asText().contains("has no stored loop curve"));
            assertEquals(400, post(server, "/api/jobs/ja-fit").statusCode());
        }
    }

    @Test
    void a_full_queue_refuses_and_a_waiting_job_page_reloads_itself() throws Exception {
        CountDownLatch release = new CountDownLatch(1);
        CountDownLatch reported = new CountDownLatch(1);
        JobRegistry jobs = new JobRegistry(1, 1, 10, Duration.ofHours(1), System::nanoTime);
        try (RunningServer server = RunningServer.withJobs(folder, jobs)) {
            Optional<String> running = jobs.submit(JobKind.JA_FIT, progress -> {
                progress.accept(new JobProgress(0.5, "global search", List.of()));
                reported.countDown();
                awaitQuietly(release);
                return Map.of("finished", true);
            });
            Optional<String> queued = jobs.submit(JobKind.JA_FIT, progress -> Map.of());
            assertTrue(running.isPresent() && queued.isPresent());
            assertTrue(jobs.submit(JobKind.JA_FIT, progress -> Map.of()).isEmpty());
            HttpResponse<String> refused = post(server, "/api/jobs/ja-fit?grade=DEMO%20NdFeB%2042%2F100&temperature=20C&magnetizingField=3MA/m");
            assertEquals(429, refused.statusCode(), refused.body());
            String waiting = server.get("/jobs/" + queued.get()).body();
            assertTrue(waiting.contains("<meta http-equiv=\"refresh\" content=\"1\">"), waiting);
            assertTrue(reported.await(60, TimeUnit.SECONDS), "the job reported its progress");
            String runningPage = server.get("/jobs/" + running.get()).body();
            assertTrue(runningPage.contains("<meta http-equiv=\"refresh\" content=\"1\">"), runningPage);
            assertTrue(runningPage.contains("Running: 50 %, global search"), runningPage);
            release.countDown();
            assertEquals("done", server.jobWhenEnded(running.get()).get("state").asText());
            assertTrue(server.jobWhenEnded(running.get()).get("result").get("finished").asBoolean());
        } finally {
            release.countDown();
        }
    }

    @Test
    void finished_jobs_are_forgotten_after_their_time_and_beyond_the_count() throws Exception {
        AtomicLong clock = new AtomicLong();
        try (JobRegistry jobs = new JobRegistry(1, 2, 2, Duration.ofMinutes(10), clock::get)) {
            String first = jobs.submit(JobKind.JA_FIT, progress -> Map.of()).orElseThrow();
            String second = jobs.submit(JobKind.JA_FIT, progress -> Map.of()).orElseThrow();
            waitUntilDone(jobs, first);
            waitUntilDone(jobs, second);
            clock.set(Duration.ofMinutes(5).toNanos());
            String third = jobs.submit(JobKind.JA_FIT, progress -> Map.of()).orElseThrow();
            assertTrue(jobs.status(first).isEmpty(), "the oldest finished job makes room for a new one");
            assertTrue(jobs.status(second).isPresent());
            waitUntilDone(jobs, third);
            clock.set(Duration.ofMinutes(12).toNanos());
            assertTrue(jobs.status(second).isEmpty() && jobs.status(third).isPresent(), "kept ten minutes after it finished");
        }
    }

    @Test
    void work_refused_or_still_waiting_when_the_registry_closes_is_discarded() {
        CountDownLatch release = new CountDownLatch(1);
        List<String> discarded = Collections.synchronizedList(new ArrayList<>());
        JobRegistry jobs = new JobRegistry(1, 1, 10, Duration.ofHours(1), System::nanoTime);
        try {
            assertTrue(jobs.submit(JobKind.JA_FIT, progress -> {
                awaitQuietly(release);
                return Map.of();
            }).isPresent());
            assertTrue(jobs.submit(JobKind.IMPORT, discardable("waiting", discarded)).isPresent());
            assertTrue(jobs.submit(JobKind.IMPORT, discardable("refused", discarded)).isEmpty());
            assertEquals(List.of("refused"), discarded);
            jobs.close();
            assertEquals(List.of("refused", "waiting"), discarded);
        } finally {
            release.countDown();
            jobs.close();
        }
    }

    private static JobWork discardable(String name, List<String> discarded) {
        return new JobWork() {
            @Override
            public Map<String, Object> run(Consumer<JobProgress> progress) {
                return Map.of();
            }

            @Override
            public void discard() {
                discarded.add(name);
            }
        };
    }

    private static void waitUntilDone(JobRegistry jobs, String id) throws InterruptedException {
        jobs.awaitEnd(id, Duration.ofSeconds(60)).orElseThrow();
    }

    private static HttpResponse<String> post(RunningServer server, String pathAndQuery) throws IOException, InterruptedException {
        return pathAndQuery.startsWith("/api/")
                ? server.post(pathAndQuery, HttpRequest.BodyPublishers.noBody(), "application/x-www-form-urlencoded")
                : server.submit(pathAndQuery, "");
    }

    private static void awaitQuietly(CountDownLatch latch) {
        try {
            latch.await(60, TimeUnit.SECONDS);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }
}
