package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.net.http.HttpResponse;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;

/** {@code POST /api/check/elements} answers what {@code check-elements --json} prints for the same files and grade. */
@ExtendWith(SharedDemoServer.class)
class ElementsApiTest {

    private static final String HEADER = "x [mm],y [mm],z [mm],Hx [kA/m],Hy [kA/m],Hz [kA/m],V [mm³]\n";

    private static SharedDemoServer.Fixture fixture;

    @TempDir
    Path folder;

    @BeforeAll
    static void fixture(SharedDemoServer.Fixture shared) {
        fixture = shared;
    }

    private Map<String, String> cases() {
        Map<String, String> files = new LinkedHashMap<>();
        files.put("hot.csv", HEADER + "0,0,1,10,0,-650,0.5\n1,0,1,0,20,-300,0.5\n2,0,-1,0,0,-100,1\n");
        files.put("cold.csv", HEADER + "0,0,1,0,0,-100,0.5\n1,0,1,0,0,-800,0.5\n2,0,-1,0,0,-50,1\n");
        return files;
    }

    private CliRun command(Map<String, String> files, String... options) throws Exception {
        List<String> args = new ArrayList<>(List.of(options));
        for (Map.Entry<String, String> file : files.entrySet()) {
            Path path = folder.resolve(file.getKey());
            Files.writeString(path, file.getValue());
            args.add(path.toString());
        }
        args.addAll(List.of("--json", "--db", fixture.cliDb()));
        return CliRun.of(args.toArray(String[]::new));
    }

    @Test
    void the_route_answers_what_the_command_prints_for_a_library_grade() throws Exception {
        // DEMO NdFeB 42/100 is measured at 20, 60, 80 and 100 °C (DemoLibrary, invented)
        HttpResponse<String> response = fixture.server().upload("/api/check/elements?grade=DEMO%20NdFeB%2042%2F100&temperature=80C"
                + "&direction=0,0,2&lossLimit=2%25", cases(), Map.of());
        assertEquals(200, response.statusCode(), response.body());
        CliRun run = command(cases(), "check-elements", "DEMO NdFeB 42/100", "--temperature", "80C", "--direction", "0,0,2",
                "--loss-limit", "2%");
        assertEquals(0, run.exitCode(), run.err());
        JsonNode json = RunningServer.json(response);
        assertEquals(new ObjectMapper().readTree(run.out()), json);
        assertEquals(3, json.get("elements").asInt());
        assertEquals(2, json.get("loadCases").size());
        assertEquals(1, json.get("worstElements").get(0).get("index").asInt());
        assertTrue(json.get("provenance").get("curves").asText().startsWith("DEMO NdFeB 42/100"), json.toString());
    }

    @Test
    void the_route_takes_a_typed_in_grade_and_the_astroid_rule() throws Exception {
        HttpResponse<String> response = fixture.server().upload("/api/check/elements?br=1.3T&muRec=1.05&hcj=1600kA%2Fm&knee=1450kA%2Fm"
                + "&alpha=-0.12%25%2FK&beta=-0.6%25%2FK&temperature=120C&transverse=astroid", cases(), Map.of());
        assertEquals(200, response.statusCode(), response.body());
        CliRun run = command(cases(), "check-elements", "--br", "1.3T", "--mu-rec", "1.05", "--hcj", "1600kA/m", "--knee", "1450kA/m",
                "--alpha", "-0.12%/K", "--beta", "-0.6%/K", "--temperature", "120C", "--transverse", "astroid");
        assertEquals(0, run.exitCode(), run.err());
        assertEquals(new ObjectMapper().readTree(run.out()), RunningServer.json(response));
        assertEquals("astroid", RunningServer.json(response).get("transverseField").asText());
    }

    @Test
    void a_bad_file_is_a_400_naming_its_line_and_column() throws Exception {
        Map<String, String> files = cases();
        files.put("cold.csv", HEADER + "0,0,1,0,0,-100,0.5\n1,0,1,0,0,minus,0.5\n");
        HttpResponse<String> response = fixture.server().upload("/api/check/elements?grade=DEMO%20NdFeB%2042%2F100&temperature=80C",
                files, Map.of());
        assertEquals(400, response.statusCode(), response.body());
        assertTrue(response.body().contains("cold.csv, line 3, column 6 (Hz [kA/m]): expected a finite number, got 'minus'"),
                response.body());
    }
}
