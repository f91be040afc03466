package org.kneepoint.fitter.loadline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class DesignCheckTest {

    private final LinearTemperatureLaw law = Grades.neodymiumLaw();

    @Test
    void knee_margin_in_kelvin_brings_the_knee_to_the_operating_point() {
        LoadLine line = new LoadLine(1.0, 1e5);
        DesignCheckResult result = DesignCheck.of(law, line, 353.15, DesignCheck.DEFAULT_LOSS_LIMIT);
        assertTrue(result.kneeMarginField() > 0);
        double hotter = 353.15 + result.kneeMarginTemperature();
        LinearRecoilKnee curve = law.at(hotter);
        assertEquals(curve.kneeField().orElseThrow(), line.on(curve).h(), 1e-3 * 1.6e6 * 1e-2);
    }

    @Test
    void maximum_working_temperature_sits_at_the_loss_limit() {
        LoadLine line = new LoadLine(1.0, 1e5);
        DesignCheckResult result = DesignCheck.of(law, line, 293.15, 0.05);
        double maximum = result.maxWorkingTemperature();
        assertTrue(DesignCheck.lossAt(law, line, maximum - 0.01) <= 0.05);
        assertTrue(DesignCheck.lossAt(law, line, maximum + 0.01) > 0.05);
    }

    @Test
    void reversible_change_is_the_remanence_ratio_minus_one() {
        DesignCheckResult result = DesignCheck.of(law, new LoadLine(2.0, 0.0), 373.15, DesignCheck.DEFAULT_LOSS_LIMIT);
        assertEquals(-0.0012 * 80, result.reversibleChange(), 1e-12);
        assertEquals(0.0, result.irreversibleLoss(), 1e-9);
    }

    @Test
    void a_check_that_exceeds_the_limit_reports_the_maximum_below_its_temperature() {
        // issue 11: the working range is where loss(T) ≤ limit; a check beyond it still learns where that range ends
        LoadLine line = new LoadLine(5.0, 1.7e6);
        DesignCheckResult result = DesignCheck.of(law, line, 293.15, 0.01);
        assertTrue(result.irreversibleLoss() > 0.01);
        assertTrue(result.maxWorkingTemperature() < 293.15);
        assertEquals(LimitReason.LIMIT_REACHED, result.working().maximum().reason());
        assertEquals(0.01, DesignCheck.lossAt(law, line, result.maxWorkingTemperature()), 1e-4);
    }

    @Test
    void an_external_field_on_a_free_magnet_loses_more_than_the_same_circuit_field() {
        DesignCheckResult circuit = DesignCheck.of(law, 2.0, AppliedField.opposing(3e5), 393.15, 0.01);
        DesignCheckResult external = DesignCheck.of(law, 2.0, AppliedField.external(3e5), 393.15, 0.01);
        assertEquals(4.5e5, external.loadLine().opposingField(), 1e-6);
        assertEquals(FieldConvention.EXTERNAL, external.appliedField().convention());
        assertTrue(external.irreversibleLoss() > circuit.irreversibleLoss());
        assertTrue(external.maxWorkingTemperature() < circuit.maxWorkingTemperature());
    }
}
