package org.kneepoint.fitter.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.kneepoint.fitter.error.BadInputException;

class ToleranceSpecTest {

    @Test
    void symmetric_percent_band_in_both_spellings() {
        for (String text : new String[] {"br=±2%", "br=+-2%"}) {
            ToleranceSpec spec = ToleranceSpec.parse(text, "--tolerance");
            assertEquals(ToleranceName.BR, spec.name());
            assertEquals(new ToleranceBand(-0.02, 0.02, true), spec.band());
        }
    }

    @Test
    void absolute_bands_are_read_in_the_inputs_units() {
        assertEquals(new ToleranceBand(-5e-5, 5e-5, false), ToleranceSpec.parse("length=±0.05mm", "--tolerance").band());
        assertEquals(new ToleranceBand(-5.0, 5.0, false), ToleranceSpec.parse("temperature=±5K", "--tolerance").band());
        ToleranceBand field = ToleranceSpec.parse("opposing-field=-0kA/m..+20kA/m", "--tolerance").band();
        assertEquals(0.0, field.lower(), 0.0);
        assertEquals(2e4, field.upper(), 1e-9);
        assertEquals(new ToleranceBand(-0.02, 0.02, false), ToleranceSpec.parse("mu-rec=±0.02", "--tolerance").band());
    }

    @Test
    void asymmetric_band_runs_from_its_lower_to_its_upper_end() {
        ToleranceSpec spec = ToleranceSpec.parse("hcj=-5%..+0%", "--tolerance");
        assertEquals(new ToleranceBand(-0.05, 0.0, true), spec.band());
        assertEquals(0.975 * 2.0, spec.band().value(2.0, 0.0), 1e-15);
        assertEquals(0.95 * 2.0, spec.band().value(2.0, -1.0), 1e-15);
    }

    @ParameterizedTest
    @ValueSource(strings = {"br=±", "br=±-2%", "flux=±2%", "br2%", "br=2%", "br=+0%..-5%", "br=-5%..+0.01T", "temperature=±5°C",
        "length=±5", "br=±2%%", "pc=±2mm"})
    void bad_specs_are_refused_with_one_line_naming_the_option(String text) {
        BadInputException refused = assertThrows(BadInputException.class, () -> ToleranceSpec.parse(text, "--tolerance"));
        assertTrue(refused.getMessage().startsWith("--tolerance '" + text + "': "), refused.getMessage());
        assertTrue(!refused.getMessage().contains("\n"), refused.getMessage());
    }
}
