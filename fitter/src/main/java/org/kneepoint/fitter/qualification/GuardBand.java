package org.kneepoint.fitter.qualification;

import java.util.EnumMap;
import java.util.Map;

/**
 * The expanded measurement uncertainty of each quantity, as a share of the measured value (0.005
 * for 0.5 %); a quantity not named has none. With it a value at or above its lower limit passes
 * only when it stays at or above the limit after the uncertainty is taken off (an acceptance limit
 * one guard band w = U inside the tolerance limit: JCGM 106:2012, guarded acceptance; ILAC-G8:09/2019
 * §4, whose "conditional pass" we call inconclusive; docs/references.md §11); otherwise the result is
 * inconclusive. Below the limit itself a value fails.
 */
public record GuardBand(Map<SpecifiedQuantity, Double> shares) {

    public GuardBand {
        for (Map.Entry<SpecifiedQuantity, Double> entry : shares.entrySet()) {
            double share = entry.getValue();
            if (!(share >= 0 && share < 1)) {
                throw new IllegalArgumentException("the uncertainty of " + entry.getKey().key()
                        + " must be at least 0 % and below 100 %, got " + 100 * share + " %");
            }
        }
        shares = shares.isEmpty() ? Map.of() : Map.copyOf(new EnumMap<>(shares));
    }

    /** No uncertainty on any quantity: a value passes when it reaches its limit. */
    public static GuardBand none() {
        return new GuardBand(Map.of());
    }

    /** The expanded uncertainty of {@code value} of {@code quantity}, in its own unit. */
    public double uncertainty(SpecifiedQuantity quantity, double value) {
        return shares.getOrDefault(quantity, 0.0) * Math.abs(value);
    }
}
