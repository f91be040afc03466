package org.kneepoint.fitter.special;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.apache.commons.math3.analysis.integration.gauss.GaussIntegrator;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class GaussLegendreRuleTest {

    @ParameterizedTest
    @ValueSource(ints = {1, 2, 5, 16, 40})
    void nodes_and_weights_match_commons_math(int size) {
        // outside oracle: Apache Commons Math 3.6.1 GaussIntegratorFactory.legendre (nodes on [−1, 1])
        GaussIntegrator reference = new GaussIntegratorFactory().legendre(size);
        GaussLegendreRule rule = new GaussLegendreRule(size);
        double[] nodes = new double[size];
        double[] weights = new double[size];
        for (int i = 0; i < size; i++) {
            nodes[i] = rule.node(i);
            weights[i] = rule.weight(i);
        }
        java.util.Arrays.sort(nodes);
        for (int i = 0; i < size; i++) {
            assertEquals(reference.getPoint(i), nodes[i], 1e-14);
        }
        double sum = 0;
        for (double w : weights) {
            sum += w;
        }
        assertEquals(2.0, sum, 1e-13);
    }

    @ParameterizedTest
    @ValueSource(ints = {3, 8, 16})
    void rule_is_exact_for_polynomials_of_degree_two_n_minus_one(int size) {
        // Gauss–Legendre exactness (NIST DLMF 3.5.19): ∫₀² x^(2n−1) dx = 2^(2n)/(2n)
        int degree = 2 * size - 1;
        double exact = Math.pow(2, degree + 1) / (degree + 1);
        assertEquals(exact, new GaussLegendreRule(size).integrate(x -> Math.pow(x, degree), 0, 2), 1e-12 * exact);
    }

    @ParameterizedTest
    @ValueSource(ints = {0, 201})
    void unreasonable_sizes_are_rejected(int size) {
        assertThrows(IllegalArgumentException.class, () -> new GaussLegendreRule(size));
    }
}
