package org.kneepoint.server.app;

import java.util.List;

/**
 * The documents of a use case that answers one result per curve (a characterization, a knee fit): the one document
 * itself when there is one, else the list, as {@code --json} and the API have always written them.
 */
public final class OneOrMany {

    private OneOrMany() {
    }

    /** The only document, or the list of them. */
    public static Object of(List<?> documents) {
        return documents.size() == 1 ? documents.get(0) : documents;
    }
}
