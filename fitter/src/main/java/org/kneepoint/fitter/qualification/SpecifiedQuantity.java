package org.kneepoint.fitter.qualification;

import java.util.Arrays;
import java.util.Locale;
import java.util.Optional;
import org.kneepoint.fitter.curve.Characterization;

/**
 * A quantity a specification can set a lower limit on, with the key it has in JSON, in the
 * database and in {@code --uncertainty}, and how to read it from a curve's characterization.
 */
public enum SpecifiedQuantity {
    BR("br"),
    HCJ("hcj"),
    BH_MAX("bhMax"),
    HK("hk"),
    SQUARENESS("squareness"),
    HCB("hcb");

    private final String key;

    SpecifiedQuantity(String key) {
        this.key = key;
    }

    /** The key in JSON and in {@code --uncertainty}: br, hcj, bhMax, hk, squareness, hcb. */
    public String key() {
        return key;
    }

    /** The quantity of a key, ignoring case ("bhmax" is {@link #BH_MAX}). */
    public static Optional<SpecifiedQuantity> ofKey(String text) {
        String wanted = text.strip().toLowerCase(Locale.ROOT);
        return Arrays.stream(values()).filter(quantity -> quantity.key.toLowerCase(Locale.ROOT).equals(wanted)).findFirst();
    }

    /** The quantity's value in the characterization (SI; a ratio for squareness), or null when the curve does not reach it. */
    public Double of(Characterization characterization) {
        return switch (this) {
            case BR -> characterization.br();
            case HCJ -> characterization.hcj();
            case BH_MAX -> characterization.bhMax();
            case HK -> characterization.hk();
            case SQUARENESS -> characterization.squareness();
            case HCB -> characterization.hcb();
        };
    }
}
