package org.kneepoint.fitter.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class AreaUnitsTest {

    @Test
    void areas_follow_the_squares_of_their_lengths() {
        // NIST SP 811 (2008), B.8: 1 in = 0.0254 m exactly, so 1 in² = 6.4516e-4 m²; 1 cm² = 1e-4 m², 1 mm² = 1e-6 m²
        assertEquals(6.4516e-4, QuantityParser.parse("1in²", Dimension.AREA), 1e-18);
        assertEquals(2.5e-4, QuantityParser.parse("2.5 cm2", Dimension.AREA), 1e-18);
        assertEquals(3e-6, QuantityParser.parse("3mm²", Dimension.AREA), 1e-20);
        assertEquals(0.5, QuantityParser.parse("0.5 m2", Dimension.AREA), 0.0);
    }

    @Test
    void a_length_is_not_an_area() {
        assertThrows(IllegalArgumentException.class, () -> QuantityParser.parse("3mm", Dimension.AREA));
    }
}
