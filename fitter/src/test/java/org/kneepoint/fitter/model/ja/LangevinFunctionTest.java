package org.kneepoint.fitter.model.ja;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.hipparchus.util.FastMath;
import org.junit.jupiter.api.Test;

class LangevinFunctionTest {

    // Langevin limits, Jiles & Thoelke & Devine, IEEE Trans. Magn. 28(1), 27 (1992): L(x) ≈ x/3 near 0.
    @Test
    void langevin_function_is_x_over_three_near_zero() {
        for (double x : new double[] {1e-8, 1e-5, 1e-3}) {
            assertEquals(x / 3, LangevinFunction.value(x), x * x * x / 40);
            assertEquals(-x / 3, LangevinFunction.value(-x), x * x * x / 40);
        }
        assertEquals(0.0, LangevinFunction.value(0.0));
        assertEquals(1.0 / 3, LangevinFunction.derivative(0.0), 1e-15);
    }

    // Same source: L(x) → 1 − 1/x for large x (coth x → 1).
    @Test
    void langevin_function_tends_to_one_minus_one_over_x_for_large_x() {
        for (double x : new double[] {20, 100, 1e4, 1e8}) {
            assertEquals(1 - 1 / x, LangevinFunction.value(x), 1e-15);
            assertEquals(-(1 - 1 / x), LangevinFunction.value(-x), 1e-15);
            assertEquals(1 / (x * x), LangevinFunction.derivative(x), 1e-12 / (x * x));
        }
    }

    // Reference library: Hipparchus FastMath.tanh, L(x) = 1/tanh(x) − 1/x where no cancellation occurs.
    @Test
    void langevin_function_agrees_with_hipparchus_hyperbolic_functions() {
        for (double x = 0.5; x < 30; x += 0.37) {
            double reference = 1 / FastMath.tanh(x) - 1 / x;
            assertEquals(reference, LangevinFunction.value(x), 1e-14);
            double sinh = FastMath.sinh(x);
            assertEquals(1 / (x * x) - 1 / (sinh * sinh), LangevinFunction.derivative(x), 1e-13);
        }
    }

    @Test
    void series_and_closed_form_meet_at_the_switch() {
        double below = Math.nextDown(LangevinFunction.SERIES_LIMIT);
        double above = LangevinFunction.SERIES_LIMIT;
        assertEquals(LangevinFunction.value(below), LangevinFunction.value(above), 1e-14);
        assertEquals(LangevinFunction.derivative(below), LangevinFunction.derivative(above), 1e-13);
    }

    @Test
    void derivative_matches_a_central_difference_of_the_value() {
        for (double x : new double[] {0.03, 0.3, 1.0, 3.0, 10.0}) {
            double step = 1e-5;
            double difference = (LangevinFunction.value(x + step) - LangevinFunction.value(x - step)) / (2 * step);
            assertEquals(difference, LangevinFunction.derivative(x), 1e-9);
        }
    }
}
