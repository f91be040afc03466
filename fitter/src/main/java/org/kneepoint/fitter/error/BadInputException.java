package org.kneepoint.fitter.error;

import java.util.Optional;

/**
 * Bad input: the message says what was wrong and what was expected; the optional location says
 * where (file, line, column or field), so a reader can go straight to it.
 */
public final class BadInputException extends KneepointException {

    private static final long serialVersionUID = 1L;

    private final transient InputLocation location;

    public BadInputException(String problem) {
        super(problem);
        this.location = null;
    }

    public BadInputException(InputLocation location, String problem) {
        super(location.describe() + ": " + problem);
        this.location = location;
    }

    /** Where the problem is, when known. */
    public Optional<InputLocation> location() {
        return Optional.ofNullable(location);
    }

    @Override
    public ErrorCode code() {
        return ErrorCode.BAD_INPUT;
    }
}
