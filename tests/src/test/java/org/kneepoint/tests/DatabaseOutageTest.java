package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.net.ServerSocket;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Duration;
import java.util.Comparator;
import java.util.Map;
import java.util.UUID;
import java.util.concurrent.CompletableFuture;
import java.util.stream.Stream;
import org.awaitility.Awaitility;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.kneepoint.db.DatabaseLocation;

/**
 * The database server dies in the middle of a write (a crash: PostgreSQL stopped in immediate
 * mode while the import is inside its transaction). The client gets a clear 503 naming the
 * database, requests meanwhile get the same, nothing of the import is left after the restart, and
 * the same server process works again once the database is back, without a restart of its own.
 * The test runs its own PostgreSQL server (tests/postgres), since it stops it, with durable commits
 * (a crash must not lose what was committed before it, such as the library's tables).
 */
@Tag("slow")
class DatabaseOutageTest {

    private final Path serverFolder = createFolder();
    private final int port = freePort();

    private static Path createFolder() {
        try {
            return Files.createDirectory(Path.of("/tmp", "kneepoint-outage-" + UUID.randomUUID()),
                    PosixFilePermissions.asFileAttribute(PosixFilePermissions.fromString("rwxr-xr-x")));
        } catch (IOException e) {
            throw new IllegalStateException(e);
        }
    }

    private static int freePort() {
        try (ServerSocket socket = new ServerSocket(0)) {
            return socket.getLocalPort();
        } catch (IOException e) {
            throw new IllegalStateException(e);
        }
    }

    /** Runs tests/postgres with the arguments; returns its standard output. */
    private static String postgres(String... arguments) throws IOException, InterruptedException {
        String[] command = new String[arguments.length + 1];
        command[0] = Path.of("postgres").toAbsolutePath().toString();
        System.arraycopy(arguments, 0, command, 1, arguments.length);
        Process process = new ProcessBuilder(command).redirectErrorStream(true).start();
        String output = new String(process.getInputStream().readAllBytes(), StandardCharsets.UTF_8).strip();
        assertEquals(0, process.waitFor(), "tests/postgres " + String.join(" ", arguments) + ": " + output);
        return output;
    }

    @AfterEach
    void removeServer() throws Exception {
        try {
            postgres("stop", serverFolder.toString());
        } catch (AssertionError alreadyStopped) {
            // stopped by the test itself
        }
        try (Stream<Path> paths = Files.walk(serverFolder)) {
            paths.sorted(Comparator.reverseOrder()).forEach(path -> path.toFile().delete());
        }
    }

    @Test
    void a_crash_of_the_database_mid_write_is_reported_leaves_nothing_and_the_server_recovers() throws Exception {
        String serverUrl = postgres("start", serverFolder.toString(), Integer.toString(port), "durable");
        String libraryUrl = TestPostgres.freshSchemaUrl(serverUrl);
        String file = Files.readString(LargeCurveFile.write(Files.createTempFile(serverFolder, "large", ".csv"), 4, 10_000));
        try (RunningServer server = RunningServer.over(new DatabaseLocation(libraryUrl))) {
            Map<String, Integer> before = server.rowCounts();

            // Hold the import inside its transaction: it has written its record, grade and curve rows
            // and waits for the lock on the table of curve pieces. Then the database crashes.
            try (Connection blocker = DriverManager.getConnection(libraryUrl)) {
                blocker.setAutoCommit(false);
                blocker.createStatement().execute("LOCK TABLE curve_piece IN EXCLUSIVE MODE");
                CompletableFuture<HttpResponse<String>> upload = CompletableFuture.supplyAsync(() -> {
                    try {
                        return server.upload("/api/import", Map.of("large.csv", file), Map.of());
                    } catch (IOException | InterruptedException e) {
                        throw new IllegalStateException(e);
                    }
                });
                waitUntilAnInsertWaitsForTheLock(serverUrl);
                postgres("stop", serverFolder.toString(), "immediate");

                HttpResponse<String> failed = upload.get();
                assertEquals(503, failed.statusCode(), failed.body());
                JsonNode error = RunningServer.json(failed).get("error");
                assertEquals("UNAVAILABLE", error.get("code").asText());
                assertTrue(error.get("message").asText().startsWith("the library database at " + libraryUrl + " cannot be reached ("),
                        error.get("message").asText());
                assertTrue(error.get("message").asText().endsWith("nothing of this request was kept, try again when it is back"));
                assertTrue(failed.headers().firstValue("Retry-After").isPresent(), "a 503 says when to try again");

                HttpResponse<String> whileDown = server.get("/api/grades");
                assertEquals(503, whileDown.statusCode(), whileDown.body());
                assertEquals("UNAVAILABLE", RunningServer.json(whileDown).get("error").get("code").asText());

                postgres("start", serverFolder.toString(), Integer.toString(port), "durable");
                HttpResponse<String> back = server.get("/api/grades");
                assertEquals(200, back.statusCode(), "the first request after the restart is served: " + back.body());
                assertEquals(0, RunningServer.json(back).size(), back.body());
                assertEquals(before, server.rowCounts(), "nothing of the interrupted import is left");

                HttpResponse<String> again = server.upload("/api/import", Map.of("large.csv", file), Map.of());
                assertEquals(200, again.statusCode(), again.body());
                Map<String, Integer> after = server.rowCounts();
                assertEquals(1, after.get("import_record"));
                assertEquals(4, after.get("curve"));
                assertEquals(4 * 2, after.get("curve_piece"), "10,000 points: the first 4096 in the curve row, then two pieces");
            }
        }
    }

    private static void waitUntilAnInsertWaitsForTheLock(String serverUrl) throws Exception {
        try (Connection watcher = DriverManager.getConnection(serverUrl); Statement statement = watcher.createStatement()) {
            Awaitility.await("the import waiting for the locked table").atMost(Duration.ofSeconds(60)).pollInterval(Duration.ofMillis(20))
                    .until(() -> insertsWaitingForALock(statement) > 0);
        }
    }

    private static int insertsWaitingForALock(Statement statement) throws SQLException {
        try (ResultSet waiting = statement.executeQuery("SELECT count(*) FROM pg_stat_activity WHERE wait_event_type = 'Lock' "
                + "AND query ILIKE 'insert into curve_piece%'")) {
            waiting.next();
            return waiting.getInt(1);
        }
    }
}
