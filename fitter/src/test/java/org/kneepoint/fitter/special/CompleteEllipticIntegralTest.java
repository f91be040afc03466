package org.kneepoint.fitter.special;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.special.elliptic.legendre.LegendreEllipticIntegral;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.kneepoint.fitter.error.BadInputException;

class CompleteEllipticIntegralTest {

    private static final double[] PARAMETERS = {0.0, 1e-9, 1e-4, 0.1, 0.3, 0.5, 0.7, 0.9, 0.99, 0.999999};

    @Test
    void k_and_e_at_zero_are_half_pi() {
        // NIST DLMF 19.6.1: K(0) = E(0) = π/2
        assertEquals(Math.PI / 2, CompleteEllipticIntegral.firstKind(0.0), 1e-15);
        assertEquals(Math.PI / 2, CompleteEllipticIntegral.secondKind(0.0), 1e-15);
    }

    @Test
    void e_at_one_is_one() {
        // NIST DLMF 19.6.1: E(1) = 1
        assertEquals(1.0, CompleteEllipticIntegral.secondKind(1.0), 0.0);
        assertEquals(1.0, CompleteEllipticIntegral.secondKind(1.0 - 1e-12), 1e-10);
    }

    @Test
    void lemniscatic_case_matches_gamma_of_a_quarter() {
        // K(1/2) = Γ(1/4)² / (4√π), NIST DLMF 19.6.2 (equation number from memory);
        // Γ(1/4) = 3.625609908221908311930685 (from memory; checked against Hipparchus Gamma below)
        double gammaQuarter = Math.exp(org.hipparchus.special.Gamma.logGamma(0.25));
        assertEquals(3.625609908221908, gammaQuarter, 1e-13);
        double expected = gammaQuarter * gammaQuarter / (4.0 * Math.sqrt(Math.PI));
        assertEquals(expected, CompleteEllipticIntegral.firstKind(0.5), 1e-14);
    }

    @ParameterizedTest
    @ValueSource(doubles = {1e-6, 0.01, 0.2, 0.5, 0.8, 0.99, 0.999999})
    void legendre_relation_holds(double m) {
        // NIST DLMF 19.7.1: E·K' + E'·K − K·K' = π/2, with K' = K(1 − m), E' = E(1 − m)
        double k = CompleteEllipticIntegral.firstKind(m);
        double e = CompleteEllipticIntegral.secondKind(m);
        double kp = CompleteEllipticIntegral.firstKind(1 - m);
        double ep = CompleteEllipticIntegral.secondKind(1 - m);
        assertEquals(Math.PI / 2, e * kp + ep * k - k * kp, 1e-13);
    }

    @Test
    void third_kind_special_cases_hold() {
        // Π(n, 0) = π / (2√(1 − n)) and Π(m, m) = E(m)/(1 − m), NIST DLMF 19.6.3 and 19.6.1 (numbers from memory)
        for (double n : new double[] {-3.0, -0.5, 0.0, 0.3, 0.9}) {
            assertEquals(Math.PI / (2 * Math.sqrt(1 - n)), CompleteEllipticIntegral.thirdKind(n, 0.0), 1e-14);
        }
        for (double m : new double[] {0.1, 0.5, 0.9}) {
            assertEquals(CompleteEllipticIntegral.secondKind(m) / (1 - m), CompleteEllipticIntegral.thirdKind(m, m), 1e-13);
        }
    }

    @Test
    void k_e_and_pi_agree_with_hipparchus() {
        // outside oracle: Hipparchus 4.0.1 LegendreEllipticIntegral (Carlson-based), same parameter convention m = k²
        for (double m : PARAMETERS) {
            double k = CompleteEllipticIntegral.firstKind(m);
            double e = CompleteEllipticIntegral.secondKind(m);
            assertEquals(LegendreEllipticIntegral.bigK(m), k, 4e-15 * k, "K at m = " + m);
            assertEquals(LegendreEllipticIntegral.bigE(m), e, 4e-15 * e, "E at m = " + m);
            assertEquals(LegendreEllipticIntegral.bigK(m) - LegendreEllipticIntegral.bigE(m),
                    CompleteEllipticIntegral.firstMinusSecondKind(m), 8e-15 * k, "K − E at m = " + m);
            for (double n : new double[] {-10.0, -0.7, 0.0, 0.4, 0.95}) {
                double pi = CompleteEllipticIntegral.thirdKind(n, m);
                assertEquals(LegendreEllipticIntegral.bigPi(n, m), pi, 1e-14 * pi, "Π at n = " + n + ", m = " + m);
            }
        }
    }

    @ParameterizedTest
    @ValueSource(doubles = {1e-3, 0.5, 1.0, 5.0, 100.0})
    void negative_parameters_follow_the_imaginary_modulus_transformation(double t) {
        // NIST DLMF 19.7.5 (number from memory): K(−t) = K(t/(1+t))/√(1+t), E(−t) = √(1+t)·E(t/(1+t)).
        // Hipparchus is not used here: its bigK returned a negative value at m = −5 when tried.
        double reduced = t / (1 + t);
        assertEquals(CompleteEllipticIntegral.firstKind(reduced) / Math.sqrt(1 + t), CompleteEllipticIntegral.firstKind(-t), 1e-14);
        assertEquals(CompleteEllipticIntegral.secondKind(reduced) * Math.sqrt(1 + t), CompleteEllipticIntegral.secondKind(-t),
                1e-14 * Math.sqrt(1 + t));
    }

    @Test
    void k_minus_e_keeps_relative_accuracy_for_tiny_parameters() {
        // series K − E = (π/4)·m·(1 + 3m/8 + ...) (NIST DLMF 19.5.1 and 19.5.2)
        double m = 1e-12;
        assertEquals(Math.PI / 4 * m * (1 + 3 * m / 8), CompleteEllipticIntegral.firstMinusSecondKind(m), 1e-15 * m);
    }

    @Test
    void parameters_outside_the_domain_are_rejected() {
        BadInputException error = assertThrows(BadInputException.class, () -> CompleteEllipticIntegral.firstKind(1.0));
        assertTrue(error.getMessage().contains("below 1, got 1.0"), error.getMessage());
        assertThrows(BadInputException.class, () -> CompleteEllipticIntegral.secondKind(Double.NaN));
        assertThrows(BadInputException.class, () -> CompleteEllipticIntegral.thirdKind(1.0, 0.5));
        assertThrows(BadInputException.class, () -> GeneralizedCompleteEllipticIntegral.cel(0.0, 1, 1, 1));
    }
}
