package org.kneepoint.server.http;

import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.annotation.JsonUnwrapped;
import com.fasterxml.jackson.databind.JavaType;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.introspect.BeanPropertyDefinition;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.kneepoint.server.app.Json;

/**
 * OpenAPI 3.0 schemas made from the result records by Jackson's own introspection of the one JSON writer
 * ({@link Json#properties}), so a schema names exactly the keys the writer writes: a record becomes an object schema in
 * {@code components/schemas} (named by its class, nested ones as {@code Outer.Inner}) referenced by {@code $ref};
 * {@code @JsonUnwrapped} components are inlined; a key left out when null ({@code @JsonInclude(NON_NULL)}) is not
 * required; any key that is not a primitive may be null (null means "not reached" or "not determined").
 */
final class ResponseSchemas {

    private final Map<String, Object> components = new TreeMap<>();

    /** The schemas of every record referred to so far, by name. */
    Map<String, Object> components() {
        return components;
    }

    /** The schema of a value of this class, registering the records it uses. */
    Map<String, Object> of(Class<?> type) {
        return of(Json.type(type));
    }

    private Map<String, Object> of(JavaType type) {
        Class<?> raw = type.getRawClass();
        if (type.isArrayType() || type.isCollectionLikeType()) {
            return object("type", "array", "items", of(type.getContentType()));
        }
        if (type.isMapLikeType()) {
            return object("type", "object", "additionalProperties", of(type.getContentType()));
        }
        if (raw == double.class || raw == Double.class || raw == float.class || raw == Float.class) {
            return object("type", "number");
        }
        if (raw == int.class || raw == Integer.class || raw == long.class || raw == Long.class) {
            return object("type", "integer");
        }
        if (raw == boolean.class || raw == Boolean.class) {
            return object("type", "boolean");
        }
        if (raw == String.class || raw.isEnum()) {
            return object("type", "string");
        }
        if (raw == Object.class || JsonNode.class.isAssignableFrom(raw)) {
            return object("description", "any JSON value: a document of its own, described where it is named");
        }
        if (!raw.isRecord()) {
            throw new IllegalArgumentException("no schema for " + raw.getName() + ": results are records");
        }
        String name = name(raw);
        if (!components.containsKey(name)) {
            components.put(name, Map.of());
            Map<String, Object> properties = new LinkedHashMap<>();
            List<String> required = new ArrayList<>();
            describe(type, properties, required);
            Map<String, Object> schema = object("type", "object", "properties", properties);
            if (!required.isEmpty()) {
                schema.put("required", required);
            }
            components.put(name, schema);
        }
        return object("$ref", "#/components/schemas/" + name);
    }

    /** Adds the properties of a record (and of the records it unwraps) with the keys that are always written. */
    private void describe(JavaType type, Map<String, Object> properties, List<String> required) {
        for (BeanPropertyDefinition property : Json.properties(type)) {
            JavaType propertyType = property.getPrimaryType();
            if (property.getAccessor().hasAnnotation(JsonUnwrapped.class)) {
                describe(propertyType, properties, required);
                continue;
            }
            Map<String, Object> schema = new LinkedHashMap<>(of(propertyType));
            if (!propertyType.isPrimitive()) {
                schema = schema.containsKey("$ref") ? object("allOf", List.of(schema), "nullable", true) : with(schema, "nullable", true);
            }
            properties.put(property.getName(), schema);
            JsonInclude.Include inclusion = property.findInclusion().getValueInclusion();
            if (inclusion != JsonInclude.Include.NON_NULL) {
                required.add(property.getName());
            }
        }
    }

    private static Map<String, Object> with(Map<String, Object> schema, String key, Object value) {
        Map<String, Object> copy = new LinkedHashMap<>(schema);
        copy.put(key, value);
        return copy;
    }

    /** {@code KneeFitDocument.StandardErrors} for a nested record, the simple name otherwise. */
    private static String name(Class<?> type) {
        return type.getEnclosingClass() == null ? type.getSimpleName() : name(type.getEnclosingClass()) + "." + type.getSimpleName();
    }

    private static Map<String, Object> object(Object... keysAndValues) {
        Map<String, Object> map = new LinkedHashMap<>();
        for (int i = 0; i < keysAndValues.length; i += 2) {
            map.put((String) keysAndValues[i], keysAndValues[i + 1]);
        }
        return map;
    }
}
