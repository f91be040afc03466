package org.kneepoint.fitter.limits;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.units.SusceptibilityForm;

class PhysicalLimitsTest {

    @Test
    void the_polarization_limit_sits_above_fe_co_and_below_twelve_tesla() {
        // Fe–Co saturation polarization ≈ 2.45 T (Bozorth, Ferromagnetism, 1951 — from memory): must pass.
        assertTrue(PhysicalLimits.POLARIZATION.contains(2.45));
        assertTrue(PhysicalLimits.POLARIZATION.contains(-2.45));
        assertFalse(PhysicalLimits.POLARIZATION.contains(12.8));
        assertFalse(PhysicalLimits.POLARIZATION.contains(Double.NaN));
    }

    @Test
    void below_250_kelvin_or_at_an_unknown_temperature_the_rare_earth_metals_set_the_limit() {
        // Dy and Ho near 4 K: μ0·Ms ≈ 3.7–3.8 T (Coey, Magnetism and Magnetic Materials, 2010 — from memory).
        assertSame(PhysicalLimits.POLARIZATION_CRYOGENIC, PhysicalLimits.polarization(4.2));
        assertSame(PhysicalLimits.POLARIZATION_CRYOGENIC, PhysicalLimits.polarization(null));
        assertSame(PhysicalLimits.POLARIZATION, PhysicalLimits.polarization(293.15));
        assertSame(PhysicalLimits.POLARIZATION, PhysicalLimits.polarization(PhysicalLimits.CRYOGENIC_BELOW_K));
        assertTrue(PhysicalLimits.POLARIZATION_CRYOGENIC.contains(3.8));
    }

    @Test
    void curve_temperatures_reach_past_the_curie_temperature_of_cobalt_and_not_to_1e308_kelvin() {
        // Co: Tc quoted as 1388–1404 K (encyclopedia tables of Curie points — read, secondary).
        assertTrue(PhysicalLimits.CURVE_TEMPERATURE.contains(1404));
        assertTrue(PhysicalLimits.CURVE_TEMPERATURE.contains(4.2));
        assertFalse(PhysicalLimits.CURVE_TEMPERATURE.contains(1e308));
        assertFalse(PhysicalLimits.CURVE_TEMPERATURE.contains(0));
        assertTrue(PhysicalLimits.SUSCEPTIBILITY_TEMPERATURE.contains(3695), "tungsten melts at 3695 K (from memory)");
    }

    @Test
    void densities_of_solids_from_aerogel_to_osmium_pass_and_1e300_does_not() {
        assertTrue(PhysicalLimits.DENSITY.contains(0.16));
        assertTrue(PhysicalLimits.DENSITY.contains(22_590), "osmium, CRC Handbook (from memory)");
        assertTrue(PhysicalLimits.DENSITY.contains(7_500), "sintered NdFeB, common practice");
        assertFalse(PhysicalLimits.DENSITY.contains(1e300));
    }

    @Test
    void the_field_limit_passes_the_100_tesla_pulsed_record_and_refuses_1e20() {
        double hundredTesla = 100 / 1.25663706212e-6;
        assertTrue(PhysicalLimits.FIELD_STRENGTH.contains(-hundredTesla));
        assertFalse(PhysicalLimits.FIELD_STRENGTH.contains(1e20));
    }

    @Test
    void susceptibility_is_checked_as_volume_susceptibility_with_the_density_given_or_the_most_lenient_one() {
        assertTrue(PhysicalLimits.plausibleSusceptibility(-1, SusceptibilityForm.VOLUME, null, null), "perfect diamagnet");
        assertFalse(PhysicalLimits.plausibleSusceptibility(-1.5, SusceptibilityForm.VOLUME, null, null));
        assertTrue(PhysicalLimits.plausibleSusceptibility(-1e-4, SusceptibilityForm.MASS, 8_000.0, null));
        assertFalse(PhysicalLimits.plausibleSusceptibility(-1e-3, SusceptibilityForm.MASS, 8_000.0, null), "χv = −8 < −1");
        assertTrue(PhysicalLimits.plausibleSusceptibility(-1e-3, SusceptibilityForm.MASS, null, null), "no density: lightest solid");
        assertTrue(PhysicalLimits.plausibleSusceptibility(5.5e-8, SusceptibilityForm.MOLAR, 1_800.0, 0.2));
        assertFalse(PhysicalLimits.plausibleSusceptibility(1e300, SusceptibilityForm.MOLAR, null, null));
    }

    @Test
    void a_plausible_range_formats_its_values_in_six_digits_without_trailing_zeros() {
        PlausibleRange range = new PlausibleRange(1e-6, 1500, "K");
        assertEquals("from 1e-06 K to 1500 K", range.describe());
        assertEquals("100000 K", range.format(1e5));
        assertEquals("12.8 K", range.format(12.8));
        assertEquals("1.3e+20 K", range.format(1.3e20));
        assertEquals("0.5", new PlausibleRange(0, 1, "").format(0.5));
    }

    @Test
    void a_plausible_range_needs_ordered_finite_bounds() {
        assertThrows(IllegalArgumentException.class, () -> new PlausibleRange(2, 1, "T"));
        assertThrows(IllegalArgumentException.class, () -> new PlausibleRange(0, Double.POSITIVE_INFINITY, "T"));
        assertThrows(IllegalArgumentException.class, () -> new PlausibleRange(0, 1, null));
    }
}
