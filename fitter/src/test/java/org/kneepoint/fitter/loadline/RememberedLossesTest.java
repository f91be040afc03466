package org.kneepoint.fitter.loadline;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Test;

class RememberedLossesTest {

    private final LinearTemperatureLaw neodymium = Grades.neodymiumLaw();

    /** The law, counting the curves asked of it. */
    private static TemperatureModel counting(TemperatureModel model, AtomicInteger curves) {
        return new TemperatureModel() {
            @Override
            public IntrinsicCurve at(double temperature) {
                curves.incrementAndGet();
                return model.at(temperature);
            }

            @Override
            public double referenceTemperature() {
                return model.referenceTemperature();
            }

            @Override
            public double remanenceRatio(double temperature) {
                return model.remanenceRatio(temperature);
            }

            @Override
            public double lowestTemperature() {
                return model.lowestTemperature();
            }

            @Override
            public double highestTemperature() {
                return model.highestTemperature();
            }
        };
    }

    @Test
    void remembered_losses_give_the_same_check_to_the_last_bit_at_every_temperature() {
        RememberedLosses remembered = new RememberedLosses(neodymium);
        for (LoadLine line : new LoadLine[] {new LoadLine(1.0, 1e5), new LoadLine(0.6, 4e5), new LoadLine(2.5, 0.0)}) {
            for (int round = 0; round < 2; round++) {
                for (double celsius = -20; celsius <= 180; celsius += 7.5) {
                    double temperature = 273.15 + celsius;
                    assertEquals(DesignCheck.of(neodymium, line, temperature, 0.02), DesignCheck.of(remembered, line, temperature, 0.02),
                            line + " at " + celsius + " °C");
                }
            }
        }
    }

    @Test
    void a_loss_asked_again_on_the_same_line_is_not_computed_again_and_another_line_is() {
        AtomicInteger curves = new AtomicInteger();
        RememberedLosses remembered = new RememberedLosses(counting(neodymium, curves));
        LoadLine line = new LoadLine(1.0, 1e5);
        double first = remembered.irreversibleLoss(line, 400.0);
        assertEquals(1, curves.get());
        assertEquals(first, remembered.irreversibleLoss(line, 400.0));
        assertEquals(1, curves.get());
        assertEquals(neodymium.irreversibleLoss(line.withOpposingField(3e5), 400.0), remembered.irreversibleLoss(line.withOpposingField(3e5), 400.0));
        assertEquals(2, curves.get());
        remembered.irreversibleLoss(line, Math.nextUp(400.0));
        assertEquals(3, curves.get());
    }

    @Test
    void working_temperatures_at_a_new_check_temperature_compute_few_losses_once_the_grid_is_kept() {
        AtomicInteger curves = new AtomicInteger();
        RememberedLosses remembered = new RememberedLosses(counting(neodymium, curves));
        LoadLine line = new LoadLine(1.0, 1e5);
        WorkingTemperatures.of(remembered, line, 350.0, 0.01);
        int firstSearch = curves.get();
        WorkingTemperatures.of(remembered, line, 351.3, 0.01);
        assertEquals(true, firstSearch > WorkingTemperatures.STEPS, "the first search tabulates the grid: " + firstSearch);
        assertEquals(true, curves.get() - firstSearch <= 2, "the second computed " + (curves.get() - firstSearch) + " curves");
    }

    @Test
    void the_ranking_parts_equal_those_of_the_full_check() {
        for (double celsius = 0; celsius <= 160; celsius += 20) {
            double temperature = 273.15 + celsius;
            DesignCheckResult full = DesignCheck.of(neodymium, 1.2, AppliedField.opposing(2e5), temperature, 0.01);
            LossCheck ranking = DesignCheck.forRanking(neodymium, 1.2, AppliedField.opposing(2e5), temperature, 0.01);
            assertEquals(new LossCheck(full.point(), full.kneeField(), full.irreversibleLoss(), full.working(), full.beyondMeasuredField()),
                    ranking);
            assertEquals(full.kneeMarginField(), ranking.kneeMarginField());
            assertEquals(full.maxWorkingTemperature(), ranking.maxWorkingTemperature());
        }
    }
}
