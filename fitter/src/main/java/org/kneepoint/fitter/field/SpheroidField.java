package org.kneepoint.fitter.field;

import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.shape.SpheroidShape;

/**
 * B of a spheroid magnetized along its symmetry axis z. Inside, B = μ0·M·(1 − N) along z with N of
 * {@link SpheroidShape} (uniform field of an ellipsoid, Osborn, Phys. Rev. 67, 351, 1945). Outside, the
 * potential of a uniformly magnetized ellipsoid, φ = (M·a²·c/2)·z·I(λ), I(λ) = ∫_λ^∞ ds/[(c² + s)^{3/2}·(a² + s)],
 * λ the ellipsoidal coordinate of the point (the same integral gives N = (a²c/2)·I(0), Osborn's Eq.);
 * with U = √(c² + λ), e² = a² − c²: I = (2/e²)·[1/U − atan(e/U)/e] (oblate), (2/f²)·[atanh(f/U)/f − 1/U],
 * f² = −e² (prolate), and the series 2·Σ (−e²)ᵏ/[(2k + 3)·U^{2k+3}] near e = 0. For a sphere this is the
 * pure dipole of moment M·V (D. J. Griffiths, Introduction to Electrodynamics, Ex. 6.1). B = −μ0·∇φ outside.
 *
 * @param shape     the spheroid, axis along z
 * @param remanence Br in tesla
 */
public record SpheroidField(SpheroidShape shape, double remanence) implements MagnetField {

    private static final double SERIES_LIMIT = 1e-2;

    public SpheroidField {
        Magnetization.fromRemanence(remanence);
        if (shape == null) {
            throw new BadInputException("spheroid field must be given a spheroid, got null");
        }
    }

    @Override
    public void fluxDensityInto(double x, double y, double z, double[] target, int offset) {
        double a = 0.5 * shape.equatorialDiameter();
        double c = 0.5 * shape.polarDiameter();
        double rho2 = x * x + y * y;
        if (rho2 / (a * a) + z * z / (c * c) < 1.0) {
            target[offset] = 0.0;
            target[offset + 1] = 0.0;
            target[offset + 2] = remanence * (1.0 - shape.demagnetizingFactor());
            return;
        }
        double a2 = a * a;
        double c2 = c * c;
        double linear = a2 + c2 - rho2 - z * z;
        double constant = a2 * c2 - rho2 * c2 - z * z * a2;
        double root = Math.sqrt(linear * linear - 4.0 * constant);
        double lambda = linear > 0.0 ? -2.0 * constant / (linear + root) : 0.5 * (root - linear);
        double equatorial = a2 + lambda;
        double polar = c2 + lambda;
        double u = Math.sqrt(polar);
        double derivative = -1.0 / (polar * u * equatorial);
        double denominator = rho2 / (equatorial * equatorial) + z * z / (polar * polar);
        double factor = 0.5 * remanence * a2 * c;
        double common = -factor * z * derivative * 2.0 / denominator;
        target[offset] = common * x / equatorial;
        target[offset + 1] = common * y / equatorial;
        target[offset + 2] = -factor * integral(a2 - c2, u) + common * z / polar;
    }

    @Override
    public boolean isInside(double x, double y, double z) {
        double a = 0.5 * shape.equatorialDiameter();
        double c = 0.5 * shape.polarDiameter();
        return (x * x + y * y) / (a * a) + z * z / (c * c) < 1.0;
    }

    /** I(λ) with e² = a² − c² and U = √(c² + λ). */
    private static double integral(double e2, double u) {
        double ratio = e2 / (u * u);
        if (Math.abs(ratio) < SERIES_LIMIT) {
            double sum = 0.0;
            double power = 1.0;
            for (int k = 0; k < 12; k++) {
                sum += power / (2 * k + 3);
                power *= -ratio;
            }
            return 2.0 * sum / (u * u * u);
        }
        if (e2 > 0.0) {
            double e = Math.sqrt(e2);
            return 2.0 / e2 * (1.0 / u - Math.atan(e / u) / e);
        }
        double f = Math.sqrt(-e2);
        double atanh = 0.5 * Math.log1p(2.0 * f / (u - f));
        return 2.0 / (-e2) * (atanh / f - 1.0 / u);
    }

    /** A spheroid has no edges: its field is finite everywhere. */
    @Override
    public String singularity(double x, double y, double z) {
        return null;
    }
}
