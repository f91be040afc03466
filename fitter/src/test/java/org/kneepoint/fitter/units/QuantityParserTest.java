package org.kneepoint.fitter.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class QuantityParserTest {

    @ParameterizedTest
    @ValueSource(strings = {"1.2T", "1.2 T", "1.2 tesla", " 1.2   T ", "1200 mT", "12 kG", "12000 G", "1.2e0 T"})
    void accepts_the_usual_spellings_of_a_flux_density(String text) {
        assertEquals(1.2, QuantityParser.parse(text, Dimension.FLUX_DENSITY), 1e-12);
    }

    @Test
    void accepts_the_unicode_minus_sign() {
        assertEquals(-955e3, QuantityParser.parse("\u2212955 kA/m", Dimension.FIELD_STRENGTH), 1e-9);
    }

    @Test
    void refuses_a_flux_density_where_a_field_strength_is_expected_and_says_what_was_expected() {
        var error = assertThrows(IllegalArgumentException.class,
                () -> QuantityParser.parse("1.2 T", Dimension.FIELD_STRENGTH));
        assertEquals("expected a field strength such as 955 kA/m or 12 kOe, got '1.2 T' ('T' is a flux density unit)",
                error.getMessage());
    }

    @ParameterizedTest
    @ValueSource(strings = {"", "  ", "T", "1.2", "NaN T", "Infinity T", "1.2 furlong", "0x1p3 T", "1.2d T", "1,2 T"})
    void refuses_anything_that_is_not_a_number_with_a_known_unit(String text) {
        var error = assertThrows(IllegalArgumentException.class,
                () -> QuantityParser.parse(text, Dimension.FLUX_DENSITY));
        assertEquals(true, error.getMessage().startsWith("expected a flux density such as 1.2 T or 12 kG"),
                error.getMessage());
    }

    @Test
    void never_guesses_the_case_of_a_prefix() {
        assertThrows(IllegalArgumentException.class, () -> QuantityParser.parse("1 mA/m", Dimension.FIELD_STRENGTH));
        assertThrows(IllegalArgumentException.class, () -> QuantityParser.parse("1 t", Dimension.FLUX_DENSITY));
    }

    @Test
    void refuses_values_that_overflow_when_converted() {
        assertThrows(IllegalArgumentException.class, () -> QuantityParser.parse("1e308 kOe", Dimension.FIELD_STRENGTH));
    }

    @Test
    void formatting_then_parsing_returns_the_value_to_the_digits_kept() {
        SplittableRandom random = new SplittableRandom(20261202L);
        for (String symbol : new String[] {"kOe", "Oe", "kA/m", "MA/m", "A/m"}) {
            Unit unit = UnitCatalog.require(symbol, Dimension.FIELD_STRENGTH);
            for (int trial = 0; trial < 300; trial++) {
                double field = random.nextDouble(-3e6, 3e6);
                String text = QuantityFormatter.format(field, unit, 12);
                double back = QuantityParser.parse(text, Dimension.FIELD_STRENGTH);
                assertEquals(field, back, 1e-10 * Math.abs(field), text);
            }
        }
    }
}
