package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.net.Socket;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Forged headers and writes from other sites against a real server on loopback: the Host header must name the
 * server (DNS rebinding), page writes need the session's form token, every answer carries the security headers,
 * Jetty's own errors are the documented JSON, a chunked body is held to its limit, and HEAD answers like GET.
 */
class HttpHardeningTest {

    private static final String GRADE = "/grades/DEMO%20AlNiCo%208";
    private static final String CURVE = "# grade: Invented R40\n# family: sintered NdFeB\n# temperature: 20 C\n"
            + "H [kA/m],J [T]\n0,1.2\n-900,1.1\n-1000,0.6\n-1100,0\n";

    @TempDir
    static Path folder;

    private static RunningServer server;

    @BeforeAll
    static void start() {
        server = RunningServer.withDemo(folder, null);
    }

    @AfterAll
    static void stop() {
        server.close();
    }

    /** One request written on a socket as given (any Host, any header), answered in full. */
    private static Raw raw(String method, String target, String... headers) throws IOException {
        return send(method, target, "", headers);
    }

    private static Raw send(String method, String target, String body, String... headers) throws IOException {
        StringBuilder request = new StringBuilder(method + " " + target + " HTTP/1.1\r\n");
        for (int i = 0; i < headers.length; i += 2) {
            request.append(headers[i]).append(": ").append(headers[i + 1]).append("\r\n");
        }
        byte[] content = body.getBytes(StandardCharsets.UTF_8);
        if (!body.isEmpty()) {
            request.append("Content-Length: ").append(content.length).append("\r\n");
        }
        request.append("Connection: close\r\n\r\n");
        try (Socket socket = new Socket("127.0.0.1", server.application.port())) {
            OutputStream out = socket.getOutputStream();
            out.write(request.toString().getBytes(StandardCharsets.UTF_8));
            out.write(content);
            out.flush();
            InputStream in = socket.getInputStream();
            return Raw.of(new String(in.readAllBytes(), StandardCharsets.UTF_8));
        }
    }

    /** A raw answer: status, head (status line and headers, lower case) and body. */
    private record Raw(int status, String head, String body) {

        static Raw of(String text) {
            int end = text.indexOf("\r\n\r\n");
            String head = text.substring(0, end).toLowerCase(java.util.Locale.ROOT);
            return new Raw(Integer.parseInt(text.substring(9, 12)), head, text.substring(end + 4));
        }
    }

    private String host() {
        return "127.0.0.1:" + server.application.port();
    }

    @Test
    void a_host_header_naming_another_site_is_refused_for_reads_and_writes() throws Exception {
        Raw read = raw("GET", "/api/grades", "Host", "evil.example:" + server.application.port());
        assertEquals(421, read.status());
        assertTrue(read.body().contains("\"UNKNOWN_HOST\""), read.body());
        assertTrue(read.body().contains("evil.example"), read.body());
        assertEquals(421, raw("GET", "/", "Host", "127.0.0.1.evil.example").status());
        assertEquals(421, raw("GET", "/", "Host", "localhost.evil.example").status());
    }

    @Test
    void a_dns_rebinding_page_cannot_edit_a_grade_or_import() throws Exception {
        Map<String, Integer> before = server.rowCounts();
        String page = server.get(GRADE).body();
        String evil = "evil.example:" + server.application.port();
        String form = "version=2&supplier=Rebound&formToken=" + server.formToken();
        Raw edit = send("POST", GRADE + "/details", form, "Host", evil, "Origin", "http://" + evil,
                "Content-Type", "application/x-www-form-urlencoded");
        assertEquals(421, edit.status(), edit.body());
        Raw api = raw("POST", "/api/grades/DEMO%20AlNiCo%208/details?version=2&supplier=Rebound", "Host", evil, "Origin",
                "http://" + evil);
        assertEquals(421, api.status(), api.body());
        assertEquals(before, server.rowCounts());
        assertEquals(page, server.get(GRADE).body(), "the grade is unchanged");
    }

    @Test
    void the_loopback_names_are_accepted() throws Exception {
        int port = server.application.port();
        for (String host : List.of("127.0.0.1:" + port, "localhost:" + port, "LOCALHOST", "[::1]:" + port, "127.0.0.2")) {
            assertEquals(200, raw("GET", "/api/grades", "Host", host).status(), host);
        }
        Raw noHost = raw("GET", "/api/grades");
        assertEquals(400, noHost.status(), "no Host header at all (HTTP/1.1 requires one)");
        assertTrue(noHost.body().contains("\"BAD_REQUEST\""), noHost.body());
    }

    @Test
    void a_page_write_without_the_session_form_token_is_refused_and_writes_nothing() throws Exception {
        Map<String, Integer> before = server.rowCounts();
        HttpResponse<String> bare = server.post(GRADE + "/details", HttpRequest.BodyPublishers.ofString("version=2&supplier=Forged"),
                "application/x-www-form-urlencoded");
        assertEquals(403, bare.statusCode());
        assertEquals("FORM_TOKEN_REFUSED", RunningServer.json(bare).get("error").get("code").asText());
        Raw otherSession = send("POST", GRADE + "/details", "version=2&supplier=Forged&formToken=" + server.formToken(), "Host", host(),
                "Cookie", "kneepoint_session=0123456789abcdef0123456789abcdef", "Content-Type", "application/x-www-form-urlencoded");
        assertEquals(403, otherSession.status(), "a token of another session");
        Raw upload = send("POST", "/import", "--b\r\nContent-Disposition: form-data; name=\"file\"; filename=\"r40.csv\"\r\n\r\n"
                + CURVE + "\r\n--b--\r\n", "Host", host(), "Content-Type", "multipart/form-data; boundary=b");
        assertEquals(403, upload.status(), upload.body());
        assertEquals(before, server.rowCounts());
        assertFalse(server.get(GRADE).body().contains("Forged"));
    }

    @Test
    void a_write_sent_by_a_page_of_another_site_is_refused() throws Exception {
        Map<String, Integer> before = server.rowCounts();
        for (String origin : List.of("http://evil.example", "null", "http://localhost:1")) {
            HttpResponse<String> response = server.upload("/api/import", Map.of("r40.csv", CURVE), Map.of(), "Origin", origin);
            assertEquals(403, response.statusCode(), origin);
            assertEquals("FOREIGN_ORIGIN", RunningServer.json(response).get("error").get("code").asText());
        }
        Raw form = send("POST", GRADE + "/details", "version=2&supplier=Forged&formToken=" + server.formToken(), "Host", host(),
                "Origin", "http://evil.example", "Content-Type", "application/x-www-form-urlencoded");
        assertEquals(403, form.status());
        assertEquals(before, server.rowCounts());
    }

    @Test
    void the_browser_s_word_on_the_sending_site_is_heeded() throws Exception {
        Map<String, Integer> before = server.rowCounts();
        HttpResponse<String> crossSite = server.upload("/api/import", Map.of("r40.csv", CURVE), Map.of(), "Sec-Fetch-Site", "cross-site");
        assertEquals(403, crossSite.statusCode());
        HttpResponse<String> nullOrigin = server.upload("/api/import", Map.of("r40.csv", CURVE), Map.of(), "Origin", "null",
                "Sec-Fetch-Site", "same-site");
        assertEquals(403, nullOrigin.statusCode());
        assertEquals(before, server.rowCounts());
        // Our pages send no Referer, so the browser sends "Origin: null" with their forms, and says the form is its own.
        HttpResponse<String> ownPage = server.upload("/import", Map.of("r40.csv", CURVE), Map.of(), "Origin", "null",
                "Sec-Fetch-Site", "same-origin");
        assertEquals(200, ownPage.statusCode(), ownPage.body());
    }

    @Test
    void the_form_token_of_the_session_lets_the_page_write() throws Exception {
        HttpResponse<String> preview = server.upload("/import", Map.of("r40.csv", CURVE), Map.of(), "Origin", "http://" + host());
        assertEquals(200, preview.statusCode(), preview.body());
        assertTrue(preview.body().contains("name=\"formToken\" value=\"" + server.formToken() + "\""), "the next form carries it too");
    }

    @Test
    void every_answer_carries_the_security_headers() throws Exception {
        for (String path : List.of("/", GRADE, "/import", "/check", "/api/grades", "/api/grades/NOPE", "/no-such-page", "/style.css",
                "/charts/grades/DEMO%20AlNiCo%208.svg")) {
            HttpResponse<String> response = server.get(path, "Accept", "text/html");
            String policy = response.headers().firstValue("Content-Security-Policy").orElse("");
            assertTrue(policy.contains("frame-ancestors 'none'"), path + ": " + policy);
            assertTrue(policy.startsWith("default-src 'self'") || policy.startsWith("default-src 'none'"), path + ": " + policy);
            assertFalse(policy.contains("script-src"), "no script is ever allowed: " + policy);
            assertEquals("nosniff", response.headers().firstValue("X-Content-Type-Options").orElse(""), path);
            assertEquals("no-referrer", response.headers().firstValue("Referrer-Policy").orElse(""), path);
        }
        Raw refused = raw("GET", "/", "Host", "evil.example");
        assertTrue(refused.head().contains("content-security-policy: default-src 'self'"), refused.head());
    }

    @Test
    void pages_have_no_inline_script_or_style() throws Exception {
        for (String path : List.of("/", GRADE, "/import", "/check?grade=DEMO%20NdFeB%2042%2F100&temperature=80C&pc=2", "/select",
                "/field", "/select?temperature=80C&pc=2")) {
            String page = server.get(path).body().toLowerCase(java.util.Locale.ROOT);
            assertFalse(page.contains("<script") || page.contains("<style") || page.contains(" style=")
                    || page.matches("(?s).*\\son[a-z]+=.*") || page.contains("javascript:"), path);
        }
    }

    @Test
    void jettys_own_errors_answer_in_the_documented_json() throws Exception {
        Raw longUri = raw("GET", "/api/grades/" + "a".repeat(20_000), "Host", host());
        assertEquals(414, longUri.status());
        assertTrue(longUri.head().contains("content-type: application/json"), longUri.head());
        assertTrue(longUri.body().contains("\"URI_TOO_LONG\""), longUri.body());
        Raw bigHeader = raw("GET", "/", "Host", host(), "X-Filler", "b".repeat(20_000));
        assertEquals(431, bigHeader.status());
        assertTrue(bigHeader.body().contains("\"HEADERS_TOO_LARGE\""), bigHeader.body());
        assertFalse(bigHeader.body().contains("bbbbbbbb"));
        Raw badUri = raw("GET", "/api/grades/%zz", "Host", host(), "Accept", "text/html");
        assertEquals(400, badUri.status());
        assertTrue(badUri.body().contains("\"BAD_REQUEST\""), badUri.body());
        assertTrue(badUri.head().contains("content-security-policy"), badUri.head());
        assertFalse(badUri.body().toLowerCase(java.util.Locale.ROOT).contains("jetty"));
    }

    @Test
    void a_chunked_body_over_the_limit_is_refused() throws Exception {
        HttpClient client = HttpClient.newHttpClient();
        byte[] big = new byte[200_000];
        java.util.Arrays.fill(big, (byte) 'a');
        HttpRequest request = HttpRequest.newBuilder(server.uri("/api/jobs/ja-fit?grade=DEMO%20AlNiCo%208"))
                .header("Content-Type", "application/x-www-form-urlencoded")
                .POST(HttpRequest.BodyPublishers.ofInputStream(() -> new java.io.ByteArrayInputStream(big))).build();
        HttpResponse<String> response = client.send(request, HttpResponse.BodyHandlers.ofString());
        assertEquals(413, response.statusCode(), response.body());
        assertEquals("TOO_LARGE", RunningServer.json(response).get("error").get("code").asText());
    }

    @Test
    void head_answers_like_get_without_a_body() throws Exception {
        HttpClient client = HttpClient.newHttpClient();
        for (String path : List.of("/", "/api/grades", "/api/grades/NOPE", "/no-such-page", GRADE)) {
            URI uri = server.uri(path);
            HttpResponse<String> get = client.send(HttpRequest.newBuilder(uri).GET().build(), HttpResponse.BodyHandlers.ofString());
            HttpResponse<String> head = client.send(HttpRequest.newBuilder(uri).method("HEAD", HttpRequest.BodyPublishers.noBody()).build(),
                    HttpResponse.BodyHandlers.ofString());
            assertEquals(get.statusCode(), head.statusCode(), path);
            assertEquals(get.headers().firstValue("Content-Type"), head.headers().firstValue("Content-Type"), path);
            assertEquals(String.valueOf(get.body().getBytes(StandardCharsets.UTF_8).length),
                    head.headers().firstValue("Content-Length").orElse("?"), path);
            assertEquals("", head.body(), path);
        }
    }
}
