package org.kneepoint.fitter.shape;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class CylinderDemagnetizationTest {

    private static final double[] ASPECTS = {1e-3, 0.01, 0.1, 0.25, 0.5, 1.0, 2.0, 5.0, 20.0, 100.0, 1e3};

    @ParameterizedTest
    @ValueSource(doubles = {1e-3, 0.01, 0.1, 0.5, 1.0, 3.0, 10.0, 100.0, 1e3})
    void magnetometric_matches_the_hypergeometric_form(double aspect) {
        // Beleggia et al., J. Phys. D 38, 3333 (2005): Nm = 1 + 4/(3πγ) − 2F1(−1/2, 1/2; 2; −1/γ²) (docs/references.md §1a);
        // 2F1 by its Euler integral (NIST DLMF 15.6.1), t = sin²θ: (2/π)∫ 2cos²θ·√(1 + sin²θ/γ²) dθ
        java.util.function.DoubleUnaryOperator euler =
                t -> 2 * Math.cos(t) * Math.cos(t) * Math.sqrt(1 + Math.sin(t) * Math.sin(t) / (aspect * aspect));
        double split = Math.min(Math.PI / 4, 10 * aspect);
        double hypergeometric = 2.0 / Math.PI
                * (BesselQuadrature.integrate(euler, 0, split) + BesselQuadrature.integrate(euler, split, Math.PI / 2));
        double expected = 1 + 4 / (3 * Math.PI * aspect) - hypergeometric;
        // the reference itself cancels: its accuracy is about 1e-13 of the 4/(3πγ) term
        assertEquals(expected, CylinderDemagnetization.magnetometric(aspect), 1e-13 * (1 + 4 / (3 * Math.PI * aspect)) + 1e-12 * expected);
    }

    @ParameterizedTest
    @ValueSource(doubles = {0.05, 0.2, 0.5, 1.0, 2.0, 8.0, 30.0})
    void magnetometric_matches_the_bessel_integral_of_the_face_energy(double aspect) {
        // magnetostatic energy of the two charged end discs by Fourier–Bessel transform (Chen, Brug, Goldfarb 1991, §II;
        // form re-derived here): Nm = 4/(3πγ) − (1/γ)·∫ J1(x)² e^{−2γx}/x² dx, using ∫ J1²/x² = 4/(3π) (from memory)
        double integral = BesselQuadrature.damped(x -> x == 0 ? 0.25 : Math.pow(BesselQuadrature.j1(x) / x, 2), 2 * aspect);
        double expected = 4 / (3 * Math.PI * aspect) - integral / aspect;
        assertEquals(expected, CylinderDemagnetization.magnetometric(aspect), 1e-9 * expected);
    }

    @ParameterizedTest
    @ValueSource(doubles = {0.01, 0.05, 0.2, 0.5, 1.0, 2.0, 8.0, 30.0, 300.0, 1e3})
    void fluxmetric_matches_the_bessel_integral_of_the_mid_plane_flux(double aspect) {
        // mid-plane flux of the two end discs (Fourier–Bessel, re-derived): Nf = 2·∫ J1(x)² e^{−γx}/x dx
        double integral = BesselQuadrature.damped(x -> x == 0 ? 0 : Math.pow(BesselQuadrature.j1(x), 2) / x, aspect);
        assertEquals(2 * integral, CylinderDemagnetization.fluxmetric(aspect), 1e-9 * 2 * integral);
    }

    @Test
    void centre_point_factor_of_a_one_to_one_cylinder_is_one_minus_one_over_root_two() {
        // solid angle of the end discs seen from the centre (on-axis disc formula, docs/references.md §4a)
        assertEquals(1 - 1 / Math.sqrt(2), CylinderDemagnetization.centrePoint(1.0), 1e-15);
    }

    @Test
    void long_cylinders_approach_zero_and_thin_discs_approach_one() {
        // limits: needle N → 0, thin plate N → 1 (Chen, Brug, Goldfarb 1991, abstract and Figs.);
        // long-cylinder asymptote Nm ≈ 4/(3πγ) − 1/(8γ²) from the Bessel form above (re-derived)
        double gamma = 1e3;
        assertEquals(4 / (3 * Math.PI * gamma) - 1 / (8 * gamma * gamma), CylinderDemagnetization.magnetometric(gamma), 1e-9);
        assertTrue(CylinderDemagnetization.fluxmetric(gamma) < 1e-6);
        assertTrue(CylinderDemagnetization.centrePoint(gamma) < 1e-6);
        assertTrue(CylinderDemagnetization.magnetometric(1e-3) > 0.99);
        assertTrue(CylinderDemagnetization.fluxmetric(1e-3) > 0.99);
        assertTrue(CylinderDemagnetization.centrePoint(1e-3) > 0.998);
    }

    @Test
    void fluxmetric_lies_below_magnetometric() {
        // ordering Nf < Nm at χ = 0 for every aspect ratio: Chen, Brug, Goldfarb (1991), Figs. of Nm and Nf (from memory)
        for (double aspect : ASPECTS) {
            double nm = CylinderDemagnetization.magnetometric(aspect);
            double nf = CylinderDemagnetization.fluxmetric(aspect);
            assertTrue(nf < nm, "Nf < Nm at γ = " + aspect + ": " + nf + " vs " + nm);
        }
    }

    @Test
    void long_cylinder_fluxmetric_and_centre_factors_follow_the_end_pole_asymptote() {
        // far from both ends the field is that of two point-like poles ±M·πR² at ±L/2: N ≈ 1/(2γ²) (re-derived)
        double gamma = 200;
        assertEquals(1 / (2 * gamma * gamma), CylinderDemagnetization.fluxmetric(gamma), 1e-3 / (2 * gamma * gamma));
        assertEquals(1 / (2 * gamma * gamma), CylinderDemagnetization.centrePoint(gamma), 1e-3 / (2 * gamma * gamma));
    }
}
