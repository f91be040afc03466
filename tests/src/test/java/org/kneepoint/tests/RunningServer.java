package org.kneepoint.tests;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.net.CookieManager;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Map;
import java.util.UUID;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.kneepoint.db.DatabaseLocation;
import org.kneepoint.db.Library;
import org.kneepoint.server.app.jobs.JobRegistry;
import org.kneepoint.server.app.serving.ServerSettings;
import org.kneepoint.server.app.demo.DemoLoader;
import org.kneepoint.server.web.WebApplication;

/**
 * The real web application on 127.0.0.1 and a free port over a library in a test folder, with a
 * real HTTP client that keeps cookies like a browser. Writes to pages ({@link #submit}, and {@link #upload} outside
 * {@code /api}) carry the session's form token taken from the Import page, as the page's own form would.
 * Closing stops the server and closes the library.
 */
final class RunningServer implements AutoCloseable {

    private static final ObjectMapper JSON = new ObjectMapper();

    final Library library;
    final WebApplication application;
    private final JobRegistry jobs;
    private final HttpClient client = HttpClient.newBuilder().cookieHandler(new CookieManager()).build();
    private String formToken;

    private RunningServer(Library library, JobRegistry jobs, ServerSettings settings) {
        this.library = library;
        this.jobs = jobs;
        this.application = WebApplication.start(library, settings, jobs);
    }

    /** A server over the library at {@code location} (opened here, closed with the server), without a token. */
    static RunningServer over(DatabaseLocation location) {
        Library library = Library.open(location);
        return new RunningServer(library, JobRegistry.standard(), new ServerSettings(ServerSettings.LOOPBACK, 0, null));
    }

    /** The demo library in {@code folder}, served without a token, with the given job registry. */
    static RunningServer withJobs(Path folder, JobRegistry jobs) {
        Library library = Library.open(DatabaseLocation.ofFolder(folder.resolve("library")));
        DemoLoader.load(library);
        return new RunningServer(library, jobs, new ServerSettings(ServerSettings.LOOPBACK, 0, null));
    }

    /** A server over the demo library in {@code folder}; {@code token} null means no token. */
    static RunningServer withDemo(Path folder, String token) {
        Library library = Library.open(DatabaseLocation.ofFolder(folder.resolve("library")));
        DemoLoader.load(library);
        return new RunningServer(library, JobRegistry.standard(), new ServerSettings(ServerSettings.LOOPBACK, 0, token));
    }

    /**
     * The job's status as {@code /api/jobs/{id}} answers it once the job has ended: awaited on the server's registry
     * (at most 60 s, then answered as it is), never polled.
     */
    JsonNode jobWhenEnded(String id) throws IOException, InterruptedException {
        jobs.awaitEnd(id, java.time.Duration.ofSeconds(60));
        return json(get("/api/jobs/" + id));
    }

    URI uri(String pathAndQuery) {
        return URI.create("http://127.0.0.1:" + application.port() + pathAndQuery);
    }

    HttpResponse<String> get(String pathAndQuery, String... headers) throws IOException, InterruptedException {
        HttpRequest.Builder request = HttpRequest.newBuilder(uri(pathAndQuery)).GET();
        if (headers.length > 0) {
            request.headers(headers);
        }
        return client.send(request.build(), HttpResponse.BodyHandlers.ofString());
    }

    /** The session's form token, from the hidden field of the Import page (which starts the session). */
    String formToken() throws IOException, InterruptedException {
        if (formToken == null) {
            Matcher field = Pattern.compile("name=\"formToken\" value=\"([^\"]+)\"").matcher(get("/import").body());
            if (!field.find()) {
                throw new IllegalStateException("the Import page has no form token");
            }
            formToken = field.group(1);
        }
        return formToken;
    }

    /** A page's form sent as the browser sends it: the URL-encoded fields and the session's form token. */
    HttpResponse<String> submit(String pathAndQuery, String fields, String... headers) throws IOException, InterruptedException {
        String body = (fields.isEmpty() ? "" : fields + "&") + "formToken=" + formToken();
        return post(pathAndQuery, HttpRequest.BodyPublishers.ofString(body), "application/x-www-form-urlencoded", headers);
    }

    /** A multipart/form-data POST of files (name → content) and form fields (and a page's form token), with extra headers. */
    HttpResponse<String> upload(String pathAndQuery, Map<String, String> files, Map<String, String> fields, String... headers)
            throws IOException, InterruptedException {
        String boundary = "kneepoint-" + UUID.randomUUID();
        ByteArrayOutputStream body = new ByteArrayOutputStream();
        if (!pathAndQuery.startsWith("/api/")) {
            part(body, boundary, "name=\"formToken\"", formToken());
        }
        fields.forEach((name, value) -> part(body, boundary, "name=\"" + name + "\"", value));
        files.forEach((name, content) -> part(body, boundary, "name=\"file\"; filename=\"" + name + "\"\r\nContent-Type: text/plain", content));
        body.writeBytes(("--" + boundary + "--\r\n").getBytes(StandardCharsets.UTF_8));
        return post(pathAndQuery, HttpRequest.BodyPublishers.ofByteArray(body.toByteArray()), "multipart/form-data; boundary=" + boundary, headers);
    }

    /** A multipart/form-data POST of one file given as bytes (which need not be UTF-8). */
    HttpResponse<String> upload(String pathAndQuery, String fileName, byte[] content) throws IOException, InterruptedException {
        String boundary = "kneepoint-" + UUID.randomUUID();
        ByteArrayOutputStream body = new ByteArrayOutputStream();
        String head = "--" + boundary + "\r\nContent-Disposition: form-data; name=\"file\"; filename=\"" + fileName
                + "\"\r\nContent-Type: application/octet-stream\r\n\r\n";
        body.writeBytes(head.getBytes(StandardCharsets.UTF_8));
        body.writeBytes(content);
        body.writeBytes(("\r\n--" + boundary + "--\r\n").getBytes(StandardCharsets.UTF_8));
        return post(pathAndQuery, HttpRequest.BodyPublishers.ofByteArray(body.toByteArray()), "multipart/form-data; boundary=" + boundary);
    }

    HttpResponse<String> post(String pathAndQuery, HttpRequest.BodyPublisher body, String contentType, String... headers)
            throws IOException, InterruptedException {
        HttpRequest.Builder request = HttpRequest.newBuilder(uri(pathAndQuery)).POST(body).header("Content-Type", contentType);
        if (headers.length > 0) {
            request.headers(headers);
        }
        return client.send(request.build(), HttpResponse.BodyHandlers.ofString());
    }

    static JsonNode json(HttpResponse<String> response) throws IOException {
        return JSON.readTree(response.body());
    }

    Map<String, Integer> rowCounts() {
        return library.reader().rowCounts();
    }

    private static void part(ByteArrayOutputStream body, String boundary, String disposition, String content) {
        String head = "--" + boundary + "\r\nContent-Disposition: form-data; " + disposition + "\r\n\r\n";
        body.writeBytes(head.getBytes(StandardCharsets.UTF_8));
        body.writeBytes(content.getBytes(StandardCharsets.UTF_8));
        body.writeBytes("\r\n".getBytes(StandardCharsets.UTF_8));
    }

    @Override
    public void close() {
        try {
            application.close();
        } finally {
            library.close();
        }
    }
}
