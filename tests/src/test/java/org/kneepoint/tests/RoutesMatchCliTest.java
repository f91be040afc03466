package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.net.http.HttpResponse;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Every JSON route answers exactly the document its command prints with {@code --json} for the same request (one
 * result record behind both, written by one JSON writer). The list of cases must cover every route of
 * {@code /api/openapi.json}; the few routes without a command are named, with the reason.
 */
@ExtendWith(SharedDemoServer.class)
class RoutesMatchCliTest {

    private static final ObjectMapper JSON = new ObjectMapper();
    private static final String NDFEB = "DEMO%20NdFeB%2042%2F100";
    private static final String TYPED = "br=1.3T&muRec=1.05&hcj=1600kA%2Fm&knee=1450kA%2Fm&alpha=-0.12%25%2FK&beta=-0.6%25%2FK";

    /**
     * Routes not compared here: the API's own description and the background jobs of a running server have no command;
     * the materials, fits and one-grade listings have none either. The two writes (an import, a grade's details) have
     * commands ({@code import --json}, {@code edit --json}) but are not compared here: each needs a library of its own.
     * The element check's upload is compared with {@code check-elements --json} in {@code ElementsApiTest}.
     */
    private static final Set<String> NO_COMMAND = Set.of("GET /api/openapi.json", "GET /api/jobs/{id}", "POST /api/jobs/import",
            "POST /api/jobs/ja-fit", "GET /api/materials", "GET /api/materials/{name}", "GET /api/fits", "GET /api/grades/{name}",
            "POST /api/import", "POST /api/grades/{name}/details", "POST /api/check/elements");

    private static SharedDemoServer.Fixture fixture;

    @BeforeAll
    static void fixture(SharedDemoServer.Fixture shared) {
        fixture = shared;
    }

    /** A route (as the OpenAPI document names it), a request to it, and the command line of the same request. */
    static Stream<Arguments> cases() {
        List<Arguments> cases = new ArrayList<>();
        add(cases, "GET /api/grades", "/api/grades", "grades", "--json", "@db");
        add(cases, "GET /api/grades/{name}/curve", "/api/grades/" + NDFEB + "/curve?temperature=120C",
                "curve", "DEMO NdFeB 42/100", "--temperature", "120C", "--json", "@db");
        add(cases, "GET /api/grades/{name}/export", "/api/grades/" + NDFEB + "/export?temperature=20C&format=json&shifted=true",
                "export", "DEMO NdFeB 42/100", "--temperature", "20C", "--format", "json", "--shifted", "@db");
        add(cases, "GET /api/permeance/cylinder", "/api/permeance/cylinder?diameter=10mm&length=5mm&innerDiameter=4mm&onSteel=true",
                "permeance", "cylinder", "--diameter", "10mm", "--length", "5mm", "--inner-diameter", "4mm", "--on-steel", "--json");
        add(cases, "GET /api/permeance/block", "/api/permeance/block?width=20mm&depth=10mm&thickness=5mm",
                "permeance", "block", "--width", "20mm", "--depth", "10mm", "--thickness", "5mm", "--json");
        add(cases, "GET /api/permeance/spheroid", "/api/permeance/spheroid?diameter=10mm&length=10mm",
                "permeance", "spheroid", "--diameter", "10mm", "--length", "10mm", "--json");
        add(cases, "GET /api/check", "/api/check?grade=" + NDFEB + "&width=20mm&depth=20mm&thickness=3mm&temperature=120C"
                + "&opposingField=200kA%2Fm", "check", "DEMO NdFeB 42/100", "--width", "20mm", "--depth", "20mm", "--thickness", "3mm",
                "--temperature", "120C", "--opposing-field", "200kA/m", "--json", "@db");
        add(cases, "GET /api/check", "/api/check?pc=2&" + TYPED + "&temperature=120C&lossLimit=2%25", "check", "--pc", "2", "--br",
                "1.3T", "--mu-rec", "1.05", "--hcj", "1600kA/m", "--knee", "1450kA/m", "--alpha", "-0.12%/K", "--beta", "-0.6%/K",
                "--temperature", "120C", "--loss-limit", "2%", "--json");
        add(cases, "GET /api/check", "/api/check?grade=" + NDFEB + "&diameter=10mm&length=5mm&temperature=120C&tolerance=br%3D%C2%B12%25"
                + "&tolerance=length%3D%C2%B10.05mm&tolerance=temperature%3D-5K..%2B5K&tolerance=hcj%3D-5%25..%2B0%25&samples=500&seed=3",
                "check", "DEMO NdFeB 42/100", "--diameter", "10mm", "--length", "5mm", "--temperature", "120C", "--tolerance", "br=±2%",
                "--tolerance", "length=±0.05mm", "--tolerance", "temperature=-5K..+5K", "--tolerance", "hcj=-5%..+0%", "--samples", "500",
                "--seed", "3", "--json", "@db");
        add(cases, "GET /api/sweep", "/api/sweep?grade=" + NDFEB + "&diameter=10mm&length=5mm&from=20C&to=140C&step=10K"
                + "&opposingField=100kA%2Fm", "sweep", "DEMO NdFeB 42/100", "--diameter", "10mm", "--length", "5mm", "--from", "20C",
                "--to", "140C", "--step", "10K", "--opposing-field", "100kA/m", "--json", "@db");
        add(cases, "GET /api/duty", "/api/duty?grade=" + NDFEB + "&diameter=10mm&length=5mm&steps=20C%3A0%2C150C%3A300kA%2Fm%2C20C%3A0",
                "duty", "DEMO NdFeB 42/100", "--diameter", "10mm", "--length", "5mm", "--steps", "20C:0,150C:300kA/m,20C:0", "--json",
                "@db");
        add(cases, "GET /api/select", "/api/select?pc=2&temperature=100C&minFluxDensity=0.5T&maxLoss=2%25&sort=price",
                "select", "--pc", "2", "--temperature", "100C", "--min-flux-density", "0.5T", "--max-loss", "2%", "--sort", "price",
                "--json", "@db");
        add(cases, "GET /api/field/cylinder", "/api/field/cylinder?diameter=10mm&length=5mm&br=1.3T&at=0,0,6mm",
                "field", "cylinder", "--diameter", "10mm", "--length", "5mm", "--br", "1.3T", "--at", "0,0,6mm", "--json");
        add(cases, "GET /api/field/ring", "/api/field/ring?diameter=20mm&innerDiameter=8mm&length=5mm&br=1.3T&at=2,0,3mm",
                "field", "ring", "--diameter", "20mm", "--inner-diameter", "8mm", "--length", "5mm", "--br", "1.3T", "--at", "2,0,3mm",
                "--json");
        add(cases, "GET /api/field/block", "/api/field/block?width=10mm&depth=8mm&thickness=4mm&br=1.2T&at=1,2,3mm",
                "field", "block", "--width", "10mm", "--depth", "8mm", "--thickness", "4mm", "--br", "1.2T", "--at", "1,2,3mm", "--json");
        add(cases, "GET /api/fit/knee", "/api/fit/knee?grade=" + NDFEB + "&temperature=20C",
                "fit", "knee", "DEMO NdFeB 42/100", "--temperature", "20C", "--json", "@db");
        add(cases, "GET /api/fit/temperature", "/api/fit/temperature?grade=DEMO%20SmCo%2028%2F200",
                "fit", "temperature", "DEMO SmCo 28/200", "--json", "@db");
        add(cases, "GET /api/fit/curie-weiss", "/api/fit/curie-weiss?material=DEMO%20paramagnetic%20salt",
                "fit", "curie-weiss", "DEMO paramagnetic salt", "--json", "@db");
        return cases.stream();
    }

    private static void add(List<Arguments> cases, String route, String request, String... command) {
        cases.add(Arguments.of(route, request, command));
    }

    @ParameterizedTest(name = "{0}: {1}")
    @MethodSource("cases")
    void the_route_answers_what_the_command_prints_with_json(String route, String request, String[] command) throws Exception {
        HttpResponse<String> response = fixture.server().get(request);
        assertEquals(200, response.statusCode(), response.body());
        assertTrue(response.headers().firstValue("Content-Type").orElse("").startsWith("application/json"), route);
        List<String> args = new ArrayList<>();
        for (String arg : command) {
            if (arg.equals("@db")) {
                args.add("--db");
                args.add(fixture.cliDb());
            } else {
                args.add(arg);
            }
        }
        CliRun run = CliRun.of(args.toArray(String[]::new));
        assertEquals(0, run.exitCode(), run.err());
        assertEquals(JSON.readTree(run.out()), RunningServer.json(response), route);
    }

    @Test
    void the_cases_cover_every_route_of_the_api() throws Exception {
        JsonNode document = RunningServer.json(fixture.server().get("/api/openapi.json"));
        Set<String> routes = new TreeSet<>();
        document.get("paths").properties().forEach(path -> path.getValue().properties().stream().map(java.util.Map.Entry::getKey)
                .forEach(method -> routes.add(method.toUpperCase(java.util.Locale.ROOT) + " " + path.getKey())));
        Set<String> covered = new TreeSet<>(NO_COMMAND);
        cases().forEach(arguments -> covered.add((String) arguments.get()[0]));
        assertEquals(routes, covered, "each route is compared with its command, or named in NO_COMMAND with the reason");
    }
}
