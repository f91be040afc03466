package org.kneepoint.fitter.shape;

import org.kneepoint.fitter.special.CompleteEllipticIntegral;

/**
 * Closed forms of the three demagnetizing factors of an axially magnetized solid cylinder as
 * functions of γ = L/D (χ = 0, uniform magnetization).
 *
 * <ul>
 * <li>Nm = 1 + 4/(3πγ)·[1 − √(1+γ²)·(γ²·(K − E) + E)], m = 1/(1 + γ²): the zero-eccentricity term of
 * M. Beleggia et al., J. Phys. D 38, 3333 (2005), equal to the exact χ = 0 result of D.-X. Chen,
 * J. A. Brug, R. B. Goldfarb, IEEE Trans. Magn. 27, 3601 (1991) (docs/references.md §1a). γ²K + (1−γ²)E is
 * regrouped as γ²(K − E) + E so that long cylinders do not cancel.</li>
 * <li>Nf = 1 − (4/π)·g·√(1+g²)·(K − E), g = γ/2, m = 1/(1 + g²): derived here. With U(d) the
 * Coulomb integral ∬dA dA'/r between two coaxial end discs a distance d apart, Nm(γ) =
 * [U(0) − U(L)]/(2π·A·L) and the mid-plane average of the face solid angle is −U'(L/2)/A, so
 * Nf(γ) = d/dg [g·Nm(g)] at g = γ/2; differentiating the closed form with the derivatives of K
 * and E (NIST DLMF 19.4.1) gives the expression above, exact and closed. The tests check it against
 * a Fourier–Bessel quadrature and the mid-plane average of the Derby–Olbert field.</li>
 * <li>N0 = 1 − γ/√(γ² + 1): the field of the two end discs at the centre, each subtending
 * 2π·(1 − (L/2)/√(R² + (L/2)²)) (solid angle of a disc on its axis).</li>
 * </ul>
 */
final class CylinderDemagnetization {

    private CylinderDemagnetization() {
    }

    static DemagnetizingFactors of(double aspect) {
        return new DemagnetizingFactors(magnetometric(aspect), fluxmetric(aspect), centrePoint(aspect));
    }

    static double magnetometric(double aspect) {
        double aspect2 = aspect * aspect;
        double m = 1.0 / (1.0 + aspect2);
        double difference = CompleteEllipticIntegral.firstMinusSecondKind(m);
        double second = CompleteEllipticIntegral.secondKind(m);
        double bracket = 1.0 - Math.sqrt(1.0 + aspect2) * (aspect2 * difference + second);
        return 1.0 + 4.0 / (3.0 * Math.PI * aspect) * bracket;
    }

    static double fluxmetric(double aspect) {
        double g = 0.5 * aspect;
        double m = 1.0 / (1.0 + g * g);
        return 1.0 - 4.0 / Math.PI * g * Math.sqrt(1.0 + g * g) * CompleteEllipticIntegral.firstMinusSecondKind(m);
    }

    static double centrePoint(double aspect) {
        return 1.0 - aspect / Math.sqrt(aspect * aspect + 1.0);
    }
}
