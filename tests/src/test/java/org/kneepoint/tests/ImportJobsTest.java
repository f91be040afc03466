package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.net.URLEncoder;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.kneepoint.server.http.ImportJob;
import org.kneepoint.server.app.jobs.JobKind;
import org.kneepoint.server.app.jobs.JobRegistry;
import org.kneepoint.server.app.imports.ImportStep;

/** Imports as background jobs: the route, its progress, failures inside the job, and the Import page's background commit. */
class ImportJobsTest {

    private static final String SCRIPT = "<script>alert(1)</script>";
    private static final String ESCAPED = "&lt;script&gt;alert(1)&lt;/script&gt;";
    private static final String HOSTILE_FILE = "<b onmouseover=alert(1)>x.csv";
    private static final String ESCAPED_FILE = "&lt;b onmouseover=alert(1)&gt;x.csv";

    @TempDir
    Path folder;

    private static String example(String name) throws IOException {
        return Files.readString(Path.of("..", "examples", name), StandardCharsets.UTF_8);
    }

    /** Three example files: a grade at three temperatures, a grade at one, a susceptibility table. */
    static Map<String, String> threeExamples() throws IOException {
        Map<String, String> files = new LinkedHashMap<>();
        files.put("three-temperatures.csv", example("invented-ndfeb-three-temperatures.csv"));
        files.put("n40sh-20C.csv", example("invented-sintered-ndfeb-20C.csv"));
        files.put("salt.csv", example("invented-paramagnetic-salt.csv"));
        return files;
    }

    private static String curve(String grade, String family, String secondRow) {
        return "# grade: " + grade + "\n# family: " + family + "\n# temperature: 20 C\n"
                + "H [kA/m],J [T]\n0,1.2\n" + secondRow + "\n-900,1.1\n-1000,0.5\n-1100,0\n";
    }

    @Test
    void a_multi_file_import_job_waits_then_ends_done_with_every_count_at_its_total_and_its_grades_listed() throws Exception {
        CountDownLatch release = new CountDownLatch(1);
        JobRegistry jobs = new JobRegistry(1, 4, 10, Duration.ofHours(1), System::nanoTime);
        try (RunningServer server = RunningServer.withJobs(folder, jobs)) {
            jobs.submit(JobKind.JA_FIT, progress -> {
                awaitQuietly(release);
                return Map.of();
            }).orElseThrow();
            HttpResponse<String> started = server.upload("/api/jobs/import", threeExamples(), Map.of());
            assertEquals(202, started.statusCode(), started.body());
            JsonNode answer = RunningServer.json(started);
            String id = answer.get("id").asText();
            assertEquals("/api/jobs/" + id, answer.get("status").asText());
            assertEquals("/jobs/" + id, answer.get("page").asText());
            assertEquals("/api/jobs/" + id, started.headers().firstValue("Location").orElseThrow());
            JsonNode waiting = RunningServer.json(server.get("/api/jobs/" + id));
            assertEquals("queued", waiting.get("state").asText());
            assertEquals(0, waiting.get("counts").size());
            release.countDown();
            JsonNode status = server.jobWhenEnded(id);
            assertEquals("done", status.get("state").asText(), status.toString());
            assertEquals("import", status.get("kind").asText());
            assertEquals(1.0, status.get("fraction").asDouble());
            assertEquals("files checked", status.get("counts").get(0).get("name").asText());
            assertEquals(List.of(3, 3), List.of(status.get("counts").get(0).get("done").asInt(), status.get("counts").get(0).get("total").asInt()));
            assertEquals("curves characterized", status.get("counts").get(1).get("name").asText());
            assertEquals(List.of(4, 4), List.of(status.get("counts").get(1).get("done").asInt(), status.get("counts").get(1).get("total").asInt()));
            JsonNode files = status.get("result").get("files");
            assertEquals(3, files.size());
            files.forEach(file -> assertEquals("imported", file.get("status").asText(), file.toString()));
            Set<String> grades = new TreeSet<>();
            RunningServer.json(server.get("/api/grades")).forEach(grade -> grades.add(grade.get("name").asText()));
            assertTrue(grades.containsAll(List.of("Invented N42H", "Invented N40SH")), grades.toString());
            assertEquals(200, server.get("/api/materials/Invented%20paramagnetic%20salt").statusCode());
            String page = server.get("/jobs/" + id).body();
            assertFalse(page.contains("http-equiv=\"refresh\""));
            for (String text : new String[] {"<h1>Import</h1>", "files checked: 3 of 3", "curves characterized: 4 of 4",
                    "href=\"/grades/Invented%20N42H\"", "href=\"/grades/Invented%20N40SH\"", "salt.csv"}) {
                assertTrue(page.contains(text), text + " in " + page);
            }
        } finally {
            release.countDown();
        }
    }

    @Test
    void a_bad_file_is_refused_by_the_check_with_its_line_and_a_job_with_it_fails_and_writes_nothing() throws Exception {
        Map<String, String> files = new LinkedHashMap<>();
        files.put("good.csv", curve("Invented Good", "sintered NdFeB", "-500,1.19"));
        files.put("broken.csv", curve("Invented Broken", "sintered NdFeB", "-500,abc"));
        try (RunningServer server = RunningServer.withDemo(folder, null)) {
            Map<String, Integer> before = server.rowCounts();
            HttpResponse<String> check = server.upload("/import", files, Map.of());
            assertEquals(400, check.statusCode());
            assertTrue(check.body().contains("broken.csv, line 6, column 2"), check.body());
            HttpResponse<String> started = server.upload("/api/jobs/import", files, Map.of());
            assertEquals(202, started.statusCode(), started.body());
            String id = RunningServer.json(started).get("id").asText();
            JsonNode status = server.jobWhenEnded(id);
            assertEquals("failed", status.get("state").asText(), status.toString());
            String message = status.get("error").asText();
            assertTrue(message.startsWith("broken.csv, line 6, column 2") && !message.contains("\n"), message);
            assertEquals("BAD_INPUT", status.get("errorCode").asText());
            assertFalse(status.has("result"));
            assertEquals(before, server.rowCounts());
            String page = server.get("/jobs/" + id).body();
            assertTrue(page.contains("Nothing was imported.") && page.contains("broken.csv, line 6, column 2"), page);
            assertFalse(page.contains("http-equiv=\"refresh\""));
        }
    }

    @Test
    void an_import_job_whose_grade_conflicts_with_the_library_fails_and_stores_none_of_its_files() throws Exception {
        Map<String, String> files = new LinkedHashMap<>();
        files.put("new.csv", curve("Invented New", "sintered NdFeB", "-500,1.19"));
        files.put("other-family.csv", curve("DEMO NdFeB 42/100", "hard ferrite", "-500,1.19"));
        try (RunningServer server = RunningServer.withDemo(folder, null)) {
            Map<String, Integer> before = server.rowCounts();
            HttpResponse<String> started = server.upload("/api/jobs/import", files, Map.of());
            assertEquals(202, started.statusCode(), started.body());
            JsonNode status = server.jobWhenEnded(RunningServer.json(started).get("id").asText());
            assertEquals("failed", status.get("state").asText(), status.toString());
            assertTrue(status.get("error").asText().contains("grade 'DEMO NdFeB 42/100' is stored as family"), status.toString());
            assertEquals("CONFLICT", status.get("errorCode").asText());
            assertTrue(server.get("/jobs/" + RunningServer.json(started).get("id").asText()).body().contains("Nothing was imported."));
            assertEquals("storing everything in one transaction", status.get("stage").asText());
            assertEquals(before, server.rowCounts());
            assertEquals(404, server.get("/api/grades/Invented%20New").statusCode());
        }
    }

    @Test
    void an_upload_that_is_wrong_on_its_face_is_refused_before_any_job_and_writes_need_the_token() throws Exception {
        Map<String, String> files = Map.of("good.csv", curve("Invented Good", "sintered NdFeB", "-500,1.19"));
        try (RunningServer server = RunningServer.withDemo(folder, "s3cret-token")) {
            Map<String, Integer> before = server.rowCounts();
            assertEquals(401, server.upload("/api/jobs/import", files, Map.of()).statusCode());
            assertEquals(403, server.upload("/api/jobs/import", files, Map.of(), "Authorization", "Bearer wrong").statusCode());
            HttpResponse<String> empty = server.upload("/api/jobs/import", Map.of(), Map.of("note", "no file"), "Authorization", "Bearer s3cret-token");
            assertEquals(400, empty.statusCode());
            assertTrue(RunningServer.json(empty).get("error").get("message").asText().startsWith("no file in the upload"), empty.body());
            HttpResponse<String> notMultipart = server.post("/api/jobs/import", HttpRequest.BodyPublishers.ofString("x"), "text/plain",
                    "Authorization", "Bearer s3cret-token");
            assertEquals(400, notMultipart.statusCode(), notMultipart.body());
            assertEquals(before, server.rowCounts());
            HttpResponse<String> started = server.upload("/api/jobs/import", files, Map.of(), "Authorization", "Bearer s3cret-token");
            assertEquals(202, started.statusCode(), started.body());
            assertEquals("done", server.jobWhenEnded(RunningServer.json(started).get("id").asText()).get("state").asText());
        }
    }

    @Test
    void the_import_page_commits_in_the_background_and_the_job_page_links_the_grades_as_escaped_text() throws Exception {
        try (RunningServer server = RunningServer.withDemo(folder, null)) {
            HttpResponse<String> preview = server.upload("/import", Map.of(HOSTILE_FILE, curve(SCRIPT, "hostile", "-500,1.19")), Map.of());
            assertEquals(200, preview.statusCode(), preview.body());
            assertTrue(preview.body().contains("formaction=\"/jobs/import\""), preview.body());
            Matcher staged = Pattern.compile("name=\"staged\" value=\"([^\"]+)\"").matcher(preview.body());
            assertTrue(staged.find());
            HttpResponse<String> redirect = server.submit("/jobs/import", "staged="
                    + URLEncoder.encode(staged.group(1), StandardCharsets.UTF_8));
            assertEquals(303, redirect.statusCode(), redirect.body());
            String location = redirect.headers().firstValue("Location").orElseThrow();
            assertTrue(location.matches("/jobs/[0-9a-f]{32}"), location);
            assertEquals("done", server.jobWhenEnded(location.substring("/jobs/".length())).get("state").asText());
            String page = server.get(location).body();
            assertTrue(page.contains("<td>" + ESCAPED_FILE + "</td>"), page);
            assertTrue(page.contains("href=\"/grades/%3Cscript%3Ealert%281%29%3C%2Fscript%3E\">" + ESCAPED + "</a>"), page);
            assertFalse(page.contains(SCRIPT) || page.contains(HOSTILE_FILE));
            HttpResponse<String> again = server.submit("/jobs/import", "staged=" + staged.group(1));
            assertEquals(400, again.statusCode());
            assertTrue(again.body().contains("no longer waiting"));
        }
    }

    @Test
    void a_running_import_job_page_shows_the_file_and_the_counts_as_escaped_text() throws Exception {
        CountDownLatch release = new CountDownLatch(1);
        CountDownLatch reported = new CountDownLatch(1);
        JobRegistry jobs = new JobRegistry(1, 1, 10, Duration.ofHours(1), System::nanoTime);
        try (RunningServer server = RunningServer.withJobs(folder, jobs)) {
            String id = jobs.submit(JobKind.IMPORT, progress -> {
                progress.accept(ImportJob.progressOf(new ImportStep(ImportStep.Stage.CHARACTERIZING, HOSTILE_FILE, 1, 3, 2, 5)));
                reported.countDown();
                awaitQuietly(release);
                return Map.of("files", List.of());
            }).orElseThrow();
            assertTrue(reported.await(60, TimeUnit.SECONDS), "the job reported its progress");
            String page = server.get("/jobs/" + id).body();
            assertTrue(page.contains("<meta http-equiv=\"refresh\" content=\"1\">"), page);
            assertTrue(page.contains("Running: 25 %, characterizing the curves of " + ESCAPED_FILE), page);
            assertTrue(page.contains("<li>files checked: 1 of 3</li><li>curves characterized: 2</li>"), page);
            assertFalse(page.contains(HOSTILE_FILE));
            JsonNode status = RunningServer.json(server.get("/api/jobs/" + id));
            assertEquals("running", status.get("state").asText());
            assertNull(status.get("counts").get(1).get("total").numberValue(), "the number of curves is not known before every file is read");
        } finally {
            release.countDown();
        }
    }

    @Test
    void an_import_job_broken_by_an_internal_error_does_not_claim_that_nothing_was_stored() throws Exception {
        JobRegistry jobs = JobRegistry.standard();
        try (RunningServer server = RunningServer.withJobs(folder, jobs)) {
            String id = jobs.submit(JobKind.IMPORT, progress -> {
                throw new IllegalStateException("the database went away");
            }).orElseThrow();
            JsonNode status = server.jobWhenEnded(id);
            assertEquals("failed", status.get("state").asText());
            assertEquals("INTERNAL", status.get("errorCode").asText());
            assertEquals("internal error; the server log has the details", status.get("error").asText());
            String page = server.get("/jobs/" + id).body();
            assertTrue(page.contains("The import failed; look at the library before importing these files again."), page);
            assertFalse(page.contains("Nothing was imported") || page.contains("went away"), page);
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
