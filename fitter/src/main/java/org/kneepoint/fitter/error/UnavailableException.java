package org.kneepoint.fitter.error;

/**
 * The library's database cannot be reached or dropped the connection mid-request. Nothing of the
 * request was kept (every write is one transaction); the same request may be sent again once the
 * database is back.
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
