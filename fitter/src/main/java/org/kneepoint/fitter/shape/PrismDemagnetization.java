package org.kneepoint.fitter.shape;

/**
 * Closed forms of the demagnetizing factors of a rectangular prism −a ≤ x ≤ a, −b ≤ y ≤ b,
 * −c ≤ z ≤ c (half edges) uniformly magnetized along z.
 *
 * <ul>
 * <li>Nm: A. Aharoni, "Demagnetizing factors for rectangular ferromagnetic prisms", J. Appl. Phys. 83,
 * 3432 (1998), Eq. (1) (docs/references.md §2a).</li>
 * <li>Nf: derived here. The mid-plane average of the solid angle of one face (2a × 2b, distance
 * h = c) is a fourfold integral of h/r³ over two parallel rectangles; its double antiderivative in the
 * offsets (x, y) is G(x, y) = xy·atan(xy/(h·r)) + x·h·asinh(x/√(y² + h²)) + y·h·asinh(y/√(x² + h²)) − h·r,
 * r = √(x² + y² + h²), so 4ab·⟨Ω⟩ = 4·[G(2a, 2b) − G(2a, 0) − G(0, 2b) + G(0, 0)] and Nf = ⟨Ω⟩/(2π).</li>
 * <li>N0 = (2/π)·atan(ab/(c·√(a² + b² + c²))): the two faces seen from the centre, each subtending the
 * solid angle 4·atan(ab/(c·R)) of a rectangle on its axis.</li>
 * </ul>
 */
final class PrismDemagnetization {

    private PrismDemagnetization() {
    }

    static DemagnetizingFactors of(double a, double b, double c) {
        return new DemagnetizingFactors(magnetometric(a, b, c), fluxmetric(a, b, c), centrePoint(a, b, c));
    }

    /** Aharoni (1998) Eq. (1): Dz of the prism with half edges a, b, c. */
    static double magnetometric(double a, double b, double c) {
        double a2 = a * a;
        double b2 = b * b;
        double c2 = c * c;
        double r = Math.sqrt(a2 + b2 + c2);
        double rab = Math.sqrt(a2 + b2);
        double rbc = Math.sqrt(b2 + c2);
        double rac = Math.sqrt(a2 + c2);
        double abc = a * b * c;
        double sum = (b2 - c2) / (2 * b * c) * logRatio(r, a)
                + (a2 - c2) / (2 * a * c) * logRatio(r, b)
                - b / (2 * c) * logRatio(rab, a)
                - a / (2 * c) * logRatio(rab, b)
                + c / (2 * a) * logRatio(rbc, b)
                + c / (2 * b) * logRatio(rac, a)
                + 2 * Math.atan(a * b / (c * r))
                + (a2 * a + b2 * b - 2 * c2 * c) / (3 * abc)
                + (a2 + b2 - 2 * c2) / (3 * abc) * r
                + c / (a * b) * (rac + rbc)
                - (rab * rab * rab + rbc * rbc * rbc + rac * rac * rac) / (3 * abc);
        return sum / Math.PI;
    }

    /** Mid-plane (fluxmetric) factor, derived as in the class comment. */
    static double fluxmetric(double a, double b, double c) {
        double h = c;
        double sum = antiderivative(2 * a, 2 * b, h) - antiderivative(2 * a, 0, h) - antiderivative(0, 2 * b, h)
                + antiderivative(0, 0, h);
        return sum / (2 * Math.PI * a * b);
    }

    /** Centre-point factor from the solid angle of the two faces. */
    static double centrePoint(double a, double b, double c) {
        return 2 / Math.PI * Math.atan(a * b / (c * Math.sqrt(a * a + b * b + c * c)));
    }

    private static double antiderivative(double x, double y, double h) {
        double r = Math.sqrt(x * x + y * y + h * h);
        double product = x * y == 0 ? 0 : x * y * Math.atan(x * y / (h * r));
        return product + x * h * asinh(x / Math.sqrt(y * y + h * h)) + y * h * asinh(y / Math.sqrt(x * x + h * h)) - h * r;
    }

    /** ln[(s − t)/(s + t)] for s &gt; t ≥ 0, written to keep accuracy when t ≪ s. */
    private static double logRatio(double s, double t) {
        return -2 * atanh(t / s);
    }

    private static double atanh(double u) {
        return 0.5 * Math.log1p(2 * u / (1 - u));
    }

    private static double asinh(double u) {
        return Math.copySign(Math.log1p(Math.abs(u) + u * u / (1 + Math.sqrt(1 + u * u))), u);
    }
}
