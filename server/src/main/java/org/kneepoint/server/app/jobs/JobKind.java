package org.kneepoint.server.app.jobs;

import java.util.Locale;

/** What a background job does; its key names it in the JSON of {@code GET /api/jobs/{id}}. */
public enum JobKind {
    /** A Jiles–Atherton fit of a stored loop. */
    JA_FIT,
    /** An import of uploaded files in one transaction. */
    IMPORT;

    public String key() {
        return name().toLowerCase(Locale.ROOT).replace('_', '-');
    }
}
