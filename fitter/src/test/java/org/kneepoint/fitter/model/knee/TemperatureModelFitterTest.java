package org.kneepoint.fitter.model.knee;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.error.BadInputException;

class TemperatureModelFitterTest {

    private static final double[] CELSIUS = {20, 60, 100, 140, 180};

    /** Invented grade: Br linear in T (α = −0.12 %/K), HcJ exponential in T (slope −0.55 %/K at 20 °C): not the model's own law. */
    private static List<DemagnetizationCurve> curves(double noise) {
        List<DemagnetizationCurve> curves = new ArrayList<>();
        for (int i = 0; i < CELSIUS.length; i++) {
            double br = 1.27 * (1 - 0.0012 * (CELSIUS[i] - 20));
            double hcj = 2.0e6 * Math.exp(-0.0055 * (CELSIUS[i] - 20));
            DemagnetizationCurve curve = DemagnetizationForms.sampled(h -> KneeFitterTest.multiplicativeKnee(h, br, 1.05, hcj, 0.03 * hcj),
                    5e4, -1.02 * hcj, 400, noise, 7 + i);
            curves.add(curve.withTemperatureK(CELSIUS[i] + 273.15));
        }
        return curves;
    }

    @Test
    void alpha_and_beta_match_the_least_squares_lines_of_the_generating_law() {
        TemperatureFit fit = TemperatureModelFitter.fit(curves(0));
        assertEquals(-0.0012, fit.alpha(), 0.02 * 0.0012);
        // β of the least-squares line through the generating HcJ values, computed here directly:
        double[] t = new double[CELSIUS.length];
        double[] hcj = new double[CELSIUS.length];
        for (int i = 0; i < t.length; i++) {
            t[i] = CELSIUS[i] + 273.15;
            hcj[i] = 2.0e6 * Math.exp(-0.0055 * (CELSIUS[i] - 20));
        }
        double[] line = LeastSquaresLine.line(t, hcj, 293.15);
        assertEquals(line[1] / line[0], fit.beta(), 0.03 * Math.abs(line[1] / line[0]));
        assertTrue(fit.beta2() > 0, "HcJ falls more slowly as it gets hot, as an exponential does");
        assertEquals(0.0, fit.muRecSlope(), 1e-4);
    }

    @Test
    void at_a_measured_temperature_the_model_reproduces_that_measurement_within_its_fit_residual() {
        List<DemagnetizationCurve> curves = curves(0.002);
        TemperatureFit fit = TemperatureModelFitter.fit(curves);
        for (int i = 0; i < curves.size(); i++) {
            DemagnetizationCurve curve = curves.get(i);
            KneeCurve model = fit.model().at(curve.temperatureK());
            KneeFit own = fit.fits().get(i);
            double[] h = curve.h();
            double[] j = curve.values();
            double sumSquares = 0;
            int used = 0;
            for (int k = 0; k < h.length; k++) {
                if (h[k] >= own.lowestH()) {
                    sumSquares += Math.pow(j[k] - model.j(h[k]), 2);
                    used++;
                }
            }
            assertEquals(own.rmsJ(), Math.sqrt(sumSquares / used), 0.05 * own.rmsJ());
            assertFalse(fit.model().isExtrapolated(curve.temperatureK()));
        }
    }

    @Test
    void reference_temperature_is_20C_when_the_model_reaches_it_else_the_nearest_measured_one() {
        assertEquals(293.15, TemperatureModelFitter.fit(curves(0)).referenceTemperatureK(), 0.0);
        // measured at 100 to 180 °C: the model reaches down to 50 °C only (half the span, at least 50 K)
        List<DemagnetizationCurve> hot = curves(0).subList(2, CELSIUS.length);
        TemperatureFit fit = TemperatureModelFitter.fit(hot);
        assertEquals(373.15, fit.referenceTemperatureK(), 1e-9);
        assertEquals(373.15, fit.model().referenceTemperature(), 1e-9);
        assertEquals(1.0, fit.model().remanenceRatio(373.15), 1e-12);
        assertEquals(-0.0012 / (1 - 0.0012 * 80), fit.alpha(), 0.02 * 0.0012);
    }

    @Test
    void temperatures_beyond_the_measured_range_are_flagged_and_bounded() {
        TemperatureFit fit = TemperatureModelFitter.fit(curves(0));
        assertTrue(fit.model().isExtrapolated(473.15 + 20));
        assertTrue(fit.model().at(473.15).intrinsicCoercivity() < fit.model().at(453.15).intrinsicCoercivity());
        assertThrows(BadInputException.class, () -> fit.model().at(1000));
    }

    @Test
    void duplicate_and_single_temperatures_are_refused() {
        List<DemagnetizationCurve> curves = curves(0);
        var error = assertThrows(BadInputException.class,
                () -> TemperatureModelFitter.fit(List.of(curves.get(0), curves.get(0))));
        assertTrue(error.getMessage().startsWith("two curves at 293.15 K"), error.getMessage());
        assertThrows(BadInputException.class, () -> TemperatureModelFitter.fit(List.of(curves.get(1))));
    }
}
