package org.kneepoint.server.web;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;
import java.util.UUID;
import org.kneepoint.server.app.elements.ElementCheckDocument;
import org.kneepoint.server.app.elements.ElementMap;

/**
 * The last few element checks of the Check page under random keys, so that their map can be drawn in another plane
 * and served as a chart without the files again: the summary document and the thinned map only (never the elements
 * themselves). At most {@value #KEPT} are kept; the oldest goes first.
 */
final class KeptElementChecks {

    private static final int KEPT = 8;

    /** A kept check: its summary and its map. */
    record Kept(ElementCheckDocument document, ElementMap map) {
    }

    private final Map<String, Kept> kept = new LinkedHashMap<>();

    synchronized String keep(Kept check) {
        String key = UUID.randomUUID().toString();
        kept.put(key, check);
        while (kept.size() > KEPT) {
            kept.remove(kept.keySet().iterator().next());
        }
        return key;
    }

    synchronized Optional<Kept> get(String key) {
        return Optional.ofNullable(key == null ? null : kept.get(key));
    }
}
