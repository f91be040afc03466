package org.kneepoint.server.http;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import org.junit.jupiter.api.Test;
import org.kneepoint.server.app.Json;
import org.kneepoint.server.app.design.FieldDocument;
import org.kneepoint.server.app.fits.KneeFitDocument;
import org.kneepoint.server.app.grades.GradeDocument;

/** The OpenAPI schemas come from the result records, key for key, as the one JSON writer writes them. */
class ResponseSchemasTest {

    private static JsonNode component(ResponseSchemas schemas, String name) {
        return Json.tree(schemas.components()).get(name);
    }

    private static Set<String> keys(JsonNode node) {
        Set<String> keys = new TreeSet<>();
        node.fieldNames().forEachRemaining(keys::add);
        return keys;
    }

    @Test
    void a_record_is_an_object_with_its_components_as_keys_and_a_reference_to_it() {
        ResponseSchemas schemas = new ResponseSchemas();
        assertEquals("#/components/schemas/FieldDocument", schemas.of(FieldDocument.class).get("$ref"));
        JsonNode field = component(schemas, "FieldDocument");
        assertEquals("object", field.get("type").asText());
        assertEquals(Set.of("at", "b", "reason"), keys(field.get("properties")));
        assertEquals("array", field.get("properties").get("at").get("type").asText());
        assertEquals("number", field.get("properties").get("at").get("items").get("type").asText());
    }

    @Test
    void a_key_left_out_when_null_is_not_required_and_the_others_are() {
        JsonNode field = component(schemaOf(FieldDocument.class), "FieldDocument");
        List<String> required = new ArrayList<>();
        field.get("required").forEach(name -> required.add(name.asText()));
        assertEquals(List.of("at", "b"), required);
        assertTrue(field.get("properties").get("b").get("nullable").asBoolean());
    }

    @Test
    void unwrapped_parameters_are_keys_of_the_document_itself() {
        JsonNode knee = component(schemaOf(KneeFitDocument.class), "KneeFitDocument").get("properties");
        for (String key : List.of("temperatureK", "br", "muRec", "hcj", "kneeWidth", "kneeShape", "muLine", "switchingWidth",
                "rationalBend", "hk", "standardErrors", "hRange", "approximate")) {
            assertTrue(knee.has(key), key);
        }
        assertFalse(knee.has("parameters"));
        assertEquals("integer", knee.get("iterations").get("type").asText());
        assertEquals("boolean", knee.get("approximate").get("type").asText());
        assertFalse(knee.get("hk").has("nullable"), "a primitive is never null");
    }

    @Test
    void nested_records_are_named_after_their_enclosing_record_so_that_names_never_clash() {
        ResponseSchemas schemas = schemaOf(KneeFitDocument.class);
        schemas.of(GradeDocument.class);
        assertTrue(schemas.components().containsKey("KneeFitDocument.StandardErrors"), schemas.components().keySet().toString());
        assertTrue(schemas.components().containsKey("GradeDocument.StoredCurve"));
        JsonNode errors = component(schemas, "KneeFitDocument").get("properties").get("standardErrors");
        assertEquals("#/components/schemas/KneeFitDocument.StandardErrors", errors.get("allOf").get(0).get("$ref").asText());
    }

    @Test
    void a_class_that_is_not_a_record_has_no_schema() {
        assertThrows(IllegalArgumentException.class, () -> new ResponseSchemas().of(StringBuilder.class));
    }

    @Test
    void every_reference_in_the_openapi_document_names_a_schema_it_defines() {
        JsonNode document = Json.tree(OpenApiDocument.of(HttpApi.routes(null, null, null), "test"));
        Set<String> references = new TreeSet<>();
        collectReferences(document, references);
        Set<String> defined = new TreeSet<>();
        document.get("components").get("schemas").fieldNames().forEachRemaining(name -> defined.add("#/components/schemas/" + name));
        assertFalse(references.isEmpty());
        assertEquals(defined, references);
    }

    @Test
    void every_route_documents_the_schema_of_its_success() {
        JsonNode document = Json.tree(OpenApiDocument.of(HttpApi.routes(null, null, null), "test"));
        document.get("paths").properties().forEach(path -> path.getValue().properties().forEach(operation -> {
            JsonNode responses = operation.getValue().get("responses");
            JsonNode success = responses.has("200") ? responses.get("200") : responses.get("202");
            JsonNode schema = success.get("content").get("application/json").get("schema");
            assertTrue(schema.has("$ref") || schema.has("type") || schema.has("oneOf"), path.getKey() + ": " + schema);
            assertEquals("#/components/schemas/ErrorDocument",
                    responses.get("4XX").get("content").get("application/json").get("schema").get("$ref").asText());
        }));
    }

    private static ResponseSchemas schemaOf(Class<?> type) {
        ResponseSchemas schemas = new ResponseSchemas();
        schemas.of(type);
        return schemas;
    }

    private static void collectReferences(JsonNode node, Set<String> references) {
        if (node.isObject()) {
            node.properties().forEach(entry -> {
                if (entry.getKey().equals("$ref")) {
                    references.add(entry.getValue().asText());
                } else {
                    collectReferences(entry.getValue(), references);
                }
            });
        } else if (node.isArray()) {
            node.forEach(item -> collectReferences(item, references));
        }
    }
}
