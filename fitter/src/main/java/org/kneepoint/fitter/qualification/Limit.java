package org.kneepoint.fitter.qualification;

/**
 * What a specification says of one quantity: a lower limit, a typical value, or both (SI; a
 * ratio for squareness). Every value is positive and finite, and a typical value is not below the
 * minimum.
 */
public record Limit(SpecifiedQuantity quantity, Double minimum, Double typical) {

    public Limit {
        if (quantity == null) {
            throw new IllegalArgumentException("a limit needs its quantity");
        }
        if (minimum == null && typical == null) {
            throw new IllegalArgumentException("a limit of " + quantity.key() + " needs a minimum or a typical value");
        }
        requirePositive(quantity, "minimum", minimum);
        requirePositive(quantity, "typical value", typical);
        if (minimum != null && typical != null && typical < minimum) {
            throw new IllegalArgumentException("the typical " + quantity.key() + " (" + typical + ") is below its minimum (" + minimum + ")");
        }
        if (quantity == SpecifiedQuantity.SQUARENESS && (minimum != null && minimum > 1 || typical != null && typical > 1)) {
            throw new IllegalArgumentException("squareness Hk/HcJ is at most 1");
        }
    }

    private static void requirePositive(SpecifiedQuantity quantity, String what, Double value) {
        if (value != null && !(value > 0 && Double.isFinite(value))) {
            throw new IllegalArgumentException("the " + what + " of " + quantity.key() + " must be positive and finite, got " + value);
        }
    }

    /** This limit with the other's values where the other gives one. */
    public Limit overriddenBy(Limit other) {
        return new Limit(quantity, other.minimum != null ? other.minimum : minimum, other.typical != null ? other.typical : typical);
    }
}
