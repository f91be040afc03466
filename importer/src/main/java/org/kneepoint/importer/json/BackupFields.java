package org.kneepoint.importer.json;

import com.fasterxml.jackson.databind.JsonNode;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;

/**
 * Typed access to the fields of one element of a backup document ({@code curves[3]}), refusing
 * missing or mistyped fields by their path, and non-finite numbers.
 */
final class BackupFields {

    private final String source;
    private final String path;

    BackupFields(String source, String path) {
        this.source = source;
        this.path = path;
    }

    /** The fields of the element at {@code elementPath}. */
    BackupFields at(String elementPath) {
        return new BackupFields(source, elementPath);
    }

    /** The path of this element in the document ({@code curves[3]}). */
    String path() {
        return path;
    }

    /** Where a field of this element is, for messages. */
    InputLocation place(String field) {
        return InputLocation.cell(source, 0, 0, path.isEmpty() ? field : path + "." + field);
    }

    /** Where this element is, for messages. */
    InputLocation element() {
        return path.isEmpty() ? InputLocation.of(source) : InputLocation.cell(source, 0, 0, path);
    }

    JsonNode array(JsonNode parent, String field) {
        JsonNode node = parent.path(field);
        if (!node.isArray()) {
            throw missing(field, "an array");
        }
        return node;
    }

    String text(JsonNode parent, String field) {
        JsonNode node = parent.path(field);
        if (!node.isTextual()) {
            throw missing(field, "a string");
        }
        return node.asText();
    }

    /** A string naming one constant of {@code type}, in lower case ("intrinsic") or as declared ("J"). */
    <E extends Enum<E>> E choice(JsonNode parent, String field, Class<E> type) {
        String text = text(parent, field);
        for (E constant : type.getEnumConstants()) {
            if (constant.name().equalsIgnoreCase(text)) {
                return constant;
            }
        }
        java.util.List<String> names = java.util.Arrays.stream(type.getEnumConstants())
                .map(constant -> constant.name().length() == 1 ? constant.name() : constant.name().toLowerCase(java.util.Locale.ROOT)).toList();
        throw new BadInputException(place(field), "expected one of " + names + ", got '" + org.kneepoint.importer.input.Excerpt.of(text) + "'");
    }

    String optionalText(JsonNode parent, String field) {
        JsonNode node = parent.path(field);
        return node.isNull() || node.isMissingNode() ? null : text(parent, field);
    }

    int count(JsonNode parent, String field) {
        JsonNode node = parent.path(field);
        if (!node.canConvertToInt() || !node.isIntegralNumber() || node.asInt() < 0) {
            throw missing(field, "a count (a whole number, 0 or more)");
        }
        return node.asInt();
    }

    double number(JsonNode parent, String field) {
        JsonNode node = parent.path(field);
        if (!node.isNumber() || !Double.isFinite(node.asDouble())) {
            throw missing(field, "a finite number");
        }
        return node.asDouble();
    }

    Double optionalNumber(JsonNode parent, String field) {
        JsonNode node = parent.path(field);
        return node.isNull() || node.isMissingNode() ? null : number(parent, field);
    }

    double[] numbers(JsonNode parent, String field) {
        JsonNode node = array(parent, field);
        double[] values = new double[node.size()];
        for (int i = 0; i < values.length; i++) {
            if (!node.get(i).isNumber() || !Double.isFinite(node.get(i).asDouble())) {
                throw missing(field + "[" + i + "]", "a finite number");
            }
            values[i] = node.get(i).asDouble();
        }
        return values;
    }

    private BadInputException missing(String field, String expected) {
        return new BadInputException(place(field), "expected " + expected);
    }
}
