package org.kneepoint.fitter.field;

/**
 * B outside the sphere that encloses a magnet uniformly magnetized along +z, by the multipole
 * expansion of its scalar potential, summed term by term so that nothing cancels however far the
 * point is. With ψ(r) = (1/4π)∫ dV'/|r − r'| the Newtonian potential of the magnet's volume, the
 * magnetic scalar potential is Φ = −M·∂ψ/∂z and H = M·∇(∂ψ/∂z) (J. D. Jackson, Classical
 * Electrodynamics, 3rd ed., Wiley 1999, §5.9, Φ_M = −(1/4π)∇·∫M(r')/|r − r'| d³r'; equation
 * number from memory). Taylor-expanding 1/|r − r'| about the centre (Jackson §4.1, carried to
 * every order) gives, for a body symmetric under x → −x, y → −y, z → −z (only even moments):
 * B_i = (Br/4π)·Σ_β (m_β/β!)·D_{β + e_z + e_i}(r), with m_β = ∫x^p·y^q·z^s dV the volume moments,
 * β = (p, q, s), β! = p!·q!·s!, and D_α = ∂^α(1/r). The term β = 0 is the point dipole of moment
 * M·V. The D_α at a unit vector u come from the recurrence n·D_α = −(2n − 1)·Σ_j α_j·u_j·D_{α−e_j}
 * − (n − 1)·Σ_j α_j·(α_j − 1)·D_{α−2e_j}, n = |α| (derived here from r²·∂_j(1/r) = −x_j/r by
 * Leibniz's rule; checked against the closed forms of the dipole and quadrupole fields), and
 * D_α(r) = |r|^−(n+1)·D_α(u). Terms fall as (R/|r|)^n, R the enclosing radius; the sum stops when
 * the next one is below 1e-17 of the first.
 */
final class MultipoleExpansion {

    /**
     * The expansion is used from this many enclosing radii outwards, the closed forms inside it: there
     * the closed forms have lost no more than about 1e-11 to cancellation, and the expansion needs
     * terms only up to order 12, so a field map that reaches past it stays fast.
     */
    static final double SWITCH_RADII = 25.0;

    private static final int HIGHEST_ORDER = 30;
    private static final double TRUNCATION = 1e-17;

    /** Volume moments of the magnet, scaled: ∫x^p·y^q·z^s dV / (p!·q!·s!·R^(p+q+s+3)), p, q, s even. */
    interface Moments {
        double scaled(int p, int q, int s);
    }

    private MultipoleExpansion() {
    }

    /** Whether (x, y, z) is far enough from a magnet of enclosing radius R for the expansion. */
    static boolean applies(double enclosingRadius, double x, double y, double z) {
        double limit = SWITCH_RADII * enclosingRadius;
        return x * x + y * y + z * z >= limit * limit;
    }

    /** Writes B (tesla) at (x, y, z), which must lie outside {@link #SWITCH_RADII} enclosing radii. */
    static void fluxDensityInto(double remanence, double enclosingRadius, Moments moments, double x, double y,
            double z, double[] target, int offset) {
        double distance = Math.sqrt(x * x + y * y + z * z);
        double ratio = enclosingRadius / distance;
        int order = 0;
        while (order < HIGHEST_ORDER && Math.pow(ratio, order + 2) >= TRUNCATION) {
            order += 2;
        }
        int size = order + 3;
        double[] d = derivatives(x / distance, y / distance, z / distance, size);
        double bx = 0.0;
        double by = 0.0;
        double bz = 0.0;
        for (int n = order; n >= 0; n -= 2) {
            double sx = 0.0;
            double sy = 0.0;
            double sz = 0.0;
            for (int p = 0; p <= n; p += 2) {
                for (int q = 0; q <= n - p; q += 2) {
                    int s = n - p - q;
                    double m = moments.scaled(p, q, s);
                    sx += m * d[index(p + 1, q, s + 1)];
                    sy += m * d[index(p, q + 1, s + 1)];
                    sz += m * d[index(p, q, s + 2)];
                }
            }
            double power = Math.pow(ratio, n + 3);
            bx += power * sx;
            by += power * sy;
            bz += power * sz;
        }
        double scale = remanence / (4.0 * Math.PI);
        target[offset] = scale * bx;
        target[offset + 1] = scale * by;
        target[offset + 2] = scale * bz;
    }

    /** D_α(u) = ∂^α(1/r) at the unit vector u for every |α| &lt; size, by the recurrence of the class comment. */
    private static double[] derivatives(double ux, double uy, double uz, int size) {
        double[] d = new double[index(0, 0, size)];
        d[0] = 1.0;
        for (int n = 1; n < size; n++) {
            for (int p = 0; p <= n; p++) {
                for (int q = 0; q <= n - p; q++) {
                    int s = n - p - q;
                    double first = 0.0;
                    double second = 0.0;
                    if (p > 0) {
                        first += p * ux * d[index(p - 1, q, s)];
                        second += p > 1 ? p * (p - 1) * d[index(p - 2, q, s)] : 0.0;
                    }
                    if (q > 0) {
                        first += q * uy * d[index(p, q - 1, s)];
                        second += q > 1 ? q * (q - 1) * d[index(p, q - 2, s)] : 0.0;
                    }
                    if (s > 0) {
                        first += s * uz * d[index(p, q, s - 1)];
                        second += s > 1 ? s * (s - 1) * d[index(p, q, s - 2)] : 0.0;
                    }
                    d[index(p, q, s)] = -((2 * n - 1) * first + (n - 1) * second) / n;
                }
            }
        }
        return d;
    }

    /**
     * Position of (p, q, s) when the multi-indices are stored order by order (n = p + q + s): the
     * n(n + 1)(n + 2)/6 of lower order first, then by p and q within the order.
     */
    private static int index(int p, int q, int s) {
        int n = p + q + s;
        return n * (n + 1) * (n + 2) / 6 + p * (2 * n + 3 - p) / 2 + q;
    }
}
