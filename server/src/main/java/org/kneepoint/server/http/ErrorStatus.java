package org.kneepoint.server.http;

import org.kneepoint.fitter.error.KneepointException;

/** The HTTP status of each kind of known failure: bad input 400, not found 404, conflict 409, numerical failure 422, database unreachable 503, damaged stored data 500 (code DAMAGED). */
public final class ErrorStatus {

    private ErrorStatus() {
    }

    /** The status the failure answers with, for the JSON routes and the pages alike. */
    public static int of(KneepointException error) {
        return switch (error.code()) {
            case BAD_INPUT -> 400;
            case NOT_FOUND -> 404;
            case CONFLICT -> 409;
            case NUMERICAL_FAILURE -> 422;
            case UNAVAILABLE -> 503;
            case DAMAGED -> 500;
        };
    }
}
