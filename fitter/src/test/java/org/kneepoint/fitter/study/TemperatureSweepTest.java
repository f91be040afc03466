package org.kneepoint.fitter.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.loadline.AppliedField;
import org.kneepoint.fitter.loadline.DesignCheck;
import org.kneepoint.fitter.loadline.DesignCheckResult;
import org.kneepoint.fitter.loadline.LinearRecoilKnee;
import org.kneepoint.fitter.loadline.LinearTemperatureLaw;

class TemperatureSweepTest {

    private static final LinearTemperatureLaw LAW = LinearTemperatureLaw.ofPercentPerKelvin(
            LinearRecoilKnee.withKneeField(1.3, 1.05, 1.6e6, 1.45e6), -0.12, -0.6, 293.15);

    @Test
    void every_step_is_the_check_at_its_temperature() {
        TemperatureSweep sweep = TemperatureSweep.run(LAW, 1.0, AppliedField.opposing(1e5), 293.15, 433.15, 10.0, 0.01);
        assertEquals(15, sweep.points().size());
        for (SweepPoint point : sweep.points()) {
            DesignCheckResult check = DesignCheck.of(LAW, 1.0, AppliedField.opposing(1e5), point.temperature(), 0.01);
            assertEquals(check.point().b(), point.b(), 0.0);
            assertEquals(check.irreversibleLoss(), point.irreversibleLoss(), 0.0);
            assertEquals(check.reversibleChange(), point.reversibleChange(), 0.0);
            assertEquals(check.kneeMarginField(), point.kneeMarginH(), 0.0);
        }
        assertEquals(DesignCheck.of(LAW, 1.0, AppliedField.opposing(1e5), 293.15, 0.01).maxWorkingTemperature(),
                sweep.working().maximum().temperature());
    }

    @Test
    void reversible_change_follows_the_linear_law_and_the_last_temperature_is_the_end() {
        // Br(T)/Br(T0) − 1 = α·(T − T0) (the linear law, docs/references.md §6b)
        TemperatureSweep sweep = TemperatureSweep.run(LAW, 2.0, AppliedField.NONE, 293.15, 318.15, 10.0, 0.01);
        assertEquals(4, sweep.points().size());
        assertEquals(318.15, sweep.points().get(3).temperature(), 0.0);
        assertEquals(-0.0012 * 25, sweep.points().get(3).reversibleChange(), 1e-12);
        assertTrue(sweep.points().get(0).irreversibleLoss() < 1e-6);
    }

    @Test
    void bad_ranges_are_refused() {
        assertThrows(BadInputException.class, () -> TemperatureSweep.run(LAW, 1, AppliedField.NONE, 300, 290, 1, 0.01));
        assertThrows(BadInputException.class, () -> TemperatureSweep.run(LAW, 1, AppliedField.NONE, 290, 300, 0, 0.01));
        assertThrows(BadInputException.class, () -> TemperatureSweep.run(LAW, 1, AppliedField.NONE, 290, 900, 1, 0.01));
        assertThrows(BadInputException.class, () -> TemperatureSweep.run(LAW, 1, AppliedField.NONE, 290, 300, 1e-5, 0.01));
    }
}
