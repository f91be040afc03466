package org.kneepoint.server.http;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The OpenAPI 3.0 document of the JSON API, built from the same {@link ApiRoute} list the server
 * registers. Every operation answers JSON (CSV for a CSV export); errors share one schema.
 */
final class OpenApiDocument {

    private OpenApiDocument() {
    }

    static Map<String, Object> of(List<ApiRoute> routes, String version) {
        Map<String, Object> document = new LinkedHashMap<>();
        document.put("openapi", "3.0.3");
        document.put("info", Map.of("title", "Kneepoint API", "version", version,
                "description", "The material library, characterization, export, import and permeance of Kneepoint. SI units."));
        Map<String, Object> paths = new LinkedHashMap<>();
        for (ApiRoute route : routes) {
            @SuppressWarnings("unchecked")
            Map<String, Object> item = (Map<String, Object>) paths.computeIfAbsent(route.path(), path -> new LinkedHashMap<>());
            item.put(route.method(), operation(route));
        }
        document.put("paths", paths);
        document.put("components", Map.of(
                "schemas", Map.of("Error", errorSchema()),
                "securitySchemes", Map.of("token", Map.of("type", "http", "scheme", "bearer",
                        "description", "Needed for writes when the server is bound to an address other than loopback."))));
        return document;
    }

    private static Map<String, Object> operation(ApiRoute route) {
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
        Map<String, Object> error = Map.of("description", "an error",
                "content", Map.of("application/json", Map.of("schema", Map.of("$ref", "#/components/schemas/Error"))));
        Map<String, Object> responses = new LinkedHashMap<>();
        responses.put(String.valueOf(route.status()), Map.of("description", "success", "content", Map.of("application/json", Map.of())));
        responses.put("4XX", error);
        responses.put("500", error);
        operation.put("responses", responses);
        return operation;
    }

    private static Map<String, Object> errorSchema() {
        Map<String, Object> inner = Map.of("type", "object", "required", List.of("code", "message"),
                "properties", Map.of("code", Map.of("type", "string"), "message", Map.of("type", "string")));
        return Map.of("type", "object", "required", List.of("error"), "properties", Map.of("error", inner));
    }
}
