package org.kneepoint.fitter.library;

/**
 * Checks every library value makes whatever stores it: names not blank, densities and prices in
 * range. How long a text may be is the store's business (the database module's storage limits).
 */
final class LibraryText {

    private LibraryText() {
    }

    static void requireName(String what, String value) {
        if (value == null || value.isBlank()) {
            throw new IllegalArgumentException(what + " must not be empty");
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
