package org.kneepoint.tests;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Map;
import java.util.UUID;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.kneepoint.db.DatabaseLocation;
import org.kneepoint.db.Library;
import org.kneepoint.server.http.JobRegistry;
import org.kneepoint.server.http.ServerSettings;
import org.kneepoint.server.library.DemoLoader;
import org.kneepoint.server.web.WebApplication;

/**
 * The real web application on 127.0.0.1 and a free port over a library in a test folder, with a
 * real HTTP client. Closing stops the server and closes the library.
 */
final class RunningServer implements AutoCloseable {

    private static final ObjectMapper JSON = new ObjectMapper();

    final Library library;
    final WebApplication application;
    private final HttpClient client = HttpClient.newHttpClient();

    private RunningServer(Library library, WebApplication application) {
        this.library = library;
        this.application = application;
    }

    /** A server over the library at {@code location} (opened here, closed with the server), without a token. */
    static RunningServer over(DatabaseLocation location) {
        Library library = Library.open(location);
        return new RunningServer(library, WebApplication.start(library, new ServerSettings(ServerSettings.LOOPBACK, 0, null)));
    }

    /** The demo library in {@code folder}, served without a token, with the given job registry. */
    static RunningServer withJobs(Path folder, JobRegistry jobs) {
        Library library = Library.open(DatabaseLocation.ofFolder(folder.resolve("library")));
        DemoLoader.load(library);
        return new RunningServer(library, WebApplication.start(library, new ServerSettings(ServerSettings.LOOPBACK, 0, null), jobs));
    }

    /** A server over the demo library in {@code folder}; {@code token} null means no token. */
    static RunningServer withDemo(Path folder, String token) {
        Library library = Library.open(DatabaseLocation.ofFolder(folder.resolve("library")));
        DemoLoader.load(library);
        return new RunningServer(library, WebApplication.start(library, new ServerSettings(ServerSettings.LOOPBACK, 0, token)));
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

    /** A multipart/form-data POST of files (name → content) and form fields, with extra headers. */
    HttpResponse<String> upload(String pathAndQuery, Map<String, String> files, Map<String, String> fields, String... headers)
            throws IOException, InterruptedException {
        String boundary = "kneepoint-" + UUID.randomUUID();
        ByteArrayOutputStream body = new ByteArrayOutputStream();
        fields.forEach((name, value) -> part(body, boundary, "name=\"" + name + "\"", value));
        files.forEach((name, content) -> part(body, boundary, "name=\"file\"; filename=\"" + name + "\"\r\nContent-Type: text/plain", content));
        body.writeBytes(("--" + boundary + "--\r\n").getBytes(StandardCharsets.UTF_8));
        return post(pathAndQuery, HttpRequest.BodyPublishers.ofByteArray(body.toByteArray()), "multipart/form-data; boundary=" + boundary, headers);
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
