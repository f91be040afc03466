package org.kneepoint.importer.plausible;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.curve.Quantity;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.fitter.limits.PhysicalLimits;

class PlausibleInputTest {

    private static final InputLocation AT = InputLocation.line("f.csv", 3);

    @Test
    void plain_names_pass_unchanged_and_null_stays_null() {
        assertEquals("N42SH", PlausibleInput.text(AT, "grade", "N42SH", false));
        assertNull(PlausibleInput.text(AT, "notes", null, true));
        assertEquals("two\nlines", PlausibleInput.text(AT, "notes", "two\nlines", true));
    }

    @Test
    void a_name_with_a_line_break_or_an_override_is_refused_with_the_character_and_its_position() {
        assertEquals("f.csv, line 3: supplier holds U+000A (a control character) at character 4; names may not hold control or"
                + " bidirectional formatting characters",
                assertThrows(BadInputException.class, () -> PlausibleInput.text(AT, "supplier", "abc\ndef", false)).getMessage());
        assertEquals("f.csv, line 3: notes holds U+2067 (a bidirectional formatting character) at character 2; texts may not hold"
                + " control or bidirectional formatting characters",
                assertThrows(BadInputException.class, () -> PlausibleInput.text(AT, "notes", "a\u2067b", true)).getMessage());
    }

    @Test
    void a_value_out_of_range_names_the_range() {
        assertEquals(7500.0, PlausibleInput.within(AT, "density", 7500, PhysicalLimits.DENSITY));
        assertEquals("f.csv, line 3: density 1e+300 kg/m³ is outside what is plausible (from 0.1 kg/m³ to 23000 kg/m³; see the limits"
                + " in docs/curve-file-format.md)",
                assertThrows(BadInputException.class, () -> PlausibleInput.within(AT, "density", 1e300, PhysicalLimits.DENSITY)).getMessage());
    }

    @Test
    void an_implausible_curve_is_refused_at_the_place_the_caller_gives_for_the_finding() {
        DemagnetizationCurve good = DemagnetizationCurve.of(Quantity.J, new double[] {0, -1e5}, new double[] {1.2, 1.1}, 293.15);
        assertSame(good, PlausibleInput.curve(good, finding -> AT));
        DemagnetizationCurve bad = DemagnetizationCurve.of(Quantity.J, new double[] {0, -1e5}, new double[] {12.8, 12.6}, 293.15);
        BadInputException error = assertThrows(BadInputException.class,
                () -> PlausibleInput.curve(bad, finding -> InputLocation.cell("f.csv", 10 + finding.point(), 2, "J [T]")));
        assertEquals("f.csv, line 10, column 2 (J [T]): J = 12.8 T, beyond what any known material reaches (J from -3 T to 3 T at 250 K"
                + " and above)", error.getMessage());
    }
}
