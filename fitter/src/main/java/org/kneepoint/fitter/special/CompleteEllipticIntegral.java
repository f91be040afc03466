package org.kneepoint.fitter.special;

import org.kneepoint.fitter.error.BadInputException;

/**
 * Complete elliptic integrals of the first, second and third kind in the parameter m = k²
 * (NIST DLMF 19.2.8: K(m) = ∫₀^{π/2} dθ/√(1 − m·sin²θ), E(m) = ∫₀^{π/2} √(1 − m·sin²θ) dθ,
 * Π(n, m) = ∫₀^{π/2} dθ/[(1 − n·sin²θ)·√(1 − m·sin²θ)]), each written as one call of
 * {@link GeneralizedCompleteEllipticIntegral#cel} with kc = √(1 − m):
 * K = cel(kc, 1, 1, 1), E = cel(kc, 1, 1, kc²), Π = cel(kc, 1 − n, 1, 1) (Bulirsch 1969).
 * K − E = cel(kc, 1, 0, m) is given on its own because the difference cancels for small m.
 */
public final class CompleteEllipticIntegral {

    private CompleteEllipticIntegral() {
    }

    /** K(m), for finite m &lt; 1. */
    public static double firstKind(double m) {
        return GeneralizedCompleteEllipticIntegral.unchecked(complementaryModulus(m), 1.0, 1.0, 1.0);
    }

    /** E(m), for finite m ≤ 1 (E(1) = 1). */
    public static double secondKind(double m) {
        if (m == 1.0) {
            return 1.0;
        }
        double kc = complementaryModulus(m);
        return GeneralizedCompleteEllipticIntegral.unchecked(kc, 1.0, 1.0, kc * kc);
    }

    /** K(m) − E(m) without cancellation, for finite m &lt; 1. */
    public static double firstMinusSecondKind(double m) {
        return GeneralizedCompleteEllipticIntegral.unchecked(complementaryModulus(m), 1.0, 0.0, m);
    }

    /** Π(n, m) for finite n &lt; 1 and m &lt; 1 (characteristic n, parameter m, DLMF 19.2.7). */
    public static double thirdKind(double n, double m) {
        if (!(n < 1.0) || !Double.isFinite(n)) {
            throw new BadInputException("elliptic integral of the third kind: characteristic n must be finite and below 1, got " + n);
        }
        return GeneralizedCompleteEllipticIntegral.unchecked(complementaryModulus(m), 1.0 - n, 1.0, 1.0);
    }

    private static double complementaryModulus(double m) {
        if (!(m < 1.0) || !Double.isFinite(m)) {
            throw new BadInputException("complete elliptic integral: parameter m = k² must be finite and below 1, got " + m);
        }
        return Math.sqrt(1.0 - m);
    }
}
