package org.kneepoint.fitter.error;

/** The request contradicts what is stored (a duplicate name, an import already made). */
public final class ConflictException extends KneepointException {

    private static final long serialVersionUID = 1L;

    public ConflictException(String message) {
        super(message);
    }

    @Override
    public ErrorCode code() {
        return ErrorCode.CONFLICT;
    }
}
