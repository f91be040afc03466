package org.kneepoint.db;

import org.kneepoint.fitter.error.ErrorCode;
import org.kneepoint.fitter.error.KneepointException;

/**
 * Stored values no longer match the checksum written with them (a damaged database file or a
 * changed row): the message names the grade and curve, or the material, so that nobody is given a
 * wrong number. Code {@link ErrorCode#DAMAGED}: exit 2 on the command line, HTTP 500 (the server's
 * stored data are at fault, not the request, and asking again will not help). Restore the library
 * from a backup made before the damage, or import the named data again.
 */
public final class DamagedDataException extends KneepointException {

    private static final long serialVersionUID = 1L;

    public DamagedDataException(String message) {
        super(message);
    }

    /** The one line for damage found in {@code what} (e.g. "the normal curve at 293.15 K of grade 'X' does not match its checksum"). */
    static String message(String what) {
        return "the library is damaged: " + what + "; no value of it was given. Run 'kneepoint verify' for everything damaged, "
                + "then restore a backup made before the damage or import the data again";
    }

    @Override
    public ErrorCode code() {
        return ErrorCode.DAMAGED;
    }
}
