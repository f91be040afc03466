package org.kneepoint.db;

import org.kneepoint.fitter.error.ErrorCode;
import org.kneepoint.fitter.error.KneepointException;

/**
 * The library's database cannot be reached, dropped the connection mid-request, or is held by
 * another program. Nothing of the request was kept (every write is one transaction); the same
 * request may be sent again once the database is back. Code {@link ErrorCode#UNAVAILABLE}: exit 4
 * on the command line, HTTP 503 with {@code Retry-After}.
 */
public final class UnavailableException extends KneepointException {

    private static final long serialVersionUID = 1L;

    public UnavailableException(String message, Throwable cause) {
        super(message, cause);
    }

    @Override
    public ErrorCode code() {
        return ErrorCode.UNAVAILABLE;
    }
}
