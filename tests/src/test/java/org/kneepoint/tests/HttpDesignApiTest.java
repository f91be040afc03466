package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.net.http.HttpResponse;
import java.nio.file.Path;
import java.time.Instant;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.kneepoint.fitter.library.FitRecord;

class HttpDesignApiTest {

    private static final ObjectMapper JSON = new ObjectMapper();
    private static final String TYPED = "br=1.3T&muRec=1.05&hcj=1600kA%2Fm&knee=1450kA%2Fm&alpha=-0.12%25%2FK&beta=-0.6%25%2FK";

    @TempDir
    static Path folder;

    private static RunningServer server;
    private static String cliDb;

    @BeforeAll
    static void start() {
        server = RunningServer.withDemo(folder.resolve("served"), null);
        server.library.writer().saveFit(new FitRecord("DEMO NdFeB 42/100", null, null, null, "temperature",
                "{\"alpha\":-0.12,\"beta\":-0.6}", 0.004, Instant.parse("2026-01-02T03:04:05Z"), "test"));
        cliDb = folder.resolve("cli").toString();
        assertEquals(0, CliRun.of("demo", "--db", cliDb).exitCode());
    }

    @AfterAll
    static void stop() {
        server.close();
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
    void check_of_a_library_grade_on_a_shape_is_the_cli_check() throws Exception {
        JsonNode check = ok(server.get("/api/check?grade=DEMO%20NdFeB%2042%2F100&diameter=10mm&length=5mm&temperature=120C"
                + "&opposingField=200kA%2Fm"));
        assertEquals(cli("check", "DEMO NdFeB 42/100", "--diameter", "10mm", "--length", "5mm", "--temperature", "120C",
                "--opposing-field", "200kA/m", "--json", "--db", cliDb), check);
        for (String key : new String[] {"pc", "operatingPoint", "reversibleLossPercent", "irreversibleLossPercent", "kneeMarginH",
            "maxWorkingTemperatureK", "extrapolated", "cautions"}) {
            assertTrue(check.has(key), key);
        }
        assertTrue(check.get("cautions").toString().contains("medical devices"));
    }

    @Test
    void check_of_a_typed_in_grade_on_a_pc_is_the_cli_check() throws Exception {
        JsonNode check = ok(server.get("/api/check?pc=2&" + TYPED + "&temperature=120C&lossLimit=2%25"));
        assertEquals(cli("check", "--pc", "2", "--br", "1.3T", "--mu-rec", "1.05", "--hcj", "1600kA/m", "--knee", "1450kA/m",
                "--alpha", "-0.12%/K", "--beta", "-0.6%/K", "--temperature", "120C", "--loss-limit", "2%", "--json"), check);
        assertEquals(2.0, check.get("pc").asDouble(), 1e-12);
    }

    @Test
    void check_with_an_external_field_is_the_cli_check_and_the_page_says_everything_it_knows() throws Exception {
        JsonNode check = ok(server.get("/api/check?grade=DEMO%20NdFeB%2042%2F100&diameter=10mm&length=5mm&temperature=80C"
                + "&externalField=100kA%2Fm"));
        assertEquals(cli("check", "DEMO NdFeB 42/100", "--diameter", "10mm", "--length", "5mm", "--temperature", "80C",
                "--external-field", "100kA/m", "--json", "--db", cliDb), check);
        assertEquals("external", check.get("fieldConvention").asText());
        assertFalse(check.get("localCheck").isNull());
        HttpResponse<String> page = server.get("/check?grade=DEMO%20NdFeB%2042%2F100&diameter=10mm&length=5mm&temperature=80C"
                + "&externalField=100kA%2Fm");
        assertEquals(200, page.statusCode());
        for (String words : new String[] {"knee (J = 0.9·Br) at this temperature", "margin to the knee", "minimum working temperature",
            "maximum working temperature", "local check", "uniform external field on a free magnet"}) {
            assertTrue(page.body().contains(words), words);
        }
    }

    @Test
    void both_field_conventions_at_once_or_a_typed_in_grade_without_coefficients_are_a_400() throws Exception {
        HttpResponse<String> both = server.get("/api/check?pc=2&" + TYPED + "&temperature=120C&opposingField=1kA%2Fm&externalField=1kA%2Fm");
        assertEquals(400, both.statusCode());
        assertTrue(both.body().contains("give either opposingField (circuit convention) or externalField"), both.body());
        HttpResponse<String> flat = server.get("/api/check?pc=2&br=1.3T&muRec=1.05&hcj=1600kA%2Fm&temperature=120C");
        assertEquals(400, flat.statusCode());
        assertTrue(flat.body().contains("needs alpha and beta"), flat.body());
    }

    @Test
    void select_ranks_the_library_as_the_cli_does() throws Exception {
        JsonNode ranked = ok(server.get("/api/select?pc=2&temperature=100C&minFluxDensity=0.5T&maxLoss=2%25&sort=margin"));
        assertEquals(cli("select", "--pc", "2", "--temperature", "100C", "--min-flux-density", "0.5T", "--max-loss", "2%",
                "--sort", "margin", "--json", "--db", cliDb), ranked);
        assertEquals(12, ranked.size());
        JsonNode smco = ok(server.get("/api/select?width=20mm&depth=10mm&thickness=5mm&onSteel=true&temperature=150C"
                + "&family=sintered%20SmCo"));
        assertEquals(cli("select", "--width", "20mm", "--depth", "10mm", "--thickness", "5mm", "--on-steel", "--temperature", "150C",
                "--family", "sintered SmCo", "--json", "--db", cliDb), smco);
        assertEquals(2, smco.size());
    }

    @Test
    void field_near_a_cylinder_a_ring_and_a_block_is_the_cli_field() throws Exception {
        assertEquals(cli("field", "cylinder", "--diameter", "10mm", "--length", "5mm", "--br", "1.3T", "--at", "0,0,6mm", "--json"),
                ok(server.get("/api/field/cylinder?diameter=10mm&length=5mm&br=1.3T&at=0,0,6mm")));
        assertEquals(cli("field", "ring", "--diameter", "20mm", "--inner-diameter", "8mm", "--length", "5mm", "--br", "1.3T",
                "--at", "2,0,3mm", "--json"),
                ok(server.get("/api/field/ring?diameter=20mm&innerDiameter=8mm&length=5mm&br=1.3T&at=2,0,3mm")));
        assertEquals(cli("field", "block", "--width", "10mm", "--depth", "8mm", "--thickness", "4mm", "--br", "1.2T", "--at", "1,2,3mm",
                "--json"), ok(server.get("/api/field/block?width=10mm&depth=8mm&thickness=4mm&br=1.2T&at=1,2,3mm")));
    }

    @Test
    void field_on_a_blocks_corner_is_null_with_a_reason_as_in_the_cli() throws Exception {
        JsonNode api = ok(server.get("/api/field/block?width=10mm&depth=8mm&thickness=4mm&br=1.2T&at=5,4,2mm"));
        assertEquals(cli("field", "block", "--width", "10mm", "--depth", "8mm", "--thickness", "4mm", "--br", "1.2T", "--at",
                "5,4,2mm", "--json"), api);
        assertTrue(api.get("b").isNull(), api.toString());
        assertTrue(api.get("reason").asText().contains("corner"), api.toString());
    }

    @Test
    void materials_list_the_susceptibility_tables_and_one_material_gives_its_points() throws Exception {
        JsonNode materials = ok(server.get("/api/materials"));
        assertEquals(4, materials.size());
        JsonNode first = materials.get(0);
        assertTrue(first.get("points").asInt() > 0);
        assertEquals(first.get("points").asInt(), first.get("temperaturesK").size());
        String name = first.get("name").asText();
        JsonNode material = ok(server.get("/api/materials/" + name.replace(" ", "%20")));
        assertEquals(name, material.get("name").asText());
        assertEquals(first.get("points").asInt(), material.get("points").size());
        JsonNode point = material.get("points").get(0);
        for (String key : new String[] {"temperatureK", "chi", "form", "density", "molarMass", "source"}) {
            assertTrue(point.has(key), key);
        }
        assertEquals(404, server.get("/api/materials/No%20Such%20Material").statusCode());
    }

    @Test
    void fits_list_the_stored_fits_with_their_parameters() throws Exception {
        JsonNode fits = ok(server.get("/api/fits"));
        assertEquals(1, fits.size());
        JsonNode fit = fits.get(0);
        assertEquals("DEMO NdFeB 42/100", fit.get("grade").asText());
        assertEquals("temperature", fit.get("model").asText());
        assertEquals(-0.12, fit.get("parameters").get("alpha").asDouble(), 1e-12);
        assertEquals("2026-01-02T03:04:05Z", fit.get("fittedAt").asText());
        assertTrue(fit.get("material").isNull());
    }
}
