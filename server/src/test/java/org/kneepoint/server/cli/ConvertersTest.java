package org.kneepoint.server.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.error.BadInputException;
import picocli.CommandLine.TypeConversionException;

/**
 * The command line's value converters: a value with its unit becomes SI; a value picocli cannot use is a conversion
 * error saying what was expected. Unit factors: 1 kOe = 10⁶/(4π) A/m and 1 kG = 0.1 T (NIST SP 811, 2008, Appendix B.9).
 */
class ConvertersTest {

    @Test
    void flux_density_field_and_magnetization_become_si() throws Exception {
        assertEquals(1.3, new QuantityConverters.FluxDensity().convert("13 kG"), 1e-12);
        assertEquals(1e6 / (4 * Math.PI) * 20, new QuantityConverters.FieldStrength().convert("20 kOe"), 1e-6);
        assertEquals(0.0, new QuantityConverters.FieldStrength().convert(" 0 "));
        assertEquals(1.6e6, new QuantityConverters.Magnetization().convert("1.6e6A/m"), 1e-6);
    }

    @Test
    void a_temperature_becomes_kelvin_within_the_limits_every_front_end_applies() throws Exception {
        assertEquals(393.15, new QuantityConverters.Temperature().convert("120C"), 1e-9);
        assertEquals(293.15, new QuantityConverters.Temperature().convert("68F"), 1e-9);
        assertThrows(TypeConversionException.class, () -> new QuantityConverters.Temperature().convert("6000C"));
        assertThrows(TypeConversionException.class, () -> new QuantityConverters.Temperature().convert("-300C"));
    }

    @Test
    void coefficients_and_percentages_need_their_sign_of_unit() throws Exception {
        assertEquals(-0.12, new QuantityConverters.PercentPerKelvin().convert("-0.12%/K"));
        assertEquals(-0.6, new QuantityConverters.PercentPerKelvin().convert("\u22120.6 %/°C"), "a typographic minus is a minus");
        assertTrue(assertThrows(TypeConversionException.class, () -> new QuantityConverters.PercentPerKelvin().convert("-0.12"))
                .getMessage().endsWith("(no %/K)"));
        assertEquals(2.0, new QuantityConverters.Percent().convert("2%"));
        assertTrue(assertThrows(TypeConversionException.class, () -> new QuantityConverters.Percent().convert("2"))
                .getMessage().endsWith("(no %)"));
        assertThrows(TypeConversionException.class, () -> new QuantityConverters.Percent().convert("1e999%"));
    }

    @Test
    void lengths_and_areas_are_positive_and_in_metres() throws Exception {
        assertEquals(0.01, new LengthConverter().convert("10mm"), 1e-12);
        assertEquals(0.0254 / 2, new LengthConverter().convert("0.5 in"), 1e-12);
        assertThrows(TypeConversionException.class, () -> new LengthConverter().convert("0mm"));
        assertThrows(TypeConversionException.class, () -> new LengthConverter().convert("10 T"));
        assertEquals(1.2e-4, new AreaConverter().convert("120mm²"), 1e-12);
        assertTrue(assertThrows(TypeConversionException.class, () -> new AreaConverter().convert("0 mm2")).getMessage()
                .contains("expected a positive area"));
    }

    @Test
    void points_and_duty_steps_become_conversion_errors_naming_the_problem() throws Exception {
        assertEquals(0.003, new PositionConverter().convert("2,0,3mm").z(), 1e-12);
        assertTrue(assertThrows(TypeConversionException.class, () -> new PositionConverter().convert("2,0,3")).getMessage()
                .endsWith("(no unit)"));
        assertEquals(3, new DutyStepsConverter().convert("20C:0,150C:300kA/m,20C:0").list().size());
        assertTrue(assertThrows(TypeConversionException.class, () -> new DutyStepsConverter().convert("20C")).getMessage()
                .startsWith("step 1 must be"));
    }

    @Test
    void a_file_size_limit_must_be_positive() {
        assertEquals(1000, SizeLimit.of(1000).maxBytes());
        assertTrue(assertThrows(BadInputException.class, () -> SizeLimit.of(0)).getMessage().contains("positive number of bytes"));
    }
}
