package org.kneepoint.fitter.shape;

import org.kneepoint.fitter.special.GeneralizedCompleteEllipticIntegral;

/**
 * The two face terms of the field of an axially magnetized cylinder of radius a, half-length b
 * (N. Derby, S. Olbert, "Cylindrical magnets and ideal solenoids", Am. J. Phys. 78, 229, 2010;
 * docs/references.md §4a): Bρ = (Br/π)·[radial(ρ, z + b) − radial(ρ, z − b)] and
 * Bz = (Br/π)·[axial(ρ, z + b) − axial(ρ, z − b)], where, with ζ the height above a face,
 * α = a/√(ζ² + (ρ + a)²), β = ζ/√(ζ² + (ρ + a)²), γ = (a − ρ)/(a + ρ),
 * kc = √[(ζ² + (a − ρ)²)/(ζ² + (a + ρ)²)]: radial = α·cel(kc, 1, 1, −1) and
 * axial = a/(a + ρ)·β·cel(kc, γ², 1, γ). Both are continuous across the face planes, so the same
 * expressions hold inside and outside the magnet. On a rim (ρ = a, ζ = 0) the radial field is
 * logarithmically infinite: radial returns NaN there and axial its limit 0.
 */
public final class DerbyOlbertTerms {

    private DerbyOlbertTerms() {
    }

    /** α·cel(kc, 1, 1, −1) for a face of the given radius, at radial distance rho and height zeta. */
    public static double radial(double radius, double rho, double zeta) {
        double sum = radius + rho;
        double difference = radius - rho;
        double far2 = zeta * zeta + sum * sum;
        double kc = Math.sqrt((zeta * zeta + difference * difference) / far2);
        if (kc == 0.0) {
            return Double.NaN;
        }
        return radius / Math.sqrt(far2) * GeneralizedCompleteEllipticIntegral.cel(kc, 1.0, 1.0, -1.0);
    }

    /** a/(a + ρ)·β·cel(kc, γ², 1, γ) for a face of the given radius, at radial distance rho and height zeta. */
    public static double axial(double radius, double rho, double zeta) {
        double sum = radius + rho;
        double difference = radius - rho;
        double far2 = zeta * zeta + sum * sum;
        double kc = Math.sqrt((zeta * zeta + difference * difference) / far2);
        if (kc == 0.0) {
            return 0.0;
        }
        double gamma = difference / sum;
        return radius / sum * zeta / Math.sqrt(far2) * GeneralizedCompleteEllipticIntegral.cel(kc, gamma * gamma, 1.0, gamma);
    }
}
