package org.kneepoint.importer.json;

import com.fasterxml.jackson.databind.JsonNode;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;

/** Typed access to the fields of a backup document, refusing missing or mistyped fields by name. */
final class BackupFields {

    private final String source;

    BackupFields(String source) {
        this.source = source;
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

    String optionalText(JsonNode parent, String field) {
        JsonNode node = parent.path(field);
        return node.isNull() || node.isMissingNode() ? null : text(parent, field);
    }

    double number(JsonNode parent, String field) {
        JsonNode node = parent.path(field);
        if (!node.isNumber()) {
            throw missing(field, "a number");
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
            if (!node.get(i).isNumber()) {
                throw missing(field + "[" + i + "]", "a number");
            }
            values[i] = node.get(i).asDouble();
        }
        return values;
    }

    private BadInputException missing(String field, String expected) {
        return new BadInputException(InputLocation.cell(source, 0, 0, field), "expected " + expected);
    }
}
