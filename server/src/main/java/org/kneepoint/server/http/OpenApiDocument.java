package org.kneepoint.server.http;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The OpenAPI 3.0 document of the JSON API, built from the same {@link ApiRoute} list the server
 * registers. Every operation answers JSON (CSV for a CSV export); the schemas of the answers are generated from the
 * result records ({@link ResponseSchemas}); errors share one schema, that of {@link ErrorDocument}.
 */
final class OpenApiDocument {

    private OpenApiDocument() {
    }

    static Map<String, Object> of(List<ApiRoute> routes, String version) {
        Map<String, Object> document = new LinkedHashMap<>();
        document.put("openapi", "3.0.3");
        document.put("info", Map.of("title", "Kneepoint API", "version", version,
                "description", "The material library, characterization, export, import and permeance of Kneepoint. SI units."));
        ResponseSchemas schemas = new ResponseSchemas();
        Map<String, Object> error = Map.of("description", "an error",
                "content", Map.of("application/json", Map.of("schema", schemas.of(ErrorDocument.class))));
        Map<String, Object> paths = new LinkedHashMap<>();
        for (ApiRoute route : routes) {
            @SuppressWarnings("unchecked")
            Map<String, Object> item = (Map<String, Object>) paths.computeIfAbsent(route.path(), path -> new LinkedHashMap<>());
            item.put(route.method(), operation(route, schemas, error));
        }
        document.put("paths", paths);
        document.put("components", Map.of(
                "schemas", schemas.components(),
                "securitySchemes", Map.of("token", Map.of("type", "http", "scheme", "bearer",
                        "description", "Needed for writes when the server is bound to an address other than loopback."))));
        return document;
    }

    private static Map<String, Object> operation(ApiRoute route, ResponseSchemas schemas, Map<String, Object> error) {
        Map<String, Object> operation = new LinkedHashMap<>();
        operation.put("summary", route.summary());
        List<Map<String, Object>> parameters = new ArrayList<>();
        for (ApiRoute.ApiParameter parameter : route.parameters()) {
            Map<String, Object> p = new LinkedHashMap<>();
            p.put("name", parameter.name());
            p.put("in", parameter.in());
            p.put("required", parameter.required());
            p.put("description", parameter.description());
            p.put("schema", Map.of("type", "string"));
            p.put("example", parameter.example());
            parameters.add(p);
        }
        operation.put("parameters", parameters);
        if (route.upload()) {
            operation.put("requestBody", Map.of("required", true, "content", Map.of("multipart/form-data",
                    Map.of("schema", Map.of("type", "object", "properties", Map.of("file",
                            Map.of("type", "array", "items", Map.of("type", "string", "format", "binary"))))))));
        }
        if (route.method().equals("post")) {
            operation.put("security", List.of(Map.of("token", List.of())));
        }
        Map<String, Object> responses = new LinkedHashMap<>();
        responses.put(String.valueOf(route.status()), Map.of("description", "success", "content", content(route.result(), schemas)));
        responses.put("4XX", error);
        responses.put("500", error);
        operation.put("responses", responses);
        return operation;
    }

    /** The media types and schemas of a route's answer, the schemas made from its result record. */
    private static Map<String, Object> content(ApiRoute.ApiResult result, ResponseSchemas schemas) {
        Map<String, Object> one = result.form() == ApiRoute.ApiResult.Form.OPENAPI
                ? Map.of("type", "object", "description", "an OpenAPI 3.0 document") : schemas.of(result.type());
        Map<String, Object> list = Map.of("type", "array", "items", one);
        return switch (result.form()) {
            case ONE, OPENAPI -> Map.of("application/json", Map.of("schema", one));
            case LIST -> Map.of("application/json", Map.of("schema", list));
            case ONE_OR_LIST -> Map.of("application/json", Map.of("schema", Map.of("oneOf", List.of(one, list),
                    "description", "the one result, or a list with one per curve")));
            case CSV_OR_JSON -> {
                Map<String, Object> media = new LinkedHashMap<>();
                media.put("text/csv", Map.of("schema", Map.of("type", "string")));
                media.put("application/json", Map.of("schema", one));
                yield media;
            }
        };
    }
}
