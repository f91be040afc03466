package org.kneepoint.fitter.loadline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.error.BadInputException;

class LinearRecoilKneeTest {

    @Test
    void curve_passes_through_remanence_knee_and_coercivity() {
        // the defining points of a J(H) curve: J(0) = Br, J(−Hk) = 0.9·Br, J(−HcJ) = 0 (IEC 60404-5 definitions; from memory)
        LinearRecoilKnee curve = Grades.neodymium();
        assertEquals(1.3, curve.j(0.0), 1e-12);
        assertEquals(0.9 * 1.3, curve.j(-1.45e6), 1e-12);
        assertEquals(0.0, curve.j(-1.6e6), 1e-12);
        assertEquals(-1.45e6, curve.kneeField().orElseThrow(), 1e-6 * 1.45e6 * 1e-3);
    }

    @Test
    void curve_follows_the_recoil_line_well_above_the_knee() {
        LinearRecoilKnee curve = Grades.neodymium();
        double h = -2e5;
        assertEquals(1.3 + MU0 * 0.05 * h, curve.j(h), 1e-12);
    }

    @Test
    void curve_is_increasing_for_random_grades() {
        SplittableRandom random = new SplittableRandom(5);
        for (int trial = 0; trial < 200; trial++) {
            LinearRecoilKnee curve = Grades.random(random);
            double hcj = curve.intrinsicCoercivity();
            double previous = curve.j(-1.2 * hcj);
            for (int k = 1; k <= 400; k++) {
                double value = curve.j(-1.2 * hcj * (1 - k / 400.0));
                assertTrue(value > previous, "trial " + trial);
                previous = value;
            }
        }
    }

    @Test
    void knee_field_beyond_coercivity_is_refused() {
        assertThrows(BadInputException.class, () -> LinearRecoilKnee.withKneeField(1.3, 1.05, 1.6e6, 1.7e6));
        assertThrows(BadInputException.class, () -> LinearRecoilKnee.withKneeField(1.3, 1.2, 1.6e6, 1.5e6));
        assertThrows(BadInputException.class, () -> new LinearRecoilKnee(1.3, 0.9, 1.6e6, 1e4));
    }
}
