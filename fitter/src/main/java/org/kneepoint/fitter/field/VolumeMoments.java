package org.kneepoint.fitter.field;

/**
 * The scaled volume moments ∫x^p·y^q·z^s dV / (p!·q!·s!·R^(p+q+s+3)) (p, q, s even) of the magnets
 * whose far field {@link MultipoleExpansion} sums. Block with half-edges hx, hy, hz:
 * ∫x^p dx over [−hx, hx] = 2·hx^(p+1)/(p + 1), and likewise in y and z. Disc of radius a:
 * ∫x^p·y^q dA = 2π·(p − 1)!!·(q − 1)!!/(p + q)!! · a^(p+q+2)/(p + q + 2) (polar coordinates and
 * Wallis's integrals of cos^p·sin^q over a full turn); a cylinder multiplies it by the z factor,
 * a ring is the outer cylinder less the inner one.
 */
final class VolumeMoments {

    private VolumeMoments() {
    }

    /** A block with the given half-edges, scaled by its enclosing radius. */
    static MultipoleExpansion.Moments block(double hx, double hy, double hz, double enclosingRadius) {
        return (p, q, s) -> edge(p, hx / enclosingRadius) * edge(q, hy / enclosingRadius) * edge(s, hz / enclosingRadius);
    }

    /** A solid cylinder of radius a and half-length b, scaled by its enclosing radius. */
    static MultipoleExpansion.Moments cylinder(double radius, double halfLength, double enclosingRadius) {
        return (p, q, s) -> disc(p, q, radius / enclosingRadius) * edge(s, halfLength / enclosingRadius);
    }

    /** A ring of outer and inner radius and half-length b, scaled by its enclosing radius. */
    static MultipoleExpansion.Moments ring(double outer, double inner, double halfLength, double enclosingRadius) {
        return (p, q, s) -> (disc(p, q, outer / enclosingRadius) - disc(p, q, inner / enclosingRadius))
                * edge(s, halfLength / enclosingRadius);
    }

    /** 2·h^(p+1)/((p + 1)·p!): the one-dimensional moment over [−h, h] divided by p!. */
    private static double edge(int p, double half) {
        return 2.0 * Math.pow(half, p + 1) / ((p + 1) * factorial(p));
    }

    /** The disc moment divided by p!·q!. */
    private static double disc(int p, int q, double radius) {
        double angular = 2.0 * Math.PI * doubleFactorial(p - 1) * doubleFactorial(q - 1) / doubleFactorial(p + q);
        return angular * Math.pow(radius, p + q + 2) / ((p + q + 2) * factorial(p) * factorial(q));
    }

    private static double factorial(int n) {
        double product = 1.0;
        for (int k = 2; k <= n; k++) {
            product *= k;
        }
        return product;
    }

    /** n!! with (−1)!! = 0!! = 1. */
    private static double doubleFactorial(int n) {
        double product = 1.0;
        for (int k = n; k > 1; k -= 2) {
            product *= k;
        }
        return product;
    }
}
