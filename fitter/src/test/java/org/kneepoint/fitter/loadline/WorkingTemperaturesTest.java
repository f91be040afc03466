package org.kneepoint.fitter.loadline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

class WorkingTemperaturesTest {

    private final LinearTemperatureLaw neodymium = Grades.neodymiumLaw();

    /** An invented hard ferrite: Br 0.4 T, μrec 1.1, HcJ 260 kA/m, Hk 230 kA/m, α −0.2 %/K, β +0.3 %/K (round numbers). */
    private static LinearTemperatureLaw ferrite() {
        return LinearTemperatureLaw.ofPercentPerKelvin(LinearRecoilKnee.withKneeField(0.4, 1.1, 2.6e5, 2.3e5), -0.2, 0.3, 293.15);
    }

    @Test
    void loss_at_the_maximum_working_temperature_equals_each_limit_within_a_hundredth_of_a_point() {
        // issue 11: 0.1 %, 1 %, 5 % and 7 % once gave one temperature (where the point met the knee)
        LoadLine line = new LoadLine(1.0, 1e5);
        List<Double> maxima = new ArrayList<>();
        for (double limit : new double[] {0.001, 0.01, 0.05, 0.07}) {
            WorkingLimit maximum = WorkingTemperatures.of(neodymium, line, 293.15, limit).maximum();
            assertEquals(LimitReason.LIMIT_REACHED, maximum.reason());
            assertEquals(limit, DesignCheck.lossAt(neodymium, line, maximum.temperature()), 1e-4);
            maxima.add(maximum.temperature());
        }
        for (int k = 1; k < maxima.size(); k++) {
            assertTrue(maxima.get(k) > maxima.get(k - 1) + 0.1, "limits give distinct temperatures: " + maxima);
        }
    }

    @Test
    void a_ferrite_has_a_minimum_working_temperature_where_its_loss_on_cooling_reaches_the_limit() {
        // β > 0: HcJ falls on cooling while Br rises, so the knee comes to the operating point in the cold
        LinearTemperatureLaw ferrite = ferrite();
        LoadLine line = new LoadLine(0.5, 0.0);
        WorkingRange range = WorkingTemperatures.of(ferrite, line, 293.15, 0.01);
        assertEquals(LimitReason.LIMIT_REACHED, range.minimum().reason());
        assertTrue(range.minimum().temperature() < 293.15);
        assertEquals(0.01, DesignCheck.lossAt(ferrite, line, range.minimum().temperature()), 1e-4);
        assertTrue(DesignCheck.lossAt(ferrite, line, range.minimum().temperature() - 1) > 0.01);
    }

    @Test
    void neodymium_cooled_keeps_its_flux_down_to_the_bottom_of_the_model_and_says_so() {
        WorkingLimit minimum = WorkingTemperatures.of(neodymium, new LoadLine(1.0, 0.0), 293.15, 0.01).minimum();
        assertEquals(LimitReason.MODEL_RANGE_EDGE, minimum.reason());
        assertEquals(neodymium.lowestTemperature(), minimum.temperature(), 0.0);
    }

    @Test
    void a_law_that_never_loses_reaches_the_top_of_its_range_and_says_so() {
        LinearTemperatureLaw steady = LinearTemperatureLaw.ofPercentPerKelvin(Grades.neodymium(), 0.0, 0.0, 293.15);
        WorkingLimit maximum = WorkingTemperatures.of(steady, new LoadLine(2.0, 0.0), 293.15, 0.01).maximum();
        assertEquals(LimitReason.MODEL_RANGE_EDGE, maximum.reason());
        assertEquals(steady.highestTemperature(), maximum.temperature(), 0.0);
    }

    @Test
    void no_working_temperature_when_the_limit_is_exceeded_everywhere() {
        LinearTemperatureLaw steady = LinearTemperatureLaw.ofPercentPerKelvin(Grades.neodymium(), 0.0, 0.0, 293.15);
        WorkingRange range = WorkingTemperatures.of(steady, new LoadLine(1.0, 2.5e6), 293.15, 0.01);
        assertNull(range.minimum().temperature());
        assertEquals(LimitReason.NONE_IN_RANGE, range.maximum().reason());
    }

    @Test
    void a_check_above_its_maximum_still_reports_the_maximum_below_it() {
        LoadLine line = new LoadLine(1.0, 1e5);
        WorkingLimit fromReference = WorkingTemperatures.of(neodymium, line, 293.15, 0.01).maximum();
        WorkingLimit fromHot = WorkingTemperatures.of(neodymium, line, fromReference.temperature() + 20, 0.01).maximum();
        assertEquals(fromReference.temperature(), fromHot.temperature(), 1e-5);
    }

    @Test
    void each_limit_says_whether_it_rests_on_an_extrapolated_curve() {
        // a model measured only up to 100 °C: temperatures above it are extrapolated
        TemperatureModel measuredTo100 = new TemperatureModel() {
            @Override
            public IntrinsicCurve at(double temperature) {
                return neodymium.at(temperature);
            }

            @Override
            public double referenceTemperature() {
                return neodymium.referenceTemperature();
            }

            @Override
            public double remanenceRatio(double temperature) {
                return neodymium.remanenceRatio(temperature);
            }

            @Override
            public double lowestTemperature() {
                return 233.15;
            }

            @Override
            public double highestTemperature() {
                return neodymium.highestTemperature();
            }

            @Override
            public boolean isExtrapolated(double temperature) {
                return temperature > 373.15;
            }
        };
        DesignCheckResult check = DesignCheck.of(measuredTo100, new LoadLine(1.0, 0.0), 353.15, 0.01);
        assertFalse(check.pointExtrapolated());
        assertFalse(check.working().minimum().extrapolated());
        assertTrue(check.maxWorkingTemperature() > 373.15);
        assertTrue(check.working().maximum().extrapolated());
        assertTrue(check.extrapolated());
    }
}
