package org.kneepoint.fitter.qualification;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import org.junit.jupiter.api.Test;

class ProcessCapabilityTest {

    // Hand calculation of Cpl = (mean − LSL)/(3s) (Montgomery, Introduction to Statistical Quality
    // Control, §8.3): values 1.40, 1.42, 1.38, 1.41, 1.39 T; mean 1.40; squared deviations 0, 4e-4,
    // 4e-4, 1e-4, 1e-4 sum to 1e-3; s = √(1e-3/4) = 0.0158114; against 1.35 T, Cpk = 0.05/0.0474342 = 1.05409.
    @Test
    void cpk_of_five_lots_matches_the_hand_calculation() {
        ProcessCapability capability = ProcessCapability.of(new double[] {1.40, 1.42, 1.38, 1.41, 1.39}, 1.35);
        assertEquals(5, capability.count());
        assertEquals(1.40, capability.mean(), 1e-12);
        assertEquals(0.0158114, capability.standardDeviation(), 1e-7);
        assertEquals(1.05409, capability.cpk(), 1e-5);
    }

    @Test
    void cpk_is_not_reported_below_five_lots_or_without_a_limit() {
        assertNull(ProcessCapability.of(new double[] {1.40, 1.42, 1.38, 1.41}, 1.35).cpk());
        assertNull(ProcessCapability.of(new double[] {1.40, 1.42, 1.38, 1.41, 1.39}, null).cpk());
        assertNull(ProcessCapability.of(new double[] {1.40}, 1.35).standardDeviation());
    }
}
