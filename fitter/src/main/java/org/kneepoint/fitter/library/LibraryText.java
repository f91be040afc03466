package org.kneepoint.fitter.library;

/** Limits on the names the library stores: not blank, and short enough for their database columns. */
final class LibraryText {

    static final int MAX_NAME = 500;
    static final int MAX_FAMILY = 200;

    private LibraryText() {
    }

    static void requireName(String what, String value) {
        requireName(what, value, MAX_NAME);
    }

    static void requireName(String what, String value, int maxLength) {
        if (value == null || value.isBlank()) {
            throw new IllegalArgumentException(what + " must not be empty");
        }
        if (value.length() > maxLength) {
            throw new IllegalArgumentException(what + " is " + value.length() + " characters long; at most " + maxLength + " are kept");
        }
    }
}
