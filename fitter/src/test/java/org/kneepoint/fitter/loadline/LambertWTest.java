package org.kneepoint.fitter.loadline;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class LambertWTest {

    @Test
    void known_values() {
        // W(e) = 1 and W(1) = Ω = 0.567143290409783872999968662210 (the omega constant; DLMF 4.13 and OEIS A030178)
        assertEquals(1.0, LambertW.ofLogarithm(1.0), 1e-15);
        assertEquals(0.5671432904097838, LambertW.ofLogarithm(0.0), 1e-15);
    }

    @Test
    void inverse_relation_holds_from_tiny_to_huge_arguments() {
        // W(z)·e^W(z) = z, i.e. y + ln y = ln z (Corless et al. 1996, definition)
        for (double logArgument = -60; logArgument <= 300; logArgument += 0.0137) {
            double y = LambertW.ofLogarithm(logArgument);
            assertEquals(logArgument, y + Math.log(y), 1e-13 * Math.max(1, Math.abs(logArgument)), "ln z = " + logArgument);
        }
    }
}
