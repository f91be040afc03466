package org.kneepoint.fitter.model.ja;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

class NegativeExponentialTest {

    // Reference: java.lang.StrictMath.exp, the fdlibm 5.3 algorithm, specified within 1 ulp of the exact value.
    @Test
    void agrees_with_strictmath_exp_within_three_ulp_over_the_whole_range() {
        SplittableRandom random = new SplittableRandom(1989L);
        double worst = 0;
        for (int i = 0; i < 1_000_000; i++) {
            double t = i % 2 == 0 ? 40 * random.nextDouble() : NegativeExponential.ZERO_BEYOND * random.nextDouble();
            double exact = StrictMath.exp(-t);
            worst = Math.max(worst, Math.abs(NegativeExponential.of(t) - exact) / Math.ulp(exact));
        }
        assertTrue(worst <= 3, "worst error " + worst + " ulp");
    }

    @Test
    void exact_points_and_the_far_tail() {
        assertEquals(1.0, NegativeExponential.of(0), 0);
        assertEquals(0.5, NegativeExponential.of(Math.log(2)), Math.ulp(0.5));
        assertEquals(StrictMath.exp(-NegativeExponential.ZERO_BEYOND), NegativeExponential.of(NegativeExponential.ZERO_BEYOND),
                3 * Math.ulp(StrictMath.exp(-NegativeExponential.ZERO_BEYOND)));
        assertEquals(0.0, NegativeExponential.of(1e6), 0);
    }
}
