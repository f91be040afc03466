package org.kneepoint.fitter.library;

/** Limits on the names the library stores: not blank, and short enough for their database columns. */
final class LibraryText {

    static final int MAX_NAME = 500;
    static final int MAX_FAMILY = 200;
    static final int MAX_SUPPLIER = 1000;
    static final int MAX_NOTES = 100_000;

    private LibraryText() {
    }

    static void requireName(String what, String value) {
        requireName(what, value, MAX_NAME);
    }

    static void requireName(String what, String value, int maxLength) {
        if (value == null || value.isBlank()) {
            throw new IllegalArgumentException(what + " must not be empty");
        }
        requireLength(what, value, maxLength);
    }

    /** A free text (may be null) no longer than its column. */
    static void requireLength(String what, String value, int maxLength) {
        if (value != null && value.length() > maxLength) {
            throw new IllegalArgumentException(what + " is " + value.length() + " characters long; at most " + maxLength + " are kept");
        }
    }
}
