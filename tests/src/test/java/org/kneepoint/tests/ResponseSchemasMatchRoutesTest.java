package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The schemas of {@code /api/openapi.json}, generated from the result records, describe what the routes really answer:
 * every key of every object a route answers is named by its schema (nested objects and list items included), and
 * every key the schema requires is there. The cases are those of {@link RoutesMatchCliTest} and the reading routes
 * without a command.
 */
@ExtendWith(SharedDemoServer.class)
class ResponseSchemasMatchRoutesTest {

    private static final String NDFEB = "DEMO%20NdFeB%2042%2F100";

    private static SharedDemoServer.Fixture fixture;
    private static JsonNode document;

    @BeforeAll
    static void fixture(SharedDemoServer.Fixture shared) throws Exception {
        fixture = shared;
        document = RunningServer.json(shared.server().get("/api/openapi.json"));
    }

    static Stream<Arguments> cases() {
        List<Arguments> cases = new ArrayList<>();
        RoutesMatchCliTest.cases().forEach(arguments -> cases.add(Arguments.of(arguments.get()[0], arguments.get()[1])));
        cases.add(Arguments.of("GET /api/grades/{name}", "/api/grades/" + NDFEB));
        cases.add(Arguments.of("GET /api/materials", "/api/materials"));
        cases.add(Arguments.of("GET /api/materials/{name}", "/api/materials/DEMO%20paramagnetic%20salt"));
        cases.add(Arguments.of("GET /api/fits", "/api/fits"));
        cases.add(Arguments.of("GET /api/fit/knee", "/api/fit/knee?grade=" + NDFEB));
        cases.add(Arguments.of("GET /api/grades/{name}/curve", "/api/grades/" + NDFEB + "/curve?temperature=20C"));
        return cases.stream();
    }

    @ParameterizedTest(name = "{0}: {1}")
    @MethodSource("cases")
    void every_key_the_route_answers_is_named_by_its_documented_schema(String route, String request) throws Exception {
        HttpResponse<String> response = fixture.server().get(request);
        assertEquals(200, response.statusCode(), response.body());
        assertConforms(route, RunningServer.json(response));
    }

    @Test
    void a_dry_run_import_answers_its_documented_report() throws Exception {
        String file = "# grade: Invented Schema Check\n# family: sintered NdFeB\n# temperature: 20 C\nH [kA/m],J [T]\n0,1.2\n-900,1.1\n-1100,0\n";
        HttpResponse<String> response = fixture.server().upload("/api/import?dryRun=true", "schema.csv", file.getBytes(StandardCharsets.UTF_8));
        assertEquals(200, response.statusCode(), response.body());
        assertConforms("POST /api/import", RunningServer.json(response));
    }

    @Test
    void an_error_answers_the_documented_error_schema() throws Exception {
        HttpResponse<String> response = fixture.server().get("/api/grades/no%20such%20grade");
        assertEquals(404, response.statusCode());
        List<String> problems = new ArrayList<>();
        conforms(RunningServer.json(response), operation("GET /api/grades/{name}").get("responses").get("4XX").get("content")
                .get("application/json").get("schema"), "$", problems);
        assertEquals(List.of(), problems);
    }

    @Test
    void the_check_checks_keys_a_schema_does_not_name_and_keys_it_requires() {
        List<String> problems = new ArrayList<>();
        JsonNode schema = com.fasterxml.jackson.databind.node.JsonNodeFactory.instance.objectNode().put("$ref", "#/components/schemas/FieldDocument");
        JsonNode answer = com.fasterxml.jackson.databind.node.JsonNodeFactory.instance.objectNode().put("at", 1.0).put("extra", 2.0);
        conforms(answer, schema, "$", problems);
        assertTrue(problems.contains("$: key 'extra' is not in the schema"), problems.toString());
        assertTrue(problems.contains("$: required key 'b' is missing"), problems.toString());
    }

    private static void assertConforms(String route, JsonNode answer) {
        JsonNode responses = operation(route).get("responses");
        JsonNode success = responses.has("200") ? responses.get("200") : responses.get("202");
        List<String> problems = new ArrayList<>();
        conforms(answer, success.get("content").get("application/json").get("schema"), "$", problems);
        assertEquals(List.of(), problems, route);
    }

    private static JsonNode operation(String route) {
        String[] methodAndPath = route.split(" ", 2);
        return document.get("paths").get(methodAndPath[1]).get(methodAndPath[0].toLowerCase(Locale.ROOT));
    }

    /** Adds to {@code problems} each key of {@code value} its schema does not name and each required key it lacks. */
    private static void conforms(JsonNode value, JsonNode schema, String where, List<String> problems) {
        if (schema.has("$ref")) {
            String name = schema.get("$ref").asText().substring("#/components/schemas/".length());
            conforms(value, document.get("components").get("schemas").get(name), where, problems);
            return;
        }
        if (schema.has("allOf")) {
            conforms(value, schema.get("allOf").get(0), where, problems);
            return;
        }
        if (value.isNull()) {
            return;
        }
        if (schema.has("oneOf")) {
            for (JsonNode alternative : schema.get("oneOf")) {
                if (value.isArray() == "array".equals(alternative.path("type").asText())) {
                    conforms(value, alternative, where, problems);
                    return;
                }
            }
            problems.add(where + ": no alternative of oneOf fits");
            return;
        }
        if (value.isArray()) {
            assertEquals("array", schema.path("type").asText(), where);
            int index = 0;
            for (JsonNode item : value) {
                conforms(item, schema.get("items"), where + "[" + index++ + "]", problems);
            }
        } else if (value.isObject() && schema.has("properties")) {
            JsonNode properties = schema.get("properties");
            value.properties().forEach(entry -> {
                if (properties.has(entry.getKey())) {
                    conforms(entry.getValue(), properties.get(entry.getKey()), where + "." + entry.getKey(), problems);
                } else {
                    problems.add(where + ": key '" + entry.getKey() + "' is not in the schema");
                }
            });
            schema.path("required").forEach(key -> {
                if (!value.has(key.asText())) {
                    problems.add(where + ": required key '" + key.asText() + "' is missing");
                }
            });
        }
    }
}
