package org.kneepoint.fitter.shape;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.error.BadInputException;

class DemagnetizingFactorsTest {

    @Test
    void ellipsoid_factor_gives_permeance_one_minus_n_over_n() {
        // docs/design.md §4: Pc = (1 − N)/N, exact for an ellipsoid; a sphere (N = 1/3) has Pc = 2
        PermeanceCoefficients pc = DemagnetizingFactors.uniform(1.0 / 3).permeanceCoefficients();
        assertEquals(2.0, pc.magnetometric(), 1e-15);
        assertEquals(2.0, pc.coefficient(DemagnetizingKind.CENTRE_POINT), 1e-15);
    }

    @Test
    void factors_outside_zero_to_one_are_rejected_with_a_clear_message() {
        BadInputException error = assertThrows(BadInputException.class, () -> new DemagnetizingFactors(0.3, 1.0, 0.2));
        assertTrue(error.getMessage().equals("fluxmetric demagnetizing factor must lie strictly between 0 and 1, got 1.0"),
                error.getMessage());
        assertThrows(BadInputException.class, () -> new DemagnetizingFactors(Double.NaN, 0.5, 0.5));
        assertThrows(BadInputException.class, () -> new PermeanceCoefficients(1.0, -2.0, 1.0));
    }
}
