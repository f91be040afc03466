package org.kneepoint.server.app;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.List;

/** The keys of a document as the one JSON writer writes them, in order. */
public final class JsonKeys {

    private JsonKeys() {
    }

    /** The keys of the object {@code value} becomes, in the order written. */
    public static List<String> of(Object value) {
        return of(Json.tree(value));
    }

    /** The keys of a JSON object, in order. */
    public static List<String> of(JsonNode node) {
        List<String> keys = new ArrayList<>();
        node.fieldNames().forEachRemaining(keys::add);
        return keys;
    }
}
