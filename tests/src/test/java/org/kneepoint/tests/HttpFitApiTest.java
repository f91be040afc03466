package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class HttpFitApiTest {

    @TempDir
    static Path folder;

    private static RunningServer server;
    private static String cliDb;

    @BeforeAll
    static void start() {
        server = RunningServer.withDemo(folder.resolve("served"), null);
        cliDb = folder.resolve("cli").toString();
        assertEquals(0, CliRun.of("demo", "--db", cliDb).exitCode());
    }

    @AfterAll
    static void stop() {
        server.close();
    }

    private static JsonNode cli(String... args) throws Exception {
        CliRun run = CliRun.of(args);
        assertEquals(0, run.exitCode(), run.err());
        return new ObjectMapper().readTree(run.out());
    }

    private static JsonNode ok(String path) throws Exception {
        var response = server.get(path);
        assertEquals(200, response.statusCode(), response.body());
        return RunningServer.json(response);
    }

    @Test
    void the_fit_routes_answer_what_the_fit_commands_print() throws Exception {
        assertEquals(cli("fit", "knee", "DEMO NdFeB 42/100", "--temperature", "20C", "--json", "--db", cliDb),
                ok("/api/fit/knee?grade=DEMO%20NdFeB%2042%2F100&temperature=20C"));
        assertEquals(cli("fit", "temperature", "DEMO SmCo 28/200", "--json", "--db", cliDb),
                ok("/api/fit/temperature?grade=DEMO%20SmCo%2028%2F200"));
        assertEquals(cli("fit", "curie-weiss", "DEMO paramagnetic salt", "--json", "--db", cliDb),
                ok("/api/fit/curie-weiss?material=DEMO%20paramagnetic%20salt"));
    }

    @Test
    void bad_fit_requests_are_4xx_and_store_nothing() throws Exception {
        Map<String, Integer> before = server.library.reader().rowCounts();
        assertEquals(400, server.get("/api/fit/knee").statusCode());
        assertEquals(404, server.get("/api/fit/knee?grade=Nothing").statusCode());
        assertEquals(400, server.get("/api/fit/knee?grade=DEMO%20SmCo%2028%2F200&temperature=hot").statusCode());
        assertEquals(404, server.get("/api/fit/temperature?grade=Nothing").statusCode());
        assertEquals(404, server.get("/api/fit/curie-weiss?material=Nothing").statusCode());
        assertEquals(before, server.library.reader().rowCounts());
    }
}
