package org.kneepoint.tests;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.OptionalInt;
import java.util.UUID;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.awaitility.Awaitility;
import org.awaitility.core.ConditionTimeoutException;

/**
 * {@code kneepoint serve} in a child JVM (the test's own class path) over a library folder, with a
 * token for writes, a real HTTP client, and a SIGKILL as the only way to end it: for the tests of
 * what survives a crash.
 */
final class ServerProcess {

    static final String TOKEN = "durability-test-token";
    private static final Pattern OPEN_LINE = Pattern.compile("Open http://127\\.0\\.0\\.1:(\\d+)/");

    private final Process process;
    private final Path log;
    private final int port;
    private final HttpClient client = HttpClient.newHttpClient();

    private ServerProcess(Process process, Path log, int port) {
        this.process = process;
        this.log = log;
        this.port = port;
    }

    /** Starts the server and waits until it says where it listens. */
    static ServerProcess start(Path library, Path logFolder) throws IOException {
        Path out = logFolder.resolve("server-" + UUID.randomUUID() + ".out");
        Process process = new ProcessBuilder(javaCommand("serve", "--db", library.toString(), "--port", "0", "--token", TOKEN))
                .redirectErrorStream(true).redirectOutput(out.toFile()).start();
        try {
            int listening = Awaitility.await("the server saying where it listens").atMost(Duration.ofSeconds(60))
                    .pollInterval(Duration.ofMillis(20)).until(() -> announcedPort(process, out), OptionalInt::isPresent).getAsInt();
            return new ServerProcess(process, out, listening);
        } catch (ConditionTimeoutException e) {
            process.destroyForcibly();
            throw new IllegalStateException("the server did not start within 60 s: " + Files.readString(out), e);
        }
    }

    /** The port of the "Open http://..." line once the server printed it; fails at once if the server ended. */
    private static OptionalInt announcedPort(Process process, Path out) throws IOException {
        Matcher open = OPEN_LINE.matcher(Files.readString(out));
        if (open.find()) {
            return OptionalInt.of(Integer.parseInt(open.group(1)));
        }
        if (!process.isAlive()) {
            throw new IllegalStateException("the server ended at start: " + Files.readString(out));
        }
        return OptionalInt.empty();
    }

    /** {@code java -cp <this test's class path> KneepointCommand ARGS}. */
    static List<String> javaCommand(String... args) {
        List<String> command = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-Djava.awt.headless=true", "-Xshare:auto", "-XX:TieredStopAtLevel=1",
                "-cp", System.getProperty("java.class.path"), "org.kneepoint.server.cli.KneepointCommand"));
        command.addAll(List.of(args));
        return command;
    }

    /** A POST with the token; the answer is complete when this returns. */
    HttpResponse<String> post(String pathAndQuery, HttpRequest.BodyPublisher body, String contentType)
            throws IOException, InterruptedException {
        HttpRequest request = HttpRequest.newBuilder(URI.create("http://127.0.0.1:" + port + pathAndQuery)).POST(body)
                .header("Content-Type", contentType).header("Authorization", "Bearer " + TOKEN).build();
        return client.send(request, HttpResponse.BodyHandlers.ofString());
    }

    /** A multipart upload of one text file to {@code pathAndQuery}. */
    HttpResponse<String> upload(String pathAndQuery, String fileName, String content) throws IOException, InterruptedException {
        String boundary = "kneepoint-" + UUID.randomUUID();
        ByteArrayOutputStream body = new ByteArrayOutputStream();
        body.writeBytes(("--" + boundary + "\r\nContent-Disposition: form-data; name=\"file\"; filename=\"" + fileName
                + "\"\r\nContent-Type: text/plain\r\n\r\n" + content + "\r\n--" + boundary + "--\r\n").getBytes(StandardCharsets.UTF_8));
        return post(pathAndQuery, HttpRequest.BodyPublishers.ofByteArray(body.toByteArray()), "multipart/form-data; boundary=" + boundary);
    }

    /** SIGKILL, and wait until the process is gone. */
    void kill() throws InterruptedException {
        process.destroyForcibly();
        if (!process.waitFor(30, TimeUnit.SECONDS)) {
            throw new IllegalStateException("the killed server did not end");
        }
    }

    String output() throws IOException {
        return Files.readString(log);
    }
}
