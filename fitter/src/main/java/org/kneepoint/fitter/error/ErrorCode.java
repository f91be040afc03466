package org.kneepoint.fitter.error;

/** Stable codes of the error vocabulary; never renumber or rename, other programs read them. */
public enum ErrorCode {
    /** The input is malformed, out of range or of the wrong unit. */
    BAD_INPUT,
    /** Something named in the request does not exist. */
    NOT_FOUND,
    /** The request contradicts what is already stored. */
    CONFLICT,
    /** A computation failed to converge or left its domain. */
    NUMERICAL_FAILURE,
    /** A service the program depends on (the library's database) cannot be reached; nothing was written, the request may be retried. */
    UNAVAILABLE,
    /** Stored data failed their checksum: the library is damaged where the message says; no value was given. */
    DAMAGED
}
