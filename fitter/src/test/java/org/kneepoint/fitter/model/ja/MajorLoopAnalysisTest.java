package org.kneepoint.fitter.model.ja;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.error.BadInputException;

class MajorLoopAnalysisTest {

    private static final JilesAthertonParameters SOFT_IRON = JilesAthertonPhysicsTest.SOFT_IRON;

    // The loss of a major loop can only grow with Hmax (the larger loop encloses the smaller, Jiles,
    // Thoelke, Devine 1992: loss per cycle equals the loop area) and levels off once the tips saturate.
    @Test
    void a_hmax_far_above_the_coercivity_gives_a_loss_that_grows_and_levels_off() {
        double previous = 0;
        double[] fields = {5e3, 1e4, 1e5, 1e6, 1e7};
        double[] losses = new double[fields.length];
        for (int i = 0; i < fields.length; i++) {
            losses[i] = MajorLoopAnalysis.adaptive(SOFT_IRON).measure(fields[i]).lossPerCycle();
            assertTrue(losses[i] > previous, "loss " + losses[i] + " J/m³ at Hmax " + fields[i] + " A/m after " + previous);
            previous = losses[i];
        }
        assertEquals(losses[3], losses[4], 0.01 * losses[4], "saturated tips add little");
    }

    @Test
    void a_hmax_beyond_the_highest_field_is_refused() {
        BadInputException error = assertThrows(BadInputException.class,
                () -> MajorLoopAnalysis.adaptive(SOFT_IRON).measure(2 * MajorLoopAnalysis.HIGHEST_FIELD));
        assertTrue(error.getMessage().contains("at most 1.0E7 A/m"), error.getMessage());
    }
}
