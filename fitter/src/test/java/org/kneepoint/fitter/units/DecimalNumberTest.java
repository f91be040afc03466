package org.kneepoint.fitter.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class DecimalNumberTest {

    @Test
    void parses_plain_and_scientific_decimals() {
        assertEquals(-12.5, DecimalNumber.parseOrNaN("-12.5", false));
        assertEquals(1.5e-3, DecimalNumber.parseOrNaN("1.5E-3", false));
        assertEquals(0.5, DecimalNumber.parseOrNaN(".5", false));
    }

    @Test
    void refuses_non_finite_and_java_only_spellings() {
        for (String text : new String[] {"NaN", "Infinity", "-Infinity", "1e400", "0x10", "1f", "1d", "", "1.2.3", "--1", ".", "-", "1e", "1e+", "e5", "1 2", "١٢"}) {
            assertTrue(Double.isNaN(DecimalNumber.parseOrNaN(text, true)), text);
        }
    }

    @Test
    void accepts_a_decimal_comma_only_when_asked() {
        assertEquals(1.25, DecimalNumber.parseOrNaN("1,25", true));
        assertTrue(Double.isNaN(DecimalNumber.parseOrNaN("1,25", false)));
    }
}
