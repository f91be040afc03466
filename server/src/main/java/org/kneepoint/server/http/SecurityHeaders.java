package org.kneepoint.server.http;

import java.util.function.BiConsumer;

/**
 * The headers every answer carries, errors included: a Content-Security-Policy that allows only this server's own
 * style sheet and images and no script at all, no framing by any page, no guessing of content types, and no Referer
 * sent to other sites. A chart (SVG) opened on its own may keep its inline styles but runs nothing.
 */
public final class SecurityHeaders {

    /** The policy of pages, JSON and errors. */
    public static final String POLICY = "default-src 'self'; frame-ancestors 'none'; base-uri 'none'; object-src 'none'";

    /** The policy of an SVG chart: its own style attributes, nothing else. */
    public static final String CHART_POLICY = "default-src 'none'; style-src 'unsafe-inline'; frame-ancestors 'none'";

    private SecurityHeaders() {
    }

    /** Sets the headers through {@code header} (name, value), with the policy of pages. */
    public static void apply(BiConsumer<String, String> header) {
        header.accept("Content-Security-Policy", POLICY);
        header.accept("X-Frame-Options", "DENY");
        header.accept("X-Content-Type-Options", "nosniff");
        header.accept("Referrer-Policy", "no-referrer");
    }
}
