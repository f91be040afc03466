package org.kneepoint.server.web;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;
import java.util.UUID;
import org.kneepoint.server.http.Uploads;

/**
 * Uploads checked on the Import page and waiting for the user to confirm them, under a random
 * key. At most a few are kept; the oldest is dropped (and its files deleted) when more arrive.
 */
final class ImportStaging implements AutoCloseable {

    private static final int KEPT = 4;

    private final Map<String, Uploads> waiting = new LinkedHashMap<>();

    synchronized String keep(Uploads uploads) {
        String key = UUID.randomUUID().toString();
        waiting.put(key, uploads);
        while (waiting.size() > KEPT) {
            String oldest = waiting.keySet().iterator().next();
            waiting.remove(oldest).close();
        }
        return key;
    }

    /** The uploads kept under this key, removed from the staging; the caller closes them. */
    synchronized Optional<Uploads> take(String key) {
        return Optional.ofNullable(key == null ? null : waiting.remove(key));
    }

    @Override
    public synchronized void close() {
        waiting.values().forEach(Uploads::close);
        waiting.clear();
    }
}
