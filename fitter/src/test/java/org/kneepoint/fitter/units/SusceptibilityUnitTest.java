package org.kneepoint.fitter.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class SusceptibilityUnitTest {

    @ParameterizedTest
    @ValueSource(strings = {"emu/g", "emu/mol"})
    void a_moment_per_gram_or_mole_is_refused_as_a_susceptibility_naming_the_right_units(String unit) {
        // the bug: emu/g and emu/mol were taken as cm³/g and cm³/mol; they are magnetizations (moment per
        // amount), and a susceptibility in CGS is emu/(g·Oe) = cm³/g (IEEE Trans. Magn. author guide,
        // "Units for magnetic properties", Table I)
        IllegalArgumentException refused = assertThrows(IllegalArgumentException.class,
                () -> SusceptibilityForm.unitOf(unit));
        assertTrue(refused.getMessage().contains("not a susceptibility"), refused.getMessage());
        assertTrue(refused.getMessage().contains("cm³/g") && refused.getMessage().contains("cm³/mol")
                && refused.getMessage().contains("emu/(g·Oe)"), refused.getMessage());
        IllegalArgumentException parsed = assertThrows(IllegalArgumentException.class,
                () -> QuantityParser.parse("1 " + unit, Dimension.MASS_SUSCEPTIBILITY));
        assertTrue(parsed.getMessage().contains("not a susceptibility"), parsed.getMessage());
    }

    @Test
    void emu_per_gram_oersted_is_the_cgs_mass_susceptibility() {
        // in CGS emu/Oe = cm³, so emu/(g·Oe) = cm³/g = 4π·1e-3 m³/kg (same Table I)
        assertEquals(4 * Math.PI * 1e-3, QuantityParser.parse("1 emu/(g·Oe)", Dimension.MASS_SUSCEPTIBILITY), 1e-18);
        assertEquals(4 * Math.PI * 1e-6, QuantityParser.parse("1 emu/(mol·Oe)", Dimension.MOLAR_SUSCEPTIBILITY), 1e-20);
        assertEquals(SusceptibilityForm.MASS.dimension(), SusceptibilityForm.unitOf("cm³/g").dimension());
    }

    @Test
    void a_word_that_is_no_unit_is_refused_with_every_susceptibility_unit_named() {
        IllegalArgumentException refused = assertThrows(IllegalArgumentException.class,
                () -> SusceptibilityForm.unitOf("furlong"));
        assertTrue(refused.getMessage().contains("m³/kg") && refused.getMessage().contains("'furlong'"),
                refused.getMessage());
    }
}
