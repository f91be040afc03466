package org.kneepoint.fitter.units;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** Conversion factors against their published definitions. */
class UnitFactorsTest {

    private static double si(String text, Dimension dimension) {
        return QuantityParser.parse(text, dimension);
    }

    // NIST SP 811 (2008), Appendix B.8: 1 Oe = (1000/4π) A/m = 79.577 47 A/m.
    @Test
    void one_oersted_is_a_thousand_over_four_pi_amperes_per_metre() {
        assertEquals(1000.0 / (4 * Math.PI), si("1 Oe", Dimension.FIELD_STRENGTH), 1e-12);
        assertEquals(79.5774715459, si("1 Oe", Dimension.FIELD_STRENGTH), 1e-9);
        assertEquals(1e6 / (4 * Math.PI), si("1 kOe", Dimension.FIELD_STRENGTH), 1e-9);
    }

    // NIST SP 811 (2008), Appendix B.8: 1 G = 1e-4 T.
    @Test
    void one_gauss_is_ten_to_the_minus_four_tesla() {
        assertEquals(1e-4, si("1 G", Dimension.FLUX_DENSITY), 1e-18);
        assertEquals(1.2, si("12 kG", Dimension.FLUX_DENSITY), 1e-15);
        assertEquals(0.35, si("350 mT", Dimension.FLUX_DENSITY), 1e-15);
    }

    // 1 MGOe = 1e6 G·Oe = 1e6 · 1e-4 T · 1000/(4π) A/m = 100/(4π) kJ/m³ (NIST SP 811, B.8;
    // Magnetics Society of Japan units table, (BH)max row).
    @Test
    void one_mgoe_is_a_hundred_over_four_pi_kilojoules_per_cubic_metre() {
        assertEquals(100.0 / (4 * Math.PI) * 1e3, si("1 MGOe", Dimension.ENERGY_PRODUCT), 1e-9);
        assertEquals(350e3, si("350 kJ/m³", Dimension.ENERGY_PRODUCT), 1e-9);
    }

    // NIST SP 811 (2008), B.8: 1 in = 0.0254 m exactly; B.9: T/K = t/°C + 273.15, t/°F = 1.8·t/°C + 32.
    @Test
    void lengths_and_temperatures_follow_their_definitions() {
        assertEquals(0.0254, si("1 in", Dimension.LENGTH), 1e-15);
        assertEquals(12e-6, si("12 µm", Dimension.LENGTH), 1e-18);
        assertEquals(12e-6, si("12 um", Dimension.LENGTH), 1e-18);
        assertEquals(293.15, si("20 °C", Dimension.TEMPERATURE), 1e-12);
        assertEquals(293.15, si("20C", Dimension.TEMPERATURE), 1e-12);
        assertEquals(273.15, si("32 °F", Dimension.TEMPERATURE), 1e-12);
        assertEquals(373.15, si("212 °F", Dimension.TEMPERATURE), 1e-12);
        assertEquals(0.0, si("-459.67 °F", Dimension.TEMPERATURE), 1e-12);
    }

    // IEEE Trans. Magn. author guide, "Units for magnetic properties", Table I: volume χ_SI = 4π·χ_CGS;
    // mass 1 cm³/g = 4π·1e-3 m³/kg; molar 1 cm³/mol = 4π·1e-6 m³/mol; 1 emu/cm³ = 1e3 A/m.
    @Test
    void cgs_susceptibilities_and_magnetization_convert_by_four_pi_factors() {
        assertEquals(4 * Math.PI * -7.19e-7, si("-7.19e-7 cgs", Dimension.VOLUME_SUSCEPTIBILITY), 1e-20);
        assertEquals(4 * Math.PI * 1e-3, si("1 cm³/g", Dimension.MASS_SUSCEPTIBILITY), 1e-18);
        assertEquals(4 * Math.PI * 1e-6, si("1 cm3/mol", Dimension.MOLAR_SUSCEPTIBILITY), 1e-20);
        assertEquals(1e3, si("1 emu/cm3", Dimension.MAGNETIZATION), 1e-12);
    }

    // Water: molar −12.97e-6 cm³/mol (CRC Handbook, from memory), 0.998 g/cm³, 18.015 g/mol gives the
    // tabulated volume value −9.04e-6 SI (Wikipedia, "Magnetic susceptibility", table) within 0.2 %.
    @Test
    void water_molar_susceptibility_converts_to_its_tabulated_volume_value() {
        double molar = si("-12.97e-6 cm³/mol", Dimension.MOLAR_SUSCEPTIBILITY);
        SusceptibilityConverter water = new SusceptibilityConverter(998.0, 0.018015);
        double volume = water.toVolume(molar, SusceptibilityForm.MOLAR);
        assertEquals(-9.04e-6, volume, 0.002 * 9.04e-6);
        assertEquals(molar, water.fromVolume(volume, SusceptibilityForm.MOLAR), 1e-22);
    }
}
