package org.kneepoint.fitter.shape;

import org.hipparchus.analysis.integration.gauss.GaussIntegrator;
import org.hipparchus.analysis.integration.gauss.GaussIntegratorFactory;
import org.kneepoint.fitter.special.GeneralizedCompleteEllipticIntegral;

/**
 * The mutual terms between two coaxial, equally long, axially magnetized cylinders of radii
 * a &gt; c, needed to superpose a ring from an outer and an inner cylinder. Derivation (here):
 * with U(d) = ∬ dA dA'/r between end discs of radii a and c a distance d apart, the cross energy is
 * W = μ0·M²·Q(L) with Q(L) = [U(0) − U(L)]/(2π), and the flux of one cylinder's demagnetizing field
 * through the other's mid-plane disc is M·Q'(L/2). In Fourier–Bessel form
 * Q(L) = 2π·a·c·∫ J1(ka)·J1(kc)·(1 − e^{−kL})/k² dk, so Q'' is −2 times the mutual inductance per μ0 of
 * two coaxial loops, m(t) = √(ac)·k·cel(kc, 1, −1, 1), k² = 4ac/((a + c)² + t²) (Maxwell's formula for
 * coaxial circles, μ0·√(ac)·[(2/k − k)·K − (2/k)·E], from memory, written with Bulirsch's cel), and with
 * Q(0) = 0, Q'(0) = π·c² (Weber–Schafheitlin integral ∫ J1(ka)·J1(kc)/k dk = c/(2a), from memory):
 * Q(L) = π·c²·L − 2∫₀^L (L − t)·m(t) dt, Q'(h) = π·c² − 2∫₀^h m(t) dt.
 * The integrals are taken by 16-point Gauss–Legendre (Hipparchus) on panels that double in width from (a − c)/2,
 * which resolves the logarithmic near-singularity at t = 0 when c is close to a.
 */
final class CoaxialCylinderInteraction {

    private static final GaussIntegrator RULE = new GaussIntegratorFactory().legendre(16);

    private CoaxialCylinderInteraction() {
    }

    /** Q(L) in m³: the cross term of Nm·V. */
    static double energyTerm(double outer, double inner, double length) {
        return Math.PI * inner * inner * length - 2.0 * integrate(outer, inner, length, true);
    }

    /** Q'(h) in m²: the flux through one mid-plane disc from the other cylinder, per unit M. */
    static double midPlaneFlux(double outer, double inner, double halfLength) {
        return Math.PI * inner * inner - 2.0 * integrate(outer, inner, halfLength, false);
    }

    private static double integrate(double outer, double inner, double upper, boolean weighted) {
        double sum = 0.0;
        double lower = 0.0;
        double width = 0.5 * (outer - inner);
        while (lower < upper) {
            double end = Math.min(upper, lower + width);
            double half = 0.5 * (end - lower);
            double middle = 0.5 * (end + lower);
            double panel = 0.0;
            for (int i = 0; i < RULE.getNumberOfPoints(); i++) {
                double t = middle + half * RULE.getPoint(i);
                double weight = weighted ? upper - t : 1.0;
                panel += RULE.getWeight(i) * weight * loopMutual(outer, inner, t);
            }
            sum += half * panel;
            lower = end;
            width = end;
        }
        return sum;
    }

    private static double loopMutual(double outer, double inner, double distance) {
        double far2 = (outer + inner) * (outer + inner) + distance * distance;
        double near2 = (outer - inner) * (outer - inner) + distance * distance;
        double k = Math.sqrt(4.0 * outer * inner / far2);
        double kc = Math.sqrt(near2 / far2);
        return Math.sqrt(outer * inner) * k * GeneralizedCompleteEllipticIntegral.cel(kc, 1.0, -1.0, 1.0);
    }
}
