package org.kneepoint.fitter.model.ja;

/**
 * The Langevin function L(x) = coth(x) − 1/x and its derivative L'(x) = 1/x² − 1/sinh²(x), the
 * shape of the Jiles–Atherton anhysteretic (Jiles, Atherton, J. Magn. Magn. Mater. 61, 48, 1986).
 *
 * <p>Near 0 the closed forms cancel catastrophically, so for |x| &lt; 0.1 the Taylor series
 * L(x) = x/3 − x³/45 + 2x⁵/945 − x⁷/4725 + 2x⁹/93555 is used (truncation below 1e-15 relative
 * there). Elsewhere both use one exponential, e = exp(−2|x|): coth|x| = (1 + e)/(1 − e) and
 * 1/sinh²|x| = 4e/(1 − e)², which never overflows.
 */
public final class LangevinFunction {

    /** Below this |x| the series is used. */
    static final double SERIES_LIMIT = 0.1;

    private LangevinFunction() {
    }

    /** L(x); odd, tends to ±1 − 1/x for large |x| and to x/3 near 0. */
    public static double value(double x) {
        double ax = Math.abs(x);
        if (ax < SERIES_LIMIT) {
            double x2 = x * x;
            return x * (1.0 / 3 + x2 * (-1.0 / 45 + x2 * (2.0 / 945 + x2 * (-1.0 / 4725 + x2 * 2.0 / 93555))));
        }
        double e = Math.exp(-2 * ax);
        double magnitude = (1 + e) / (1 - e) - 1 / ax;
        return x < 0 ? -magnitude : magnitude;
    }

    /** L'(x); even, 1/3 at 0, tends to 1/x² for large |x|. */
    public static double derivative(double x) {
        double ax = Math.abs(x);
        if (ax < SERIES_LIMIT) {
            double x2 = x * x;
            return 1.0 / 3 + x2 * (-1.0 / 15 + x2 * (2.0 / 189 + x2 * (-1.0 / 675 + x2 * 2.0 / 10395)));
        }
        double e = Math.exp(-2 * ax);
        double oneMinus = 1 - e;
        return 1 / (ax * ax) - 4 * e / (oneMinus * oneMinus);
    }
}
