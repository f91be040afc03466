package org.kneepoint.server.app;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JavaType;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.SerializerProvider;
import com.fasterxml.jackson.databind.introspect.BeanPropertyDefinition;
import com.fasterxml.jackson.databind.module.SimpleModule;
import com.fasterxml.jackson.databind.ser.std.StdSerializer;
import java.io.IOException;
import java.util.List;

/**
 * The program's one JSON writer, for {@code --json}, {@code /api/...} and stored fit parameters: records become
 * objects with their components as keys in declaration order, nulls are kept (a null means "not reached"), and a
 * number that is not finite (NaN, ±Infinity) is written as {@code null}, never as a string or a non-standard token.
 */
public final class Json {

    private static final ObjectMapper COMPACT = new ObjectMapper().registerModule(finiteNumbers());
    private static final ObjectMapper MAPPER = COMPACT.copy().enable(SerializationFeature.INDENT_OUTPUT);

    private Json() {
    }

    /** The value as an indented JSON document. */
    public static String write(Object value) {
        return write(MAPPER, value);
    }

    /** The value as JSON on one line. */
    public static String compact(Object value) {
        return write(COMPACT, value);
    }

    /** The value as a tree, as {@link #write} would write it (for comparing documents). */
    public static JsonNode tree(Object value) {
        return MAPPER.valueToTree(value);
    }

    /**
     * The properties this writer writes for a class (a record: its components, in order), as Jackson's own
     * introspection sees them, with their types, inclusion and annotations; the OpenAPI schemas are made from them.
     */
    public static List<BeanPropertyDefinition> properties(JavaType type) {
        return MAPPER.getSerializationConfig().introspect(type).findProperties();
    }

    /** The Jackson type of a class. */
    public static JavaType type(Class<?> type) {
        return MAPPER.constructType(type);
    }

    /** Parses a JSON document (a stored fit's parameters) into a tree that {@link #write} writes back as it was. */
    public static JsonNode read(String json) {
        try {
            return MAPPER.readTree(json);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("stored JSON does not parse: " + e.getOriginalMessage(), e);
        }
    }

    private static String write(ObjectMapper mapper, Object value) {
        try {
            return mapper.writeValueAsString(value);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("cannot write JSON for " + value.getClass().getSimpleName(), e);
        }
    }

    private static SimpleModule finiteNumbers() {
        StdSerializer<Double> finite = new StdSerializer<>(Double.class) {
            @Override
            public void serialize(Double value, JsonGenerator generator, SerializerProvider provider) throws IOException {
                if (Double.isFinite(value)) {
                    generator.writeNumber(value);
                } else {
                    generator.writeNull();
                }
            }
        };
        return new SimpleModule("finite-numbers").addSerializer(Double.class, finite).addSerializer(double.class, finite);
    }
}
