package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.net.URLEncoder;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class HttpApiTest {

    private static final String GRADE = "DEMO NdFeB 42/100";
    private static final ObjectMapper JSON = new ObjectMapper();

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

    private static String name(String grade) {
        return URLEncoder.encode(grade, StandardCharsets.UTF_8).replace("+", "%20");
    }

    private static JsonNode ok(HttpResponse<String> response) throws IOException {
        assertEquals(200, response.statusCode(), response.body());
        assertTrue(response.headers().firstValue("Content-Type").orElse("").startsWith("application/json"));
        return RunningServer.json(response);
    }

    private static JsonNode cli(String... args) throws IOException {
        CliRun run = CliRun.of(args);
        assertEquals(0, run.exitCode(), run.err());
        return JSON.readTree(run.out());
    }

    @Test
    void grades_answer_what_the_cli_prints_with_json() throws Exception {
        JsonNode grades = ok(server.get("/api/grades"));
        assertEquals(cli("grades", "--json", "--db", cliDb), grades);
        assertEquals(12, grades.size());
    }

    @Test
    void grades_filter_by_family() throws Exception {
        JsonNode grades = ok(server.get("/api/grades?family=" + name("sintered SmCo")));
        assertEquals(2, grades.size());
        grades.forEach(grade -> assertEquals("sintered SmCo", grade.get("family").asText()));
    }

    @Test
    void a_grade_lists_its_stored_curves_and_their_temperatures() throws Exception {
        JsonNode grade = ok(server.get("/api/grades/" + name(GRADE)));
        assertEquals(GRADE, grade.get("name").asText());
        assertEquals("sintered NdFeB", grade.get("family").asText());
        assertEquals(4, grade.get("curves").size());
        assertEquals(293.15, grade.get("curves").get(0).get("temperatureK").asDouble(), 1e-9);
    }

    @Test
    void curve_at_a_stored_temperature_is_the_cli_characterization() throws Exception {
        JsonNode curve = ok(server.get("/api/grades/" + name(GRADE) + "/curve?temperature=20C"));
        assertEquals(cli("curve", GRADE, "--temperature", "20C", "--json", "--db", cliDb), curve);
        assertFalse(curve.get("modeled").asBoolean());
    }

    @Test
    void curve_beyond_the_stored_temperatures_is_modeled_and_flagged_extrapolated() throws Exception {
        JsonNode curve = ok(server.get("/api/grades/" + name(GRADE) + "/curve?temperature=120C"));
        assertTrue(curve.get("modeled").asBoolean());
        assertTrue(curve.get("extrapolated").asBoolean());
        assertEquals(393.15, curve.get("temperatureK").asDouble(), 1e-9);
        assertEquals(cli("curve", GRADE, "--temperature", "120C", "--json", "--db", cliDb), curve);
    }

    @Test
    void export_as_csv_is_the_cli_export() throws Exception {
        HttpResponse<String> response = server.get("/api/grades/" + name(GRADE)
                + "/export?temperature=80C&format=csv&curve=intrinsic&points=40&units=cgs");
        assertEquals(200, response.statusCode(), response.body());
        assertTrue(response.headers().firstValue("Content-Type").orElse("").startsWith("text/csv"));
        CliRun run = CliRun.of("export", GRADE, "--temperature", "80C", "--curve", "intrinsic", "--points", "40", "--units", "cgs",
                "--db", cliDb);
        assertEquals(run.out(), response.body());
    }

    @Test
    void export_as_json_shifted_is_the_cli_export() throws Exception {
        JsonNode export = ok(server.get("/api/grades/" + name(GRADE) + "/export?temperature=20C&format=json&shifted=true"));
        assertEquals(cli("export", GRADE, "--temperature", "20C", "--format", "json", "--shifted", "--db", cliDb), export);
    }

    @Test
    void export_after_damage_steps_is_the_cli_export_and_half_a_pair_is_refused() throws Exception {
        JsonNode damaged = ok(server.get("/api/grades/" + name(GRADE) + "/export?temperature=20C&format=json&curve=intrinsic"
                + "&after=" + java.net.URLEncoder.encode("100C:300kA/m, 20C:0", java.nio.charset.StandardCharsets.UTF_8) + "&pc=1"));
        assertEquals(cli("export", GRADE, "--temperature", "20C", "--format", "json", "--curve", "intrinsic", "--after",
                "100C:300kA/m, 20C:0", "--pc", "1", "--db", cliDb), damaged);
        assertTrue(!damaged.equals(cli("export", GRADE, "--temperature", "20C", "--format", "json", "--curve", "intrinsic",
                "--db", cliDb)), "the steps damage this grade (the export differs from the plain one)");
        for (String query : new String[] {"&after=150C:300kA%2Fm", "&pc=2", "&after=150C:300kA%2Fm&pc=0", "&after=150C:300&pc=1"}) {
            HttpResponse<String> refused = server.get("/api/grades/" + name(GRADE) + "/export?temperature=20C" + query);
            assertEquals(400, refused.statusCode(), query + ": " + refused.body());
            assertTrue(refused.body().contains("query parameter"), refused.body());
        }
    }

    @Test
    void permeance_of_a_cylinder_a_ring_a_block_and_a_spheroid_is_the_cli_answer() throws Exception {
        assertEquals(cli("permeance", "cylinder", "--diameter", "10mm", "--length", "5mm", "--json"),
                ok(server.get("/api/permeance/cylinder?diameter=10mm&length=5mm")));
        assertEquals(cli("permeance", "cylinder", "--diameter", "10mm", "--length", "5mm", "--inner-diameter", "4mm", "--on-steel", "--json"),
                ok(server.get("/api/permeance/cylinder?diameter=10mm&length=5mm&innerDiameter=4mm&onSteel=true")));
        assertEquals(cli("permeance", "block", "--width", "20mm", "--depth", "10mm", "--thickness", "5mm", "--json"),
                ok(server.get("/api/permeance/block?width=20mm&depth=10mm&thickness=5mm")));
        assertEquals(cli("permeance", "spheroid", "--diameter", "10mm", "--length", "10mm", "--json"),
                ok(server.get("/api/permeance/spheroid?diameter=10mm&length=10mm")));
    }

    @Test
    void a_grade_name_with_a_slash_is_found_through_its_encoded_path() throws Exception {
        JsonNode grade = ok(server.get("/api/grades/" + name("DEMO Ferrite 27/33")));
        assertEquals("DEMO Ferrite 27/33", grade.get("name").asText());
    }
}
