package org.kneepoint.server.http;

/** Renders an error as an HTML page for a browser that asked for a page (not for {@code /api}). */
@FunctionalInterface
public interface ErrorPage {

    /** The whole page for this status and message; the message is not escaped yet. */
    String render(int status, String message);
}
