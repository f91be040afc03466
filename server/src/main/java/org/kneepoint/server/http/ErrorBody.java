package org.kneepoint.server.http;

import org.kneepoint.server.app.Json;

/**
 * The body of an error answer: {@code {"error": {"code": "...", "message": "..."}}}, or the escaped HTML page for a
 * browser that asked for a page outside {@code /api}.
 */
record ErrorBody(String contentType, String text) {

    /** The answer for a request to {@code path} (null: unknown) accepting {@code accept} (null: anything). */
    static ErrorBody of(String path, String accept, int status, String code, String message, ErrorPage page) {
        if (path != null && !path.startsWith("/api/") && accept != null && accept.contains("text/html")) {
            return new ErrorBody("text/html; charset=utf-8", page.render(status, message));
        }
        return new ErrorBody("application/json", Json.write(ErrorDocument.of(code, message)));
    }

    /** The answer to a request that Jetty refused by itself with {@code status}: a fixed code and message per status. */
    static ErrorBody of(String path, String accept, int status, ErrorPage page) {
        return switch (status) {
            case 400 -> of(path, accept, status, "BAD_REQUEST", "the request is malformed (its address, a header or its body)", page);
            case 404 -> of(path, accept, status, "NOT_FOUND", "no such page or route", page);
            case 405 -> of(path, accept, status, "METHOD_NOT_ALLOWED", "this method is not served here", page);
            case 413 -> of(path, accept, status, "TOO_LARGE", "the request body is over its limit", page);
            case 414 -> of(path, accept, status, "URI_TOO_LONG", "the request's address is too long", page);
            case 431 -> of(path, accept, status, "HEADERS_TOO_LARGE", "the request's headers are too large", page);
            case 500 -> of(path, accept, status, "INTERNAL", "internal error; the server log has the details", page);
            default -> of(path, accept, status, status < 500 ? "BAD_REQUEST" : "UNAVAILABLE",
                    status < 500 ? "the request cannot be served (HTTP " + status + ")" : "the server cannot answer now (HTTP " + status + ")", page);
        };
    }
}
