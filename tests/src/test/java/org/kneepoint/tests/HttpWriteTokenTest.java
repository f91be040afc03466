package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.kneepoint.server.app.serving.ServerSettings;

class HttpWriteTokenTest {

    private static final String TOKEN = "correct-horse-battery-staple";
    private static final String CURVE = "# grade: Invented T40\n# family: sintered NdFeB\n# temperature: 20 C\n"
            + "H [kA/m],J [T]\n0,1.2\n-900,1.1\n-1000,0.6\n-1100,0\n";

    @TempDir
    static Path folder;

    private static RunningServer server;

    @BeforeAll
    static void start() {
        server = RunningServer.withDemo(folder, TOKEN);
    }

    @AfterAll
    static void stop() {
        server.close();
    }

    private static String code(HttpResponse<String> response) throws Exception {
        return RunningServer.json(response).get("error").get("code").asText();
    }

    @Test
    void reads_need_no_token() throws Exception {
        assertEquals(200, server.get("/api/grades").statusCode());
        assertEquals(200, server.get("/").statusCode());
    }

    @Test
    void a_write_without_the_token_is_refused_and_writes_nothing() throws Exception {
        Map<String, Integer> before = server.rowCounts();
        HttpResponse<String> response = server.upload("/api/import", Map.of("t40.csv", CURVE), Map.of());
        assertEquals(401, response.statusCode());
        assertEquals("TOKEN_REQUIRED", code(response));
        assertEquals(before, server.rowCounts());
    }

    @Test
    void a_write_with_a_wrong_token_is_refused() throws Exception {
        HttpResponse<String> response = server.upload("/api/import", Map.of("t40.csv", CURVE), Map.of(), "Authorization", "Bearer wrong");
        assertEquals(403, response.statusCode());
        assertEquals("TOKEN_REFUSED", code(response));
        assertFalse(response.body().contains(TOKEN));
    }

    @Test
    void a_write_with_the_token_is_accepted() throws Exception {
        HttpResponse<String> response = server.upload("/api/import?dryRun=true", Map.of("t40.csv", CURVE), Map.of(),
                "Authorization", "Bearer " + TOKEN);
        assertEquals(200, response.statusCode(), response.body());
        assertEquals("valid", RunningServer.json(response).get("files").get(0).get("status").asText());
    }

    @Test
    void starting_a_job_needs_the_token() throws Exception {
        String start = "/api/jobs/ja-fit?grade=No%20such%20grade";
        HttpResponse<String> without = server.post(start, HttpRequest.BodyPublishers.noBody(), "application/x-www-form-urlencoded");
        assertEquals(401, without.statusCode());
        assertEquals("TOKEN_REQUIRED", code(without));
        HttpResponse<String> with = server.post(start, HttpRequest.BodyPublishers.noBody(), "application/x-www-form-urlencoded",
                "Authorization", "Bearer " + TOKEN);
        assertEquals(404, with.statusCode(), with.body());
    }

    @Test
    void the_import_page_accepts_the_token_from_its_form_field() throws Exception {
        HttpResponse<String> response = server.upload("/import", Map.of("t40.csv", CURVE), Map.of("token", TOKEN));
        assertEquals(200, response.statusCode(), response.body());
        assertTrue(response.body().contains("Import these files"));
    }

    @Test
    void a_write_from_another_site_is_refused_even_with_the_token() throws Exception {
        HttpResponse<String> response = server.upload("/api/import?dryRun=true", Map.of("t40.csv", CURVE), Map.of(),
                "Authorization", "Bearer " + TOKEN, "Origin", "http://elsewhere.example");
        assertEquals(403, response.statusCode());
        assertEquals("FOREIGN_ORIGIN", code(response));
    }

    @Test
    void binding_beyond_loopback_requires_a_token() {
        assertThrows(IllegalArgumentException.class, () -> new ServerSettings("0.0.0.0", 0, null));
        assertTrue(new ServerSettings("0.0.0.0", 0, TOKEN).tokenRequired());
        assertFalse(new ServerSettings("127.0.0.1", 0, null).tokenRequired());
        assertFalse(new ServerSettings("0.0.0.0", 0, TOKEN).toString().contains(TOKEN));
    }

    @Test
    void serve_refuses_to_start_beyond_loopback_without_a_token() {
        CliRun run = CliRun.of("serve", "--bind", "0.0.0.0", "--port", "0", "--db", folder.resolve("never").toString());
        assertEquals(2, run.exitCode());
        assertTrue(run.err().contains("token"), run.err());
        assertEquals("", run.out());
    }

    @Test
    void serve_on_a_port_in_use_is_bad_input_with_a_clear_message() {
        CliRun run = CliRun.of("serve", "--port", String.valueOf(server.application.port()), "--db", folder.resolve("second").toString());
        assertEquals(2, run.exitCode());
        assertTrue(run.err().contains("cannot listen on 127.0.0.1 port " + server.application.port()), run.err());
    }
}
