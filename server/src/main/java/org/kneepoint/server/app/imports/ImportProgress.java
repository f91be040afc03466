package org.kneepoint.server.app.imports;

/** Receives the steps of an import, on the importing thread; it should return quickly. */
@FunctionalInterface
public interface ImportProgress {

    void report(ImportStep step);

    /** A listener that ignores every step. */
    static ImportProgress ignore() {
        return step -> { };
    }
}
