package org.kneepoint.fitter.special;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.hipparchus.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.api.Test;

class GeneralizedCompleteEllipticIntegralTest {

    @Test
    void cel_matches_direct_quadrature_of_its_definition() {
        // definition of cel, R. Bulirsch, Numer. Math. 13, 305–315 (1969); outside quadrature:
        // Hipparchus 4.0.1 IterativeLegendreGaussIntegrator
        double[][] cases = {{0.3, 1.0, 1.0, -1.0}, {0.8, 0.25, 1.0, 0.5}, {0.05, 4.0, 1.0, -2.0}, {1.7, 0.01, 1.0, 0.1},
            {0.6, 0.0, 1.0, 0.0}};
        IterativeLegendreGaussIntegrator integrator = new IterativeLegendreGaussIntegrator(24, 1e-14, 1e-15);
        for (double[] c : cases) {
            double expected = integrator.integrate(1_000_000, phi -> {
                double cos2 = Math.cos(phi) * Math.cos(phi);
                double sin2 = 1 - cos2;
                return (c[2] * cos2 + c[3] * sin2) / ((cos2 + c[1] * sin2) * Math.sqrt(cos2 + c[0] * c[0] * sin2));
            }, 0, Math.PI / 2);
            assertEquals(expected, GeneralizedCompleteEllipticIntegral.cel(c[0], c[1], c[2], c[3]), 1e-12 * Math.abs(expected));
        }
    }

    @Test
    void cel_with_negative_p_gives_the_principal_value_of_pi() {
        // Π(n, m) for n > 1 is a Cauchy principal value; identity Π(n, m) = K(m) − Π(m/n, m)
        // (NIST DLMF 19.6.5, from memory) relates it to n < 1 values
        double m = 0.4;
        double n = 2.5;
        double kc = Math.sqrt(1 - m);
        double principal = GeneralizedCompleteEllipticIntegral.cel(kc, 1 - n, 1, 1);
        double expected = CompleteEllipticIntegral.firstKind(m) - CompleteEllipticIntegral.thirdKind(m / n, m);
        assertEquals(expected, principal, 1e-13);
    }
}
