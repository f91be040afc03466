package org.kneepoint.server.http;

/**
 * The body of every error the API answers: {@code {"error": {"code", "message"}}}, the code one of
 * {@code BAD_INPUT}, {@code NOT_FOUND}, {@code CONFLICT}, ... and the message one line naming what was wrong and where.
 */
record ErrorDocument(Detail error) {

    /** The error's code and its one-line message. */
    record Detail(String code, String message) {
    }

    static ErrorDocument of(String code, String message) {
        return new ErrorDocument(new Detail(code, message));
    }
}
