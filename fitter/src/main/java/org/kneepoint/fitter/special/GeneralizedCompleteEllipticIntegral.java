package org.kneepoint.fitter.special;

import org.kneepoint.fitter.error.BadInputException;

/**
 * Bulirsch's generalized complete elliptic integral
 * cel(kc, p, c, s) = ∫₀^{π/2} (c·cos²φ + s·sin²φ) / [(cos²φ + p·sin²φ)·√(cos²φ + kc²·sin²φ)] dφ.
 *
 * <p>One routine covers K, E, Π and every combination the magnet fields need (N. Derby,
 * S. Olbert, Am. J. Phys. 78, 229, 2010). Algorithm: R. Bulirsch, "Numerical calculation of
 * elliptic integrals and elliptic functions. III", Numer. Math. 13, 305–315 (1969); for p &lt; 0 it
 * returns the Cauchy principal value. The iteration converges quadratically, so stopping at a
 * relative step of 1e-8 leaves an error near the double rounding level.
 */
public final class GeneralizedCompleteEllipticIntegral {

    private static final double STEP_TOLERANCE = 1.0e-8;

    private GeneralizedCompleteEllipticIntegral() {
    }

    /**
     * cel(kc, p, c, s).
     *
     * @param kc complementary modulus, finite and non-zero (kc² = 1 − m)
     * @param p  finite; zero only together with s = 0 (otherwise the integral diverges)
     * @param c  finite
     * @param s  finite
     * @return the integral
     */
    public static double cel(double kc, double p, double c, double s) {
        if (kc == 0.0 || !Double.isFinite(kc)) {
            throw new BadInputException("cel: complementary modulus kc must be finite and non-zero, got " + kc);
        }
        if ((p == 0.0 && s != 0.0) || !Double.isFinite(p) || !Double.isFinite(c) || !Double.isFinite(s)) {
            throw new BadInputException("cel: p, c, s must be finite and p non-zero unless s = 0, got p = " + p
                    + ", c = " + c + ", s = " + s);
        }
        return unchecked(kc, p, c, s);
    }

    /** cel without argument checks, for inner loops whose arguments are valid by construction. */
    static double unchecked(double kc, double p, double c, double s) {
        double k = Math.abs(kc);
        double em = 1.0;
        double pp;
        double cc;
        double ss;
        if (p > 0.0) {
            pp = Math.sqrt(p);
            cc = c;
            ss = s / pp;
        } else {
            double f = kc * kc;
            double q = 1.0 - f;
            double g = 1.0 - p;
            f = f - p;
            q = q * (s - c * p);
            pp = Math.sqrt(f / g);
            cc = (c - s) / g;
            ss = -q / (g * g * pp) + cc * pp;
        }
        double f = cc;
        cc = cc + ss / pp;
        double g = k / pp;
        ss = 2.0 * (ss + f * g);
        pp = g + pp;
        g = em;
        em = k + em;
        double kk = k;
        while (Math.abs(g - k) > g * STEP_TOLERANCE) {
            k = 2.0 * Math.sqrt(kk);
            kk = k * em;
            f = cc;
            cc = cc + ss / pp;
            g = kk / pp;
            ss = 2.0 * (ss + f * g);
            pp = g + pp;
            g = em;
            em = k + em;
        }
        return 0.5 * Math.PI * (ss + cc * em) / (em * (em + pp));
    }
}
