package org.kneepoint.fitter.units;

/**
 * The magnetic constant μ0, defined once for the whole program.
 *
 * <p>Value: CODATA 2018 recommended value, 1.256 637 062 12(19) × 10⁻⁶ N/A² (NIST, "Fundamental
 * Physical Constants — Extensive Listing", 2018). It differs from 4π·10⁻⁷ N/A² by 5.5·10⁻¹⁰ relative.
 */
public final class MagneticConstant {

    /** μ0 in N/A² (= T·m/A), CODATA 2018. */
    public static final double MU0 = 1.25663706212e-6;

    private MagneticConstant() {
    }
}
