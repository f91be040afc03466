package org.kneepoint.fitter.library;

/** Limits on what the library stores: names not blank, texts short enough for their columns, densities and prices in range. */
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

    /** A density (may be null) that is positive and finite. */
    static void requireDensity(Double density) {
        if (density != null && !(density > 0 && Double.isFinite(density))) {
            throw new IllegalArgumentException("density must be positive and finite, got " + density);
        }
    }

    /** A price (may be null) that is zero or positive and finite. */
    static void requirePrice(Double price) {
        if (price != null && !(price >= 0 && Double.isFinite(price))) {
            throw new IllegalArgumentException("price must be zero or positive and finite, got " + price);
        }
    }
}
