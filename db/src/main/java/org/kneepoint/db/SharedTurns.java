package org.kneepoint.db;

import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.locks.ReentrantReadWriteLock;

/**
 * One read-write lock per embedded database in this process, shared by every {@link Library} open
 * on it: writers take turns with the write lock, a read of several statements ({@link Snapshot})
 * holds the read lock. H2 fixes each table of a transaction only at its first read, so without this
 * a read could meet one table before a commit and the next after it. A server database needs none:
 * its snapshot covers the whole database.
 */
final class SharedTurns {

    private static final Map<String, ReentrantReadWriteLock> TURNS = new ConcurrentHashMap<>();

    private SharedTurns() {
    }

    /** The lock of the embedded database at this URL, as its driver reports it. */
    static ReentrantReadWriteLock of(String url) {
        return TURNS.computeIfAbsent(url, key -> new ReentrantReadWriteLock());
    }
}
