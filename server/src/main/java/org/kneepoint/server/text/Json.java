package org.kneepoint.server.text;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;

/** The program's JSON writer: indented, nulls kept (a null means "not reached"), keys in insertion order. */
public final class Json {

    private static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private Json() {
    }

    public static String write(Object value) {
        try {
            return MAPPER.writeValueAsString(value);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("cannot write JSON for " + value.getClass().getSimpleName(), e);
        }
    }

    /** Parses a JSON document (a stored fit's parameters) into a tree that {@link #write} writes back as it was. */
    public static JsonNode read(String json) {
        try {
            return MAPPER.readTree(json);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("stored JSON does not parse: " + e.getOriginalMessage(), e);
        }
    }
}
