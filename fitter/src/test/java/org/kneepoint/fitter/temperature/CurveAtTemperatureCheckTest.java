package org.kneepoint.fitter.temperature;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.curve.DemagnetizationBranch;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.curve.Quantity;
import org.kneepoint.fitter.loadline.AppliedField;
import org.kneepoint.fitter.loadline.DesignCheck;
import org.kneepoint.fitter.loadline.DesignCheckResult;
import org.kneepoint.fitter.loadline.LimitReason;
import org.kneepoint.fitter.loadline.LoadLine;
import org.kneepoint.fitter.loadline.TemperatureModel;
import org.kneepoint.fitter.model.knee.TemperatureModelFitter;

/**
 * The design check on a grade's measured curves (issue 11, item 5): at a measured temperature it works on the
 * measured curve itself, and the loss and the working temperatures stay continuous over fine sweeps of temperature and
 * field although the curves are interpolated data, not a smooth model.
 */
class CurveAtTemperatureCheckTest {

    private static final double[] CELSIUS = {20, 80, 150};
    private static final double NOISE = 5e-4;

    /** Invented sintered-like grade: a recoil line times a logistic knee, Br −0.12 %/K, HcJ falling exponentially, 0.5 mT noise. */
    private static DemagnetizationCurve curve(double celsius, double lowestFraction, long seed) {
        double br = 1.30 * (1 - 0.0012 * (celsius - 20));
        double hcj = 1.9e6 * Math.exp(-0.006 * (celsius - 20));
        double width = (0.03 + 0.0002 * (celsius - 20)) * hcj;
        SplittableRandom random = new SplittableRandom(seed);
        int n = 300;
        double[] h = new double[n];
        double[] j = new double[n];
        for (int i = 0; i < n; i++) {
            h[i] = 3e4 - (3e4 + lowestFraction * hcj) * i / (n - 1);
            j[i] = (br + MU0 * 0.05 * h[i]) * Math.tanh((h[i] + hcj) / width) + NOISE * random.nextGaussian();
        }
        return DemagnetizationCurve.of(Quantity.J, h, j, celsius + 273.15);
    }

    private static List<DemagnetizationCurve> curves(double hottestLowestFraction) {
        List<DemagnetizationCurve> curves = new ArrayList<>();
        for (int i = 0; i < CELSIUS.length; i++) {
            curves.add(curve(CELSIUS[i], i == CELSIUS.length - 1 ? hottestLowestFraction : 1.05, 11 + i));
        }
        return curves;
    }

    private static TemperatureModel model(List<DemagnetizationCurve> curves) {
        return CurveAtTemperature.of(curves, TemperatureModelFitter.fit(curves)).bounded(null);
    }

    @Test
    void at_each_measured_temperature_the_check_reproduces_the_measured_j_at_its_operating_point() {
        List<DemagnetizationCurve> curves = curves(1.05);
        TemperatureModel model = model(curves);
        for (DemagnetizationCurve measured : curves) {
            double[] h = measured.h();
            double[] j = measured.values();
            for (double opposing : new double[] {0, 4e5, 8e5, 1.1e6}) {
                DesignCheckResult check = DesignCheck.of(model, 1.0, AppliedField.opposing(opposing), measured.temperatureK(), 0.01);
                double hOp = check.point().h();
                if (hOp < h[h.length - 1] || hOp > h[0]) {
                    continue;
                }
                // the check works on the measured curve's own monotone interpolant
                assertEquals(DemagnetizationBranch.of(measured).j(hOp), check.point().j(), 1e-12);
                assertFalse(check.pointExtrapolated());
                assertFalse(check.beyondMeasuredField());
                // the measured points either side of H_op bound J there, within the data's noise (the interpolant is monotone)
                int k = 0;
                while (h[k + 1] > hOp) {
                    k++;
                }
                double low = Math.min(j[k], j[k + 1]);
                double high = Math.max(j[k], j[k + 1]);
                assertTrue(check.point().j() >= low - 3 * NOISE && check.point().j() <= high + 3 * NOISE, measured.temperatureK() + " K, Ha "
                        + opposing + ": J = " + check.point().j() + " outside the neighbouring data " + low + " to " + high);
                // and the point is on the load line B = −μ0·Pc·(H + Ha)
                assertEquals(-MU0 * (hOp + opposing), check.point().b(), 1e-9);
            }
        }
    }

    @Test
    void the_loss_is_continuous_over_a_fine_sweep_of_temperature() {
        TemperatureModel model = model(curves(1.05));
        LoadLine line = new LoadLine(1.0, 4e5);
        double low = model.lowestTemperature();
        double high = model.highestTemperature();
        double coarse = largestStep(model, line, low, high, 1.0);
        double fine = largestStep(model, line, low, high, 0.05);
        assertTrue(coarse > 1e-3, "the sweep goes round the knee: largest 1 K step of the loss " + coarse);
        // a jump would show as a step that does not shrink with the step size
        assertTrue(fine <= 3 * coarse * 0.05, "largest 0.05 K step " + fine + " against " + coarse + " per 1 K");
    }

    private static double largestStep(TemperatureModel model, LoadLine line, double low, double high, double step) {
        double largest = 0;
        double previous = DesignCheck.lossAt(model, line, low);
        for (double t = low + step; t <= high; t += step) {
            double loss = DesignCheck.lossAt(model, line, t);
            largest = Math.max(largest, Math.abs(loss - previous));
            previous = loss;
        }
        return largest;
    }

    @Test
    void the_loss_is_continuous_and_does_not_fall_beyond_the_noise_over_a_fine_sweep_of_field() {
        TemperatureModel model = model(curves(1.05));
        for (double celsius : new double[] {20, 50, 80, 117, 150}) {
            double temperature = celsius + 273.15;
            double previous = DesignCheck.lossAt(model, new LoadLine(1.0, 0), temperature);
            double largest = 0;
            for (double opposing = 2e3; opposing <= 3.0e6; opposing += 2e3) {
                double loss = DesignCheck.lossAt(model, new LoadLine(1.0, opposing), temperature);
                assertTrue(loss >= previous - 4 * NOISE / 1.2, celsius + " °C, Ha " + opposing + ": " + previous + " → " + loss);
                largest = Math.max(largest, Math.abs(loss - previous));
                previous = loss;
            }
            // 2 kA/m move H_op by at most 2 kA/m; J changes by at most its steepest slope (about Br/(0.03·HcJ)) times that
            assertTrue(largest < 0.1, celsius + " °C: largest step " + largest);
            assertTrue(previous > 0.1, celsius + " °C: the sweep goes past the knee, loss " + previous);
        }
    }

    @Test
    void the_maximum_working_temperature_moves_continuously_with_the_field_and_meets_the_limit() {
        TemperatureModel model = model(curves(1.05));
        Double previous = null;
        for (double opposing = 2.0e5; opposing <= 4.0e5; opposing += 2e3) {
            DesignCheckResult check = DesignCheck.of(model, 1.0, AppliedField.opposing(opposing), 293.15, 0.01);
            Double top = check.maxWorkingTemperature();
            assertNotNull(top);
            if (check.working().maximum().reason() == LimitReason.LIMIT_REACHED) {
                assertEquals(0.01, DesignCheck.lossAt(model, check.loadLine(), top), 1e-4, "Ha " + opposing);
            }
            if (previous != null) {
                assertTrue(top <= previous + 1e-6, "a stronger field cannot raise the limit: " + previous + " → " + top);
                assertTrue(previous - top < 2.0, "Ha " + opposing + ": " + previous + " → " + top + " K");
            }
            previous = top;
        }
    }

    @Test
    void a_point_beyond_the_measured_field_range_is_flagged_in_the_check() {
        TemperatureModel model = model(curves(0.97));
        double hot = 150 + 273.15;
        DesignCheckResult weak = DesignCheck.of(model, 2.0, AppliedField.opposing(0), hot, 0.01);
        assertFalse(weak.beyondMeasuredField());
        DesignCheckResult strong = DesignCheck.of(model, 1.0, AppliedField.opposing(1.8e6), hot, 0.01);
        assertTrue(strong.beyondMeasuredField());
        assertTrue(strong.irreversibleLoss() > 0.5, "the fitted model carries the curve past the data: " + strong.irreversibleLoss());
    }
}
