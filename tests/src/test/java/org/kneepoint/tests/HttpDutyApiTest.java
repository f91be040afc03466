package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.net.URLEncoder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class HttpDutyApiTest {

    private static final String STEPS = "20C:0, 150C:300kA/m, 20C:0";

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

    private static String encoded(String text) {
        return URLEncoder.encode(text, StandardCharsets.UTF_8).replace("+", "%20");
    }

    @Test
    void duty_of_a_library_grade_is_the_cli_duty() throws Exception {
        var response = server.get("/api/duty?grade=" + encoded("DEMO NdFeB 42/100") + "&diameter=10mm&length=5mm&steps=" + encoded(STEPS));
        assertEquals(200, response.statusCode(), response.body());
        CliRun cli = CliRun.of("duty", "DEMO NdFeB 42/100", "--diameter", "10mm", "--length", "5mm", "--steps", STEPS, "--json",
                "--db", cliDb);
        assertEquals(0, cli.exitCode(), cli.err());
        assertEquals(new ObjectMapper().readTree(cli.out()), RunningServer.json(response));
    }

    @Test
    void bad_steps_are_400_with_the_step_named_and_nothing_written() throws Exception {
        Map<String, Integer> before = server.library.reader().rowCounts();
        for (String steps : new String[] {"", "150C", "150C:300T", "hot:0", "150C:-5kA/m"}) {
            var response = server.get("/api/duty?grade=" + encoded("DEMO NdFeB 42/100") + "&pc=2&steps=" + encoded(steps));
            assertEquals(400, response.statusCode(), steps + ": " + response.body());
            JsonNode error = RunningServer.json(response).get("error");
            assertEquals("BAD_INPUT", error.get("code").asText());
            assertTrue(error.get("message").asText().contains("step"), error.toString());
        }
        assertEquals(before, server.library.reader().rowCounts());
    }
}
