package org.kneepoint.fitter.error;

/** A computation failed to converge or left its domain; the message says which and with what input. */
public final class NumericalFailureException extends KneepointException {

    private static final long serialVersionUID = 1L;

    public NumericalFailureException(String message) {
        super(message);
    }

    @Override
    public ErrorCode code() {
        return ErrorCode.NUMERICAL_FAILURE;
    }
}
