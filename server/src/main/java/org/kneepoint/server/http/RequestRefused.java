package org.kneepoint.server.http;

/** A request the server refuses before handling it: a missing token, a foreign origin, a body over its limit. */
final class RequestRefused extends RuntimeException {

    private static final long serialVersionUID = 1L;

    private final int status;
    private final String code;

    RequestRefused(int status, String code, String message) {
        super(message);
        this.status = status;
        this.code = code;
    }

    int status() {
        return status;
    }

    String code() {
        return code;
    }
}
