package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class OpenApiDocumentTest {

    @TempDir
    Path folder;

    @Test
    void the_document_lists_exactly_the_registered_api_routes_with_their_path_parameters() throws Exception {
        try (RunningServer server = RunningServer.withDemo(folder, null)) {
            JsonNode document = RunningServer.json(server.get("/api/openapi.json"));
            assertEquals("3.0.3", document.get("openapi").asText());
            Set<String> documented = new TreeSet<>();
            document.get("paths").properties().forEach(path -> path.getValue().fieldNames().forEachRemaining(method -> {
                documented.add(method.toUpperCase(Locale.ROOT) + " " + path.getKey());
                Set<String> declared = new TreeSet<>();
                path.getValue().get(method).get("parameters").forEach(p -> {
                    if (p.get("in").asText().equals("path")) {
                        declared.add(p.get("name").asText());
                    }
                });
                assertEquals(pathParameters(path.getKey()), declared, path.getKey());
            }));
            Set<String> registered = new TreeSet<>();
            for (String route : server.application.routes()) {
                if ((route.startsWith("GET /api/") || route.startsWith("POST /api/"))) {
                    registered.add(route);
                }
            }
            assertEquals(registered, documented);
            assertTrue(documented.contains("POST /api/import"));
        }
    }

    private static Set<String> pathParameters(String path) {
        Set<String> names = new TreeSet<>();
        Matcher matcher = Pattern.compile("\\{(\\w+)}").matcher(path);
        while (matcher.find()) {
            names.add(matcher.group(1));
        }
        return names;
    }
}
