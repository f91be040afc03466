package org.kneepoint.fitter.loadline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.error.BadInputException;

class LinearTemperatureLawTest {

    private final LinearTemperatureLaw law = Grades.neodymiumLaw();

    @Test
    void remanence_and_coercivity_follow_the_linear_law() {
        // Br(T) = BrRef·(1 + α·(T − Tref)), as in the Modelica FluxTubes HardMagnetic records (docs/references.md §6b)
        LinearRecoilKnee hot = law.at(393.15);
        assertEquals(1.3 * (1 - 0.0012 * 100), hot.remanence(), 1e-12);
        assertEquals(1.6e6 * (1 - 0.006 * 100), hot.intrinsicCoercivity(), 1e-6);
        assertEquals(1.05, hot.recoilPermeability(), 0.0);
        assertEquals(1 - 0.0012 * 100, law.remanenceRatio(393.15), 1e-12);
    }

    @Test
    void range_ends_where_coercivity_reaches_zero() {
        // HcJ0·(1 + β·ΔT) = 0 at ΔT = −1/β = 166.67 K for β = −0.6 %/K
        assertEquals(293.15 + 1 / 0.006, law.highestTemperature(), 1e-3);
        assertThrows(BadInputException.class, () -> law.at(470.0));
    }
}
