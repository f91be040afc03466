package org.kneepoint.fitter.model.ja;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.error.BadInputException;

class JilesAthertonParametersTest {

    @Test
    void coupling_at_or_above_three_a_over_ms_is_rejected_as_unstable() {
        BadInputException error = assertThrows(BadInputException.class,
                () -> new JilesAthertonParameters(1e6, 1000, 100, 0.1, 3e-3));
        assertTrue(error.getMessage().contains("3a"), error.getMessage());
    }

    @Test
    void non_positive_or_non_finite_values_are_rejected() {
        assertThrows(BadInputException.class, () -> new JilesAthertonParameters(0, 1000, 100, 0.1, 0));
        assertThrows(BadInputException.class, () -> new JilesAthertonParameters(1e6, -1, 100, 0.1, 0));
        assertThrows(BadInputException.class, () -> new JilesAthertonParameters(1e6, 1000, Double.NaN, 0.1, 0));
        assertThrows(BadInputException.class, () -> new JilesAthertonParameters(1e6, 1000, 100, 1.5, 0));
        assertThrows(BadInputException.class, () -> new JilesAthertonParameters(1e6, 1000, 100, -0.1, 0));
        assertThrows(BadInputException.class, () -> new JilesAthertonParameters(1e6, 1000, 100, 0.1, -1e-4));
        assertThrows(BadInputException.class,
                () -> new JilesAthertonParameters(Double.POSITIVE_INFINITY, 1000, 100, 0.1, 0));
    }

    // Jiles, Thoelke, Devine, IEEE Trans. Magn. 28(1), 27 (1992): χan = Ms/(3a − α·Ms) (from memory, re-derived).
    @Test
    void anhysteretic_susceptibility_at_the_origin_follows_the_published_relation() {
        JilesAthertonParameters p = new JilesAthertonParameters(1.6e6, 1100, 400, 0.2, 1.6e-3);
        assertEquals(1.6e6 / (3300 - 2560), p.anhystereticSusceptibilityAtOrigin(), 1e-9);
    }

    @Test
    void array_form_round_trips() {
        JilesAthertonParameters p = new JilesAthertonParameters(1.6e6, 1100, 400, 0.2, 1.6e-3);
        assertEquals(p, JilesAthertonParameters.fromArray(p.toArray()));
        assertThrows(BadInputException.class, () -> JilesAthertonParameters.fromArray(new double[4]));
    }
}
