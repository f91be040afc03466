package org.kneepoint.fitter.error;

/**
 * Root of the program's error vocabulary. Each subclass has a stable {@link ErrorCode}; the CLI
 * and HTTP layers map codes to exit codes and status codes in one place each.
 */
public abstract class KneepointException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    protected KneepointException(String message) {
        super(message);
    }

    protected KneepointException(String message, Throwable cause) {
        super(message, cause);
    }

    /** The stable code of this kind of error. */
    public abstract ErrorCode code();
}
