package org.kneepoint.fitter.error;

/** Something named in the request (a grade, a curve, a fit) does not exist. */
public final class NotFoundException extends KneepointException {

    private static final long serialVersionUID = 1L;

    public NotFoundException(String message) {
        super(message);
    }

    @Override
    public ErrorCode code() {
        return ErrorCode.NOT_FOUND;
    }
}
