package org.kneepoint.fitter.temperature;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.curve.DemagnetizationBranch;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.curve.Quantity;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.model.knee.TemperatureModelFitter;

class CurveAtTemperatureTest {

    private static final double[] CELSIUS = {20, 80, 150};

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
            j[i] = (br + MU0 * 0.05 * h[i]) * Math.tanh(-(-h[i] - hcj) / width) + 5e-4 * random.nextGaussian();
        }
        return DemagnetizationCurve.of(Quantity.J, h, j, celsius + 273.15);
    }

    private static List<DemagnetizationCurve> curves(double hottestLowestFraction) {
        List<DemagnetizationCurve> curves = new ArrayList<>();
        for (int i = 0; i < CELSIUS.length; i++) {
            curves.add(curve(CELSIUS[i], i == CELSIUS.length - 1 ? hottestLowestFraction : 1.05, 3 + i));
        }
        return curves;
    }

    private static CurveAtTemperature model(List<DemagnetizationCurve> curves) {
        return CurveAtTemperature.of(curves, TemperatureModelFitter.fit(curves));
    }

    @Test
    void at_each_measured_temperature_the_curve_is_the_measured_monotone_interpolant() {
        List<DemagnetizationCurve> curves = curves(1.05);
        CurveAtTemperature model = model(curves);
        for (DemagnetizationCurve measured : curves) {
            DemagnetizationBranch branch = DemagnetizationBranch.of(measured);
            TemperatureCurve atT = model.at(measured.temperatureK());
            assertFalse(atT.extrapolated());
            for (int i = 0; i <= 200; i++) {
                double h = branch.lowestH() + (branch.highestH() - branch.lowestH()) * i / 200.0;
                assertEquals(branch.j(h), atT.j(h), 1e-12, "at " + measured.temperatureK() + " K, H = " + h);
                assertFalse(atT.beyondMeasuredField(h));
            }
        }
    }

    @Test
    void between_measured_temperatures_the_curve_is_monotone_in_h_and_reaches_zero_at_its_hcj() {
        CurveAtTemperature model = model(curves(1.05));
        for (double celsius : new double[] {21, 50, 79, 81, 115, 149}) {
            TemperatureCurve atT = model.at(celsius + 273.15);
            double previous = Double.NEGATIVE_INFINITY;
            for (int i = 0; i <= 2000; i++) {
                double h = -1.05 * atT.intrinsicCoercivity() + 1.05 * atT.intrinsicCoercivity() * i / 2000.0;
                double j = atT.j(h);
                assertTrue(j >= previous - 1e-14, "J non-decreasing in H at " + celsius + " °C, H = " + h + ": " + (j - previous));
                previous = j;
            }
            assertEquals(0.0, atT.j(-atT.intrinsicCoercivity()), 1e-9);
        }
    }

    @Test
    void the_curve_is_continuous_in_temperature_across_each_measured_temperature() {
        CurveAtTemperature model = model(curves(1.05));
        for (double celsius : new double[] {20, 80, 150}) {
            double t = celsius + 273.15;
            TemperatureCurve at = model.at(t);
            for (double delta : new double[] {0.1, 0.02}) {
                TemperatureCurve below = model.at(t - delta);
                TemperatureCurve above = model.at(t + delta);
                for (double fraction = 0; fraction <= 0.95; fraction += 0.05) {
                    double h = -fraction * at.intrinsicCoercivity();
                    // the knee moves by |dHcJ/dT|·δ ≈ 0.006·HcJ·δ; J can change at most by its slope times that
                    double allowed = 50 * delta * 0.006 * at.intrinsicCoercivity() * slope(at, h) + 1e-4 * delta;
                    assertEquals(at.j(h), below.j(h), allowed, celsius + " °C − " + delta + " K, H = " + h);
                    assertEquals(at.j(h), above.j(h), allowed, celsius + " °C + " + delta + " K, H = " + h);
                }
            }
        }
    }

    private static double slope(TemperatureCurve curve, double h) {
        double step = 1e-3 * curve.intrinsicCoercivity();
        return Math.abs(curve.j(h + step) - curve.j(h - step)) / (2 * step) + MU0;
    }

    @Test
    void beyond_the_measured_temperatures_the_nearest_curve_is_scaled_and_flagged() {
        List<DemagnetizationCurve> curves = curves(1.05);
        CurveAtTemperature model = model(curves);
        double hot = 170 + 273.15;
        assertTrue(model.isExtrapolated(hot));
        TemperatureCurve atHot = model.at(hot);
        TemperatureCurve at150 = model.at(150 + 273.15);
        assertTrue(atHot.extrapolated());
        assertFalse(at150.extrapolated());
        assertTrue(atHot.remanence() < at150.remanence());
        assertTrue(atHot.intrinsicCoercivity() < at150.intrinsicCoercivity());
        // same shape in reduced coordinates
        for (double fraction : new double[] {0.2, 0.6, 0.9}) {
            assertEquals(at150.j(-fraction * at150.intrinsicCoercivity()) / at150.remanence(),
                    atHot.j(-fraction * atHot.intrinsicCoercivity()) / atHot.remanence(), 1e-12);
        }
        assertThrows(BadInputException.class, () -> model.at(2000));
    }

    @Test
    void an_operating_point_beyond_the_measured_field_range_is_flagged_and_uses_the_fitted_model() {
        List<DemagnetizationCurve> curves = curves(0.97);
        CurveAtTemperature model = model(curves);
        TemperatureCurve hot = model.at(150 + 273.15);
        double lowest = DemagnetizationBranch.of(curves.get(2)).lowestH();
        double pcWeak = 2.0;
        double hWeak = hot.operatingField(pcWeak, 0.0);
        assertTrue(hWeak > lowest);
        assertFalse(hot.beyondMeasuredField(hWeak));
        double hStrong = hot.operatingField(1.0, 1.8e6);
        assertTrue(hStrong < lowest, "the load line meets the curve below the measured range: " + hStrong + " vs " + lowest + ", HcJ " + hot.intrinsicCoercivity());
        assertTrue(hot.beyondMeasuredField(hStrong));
        // continuous where the data end and the model takes over
        assertEquals(hot.j(lowest), hot.j(lowest - 1e-3), 1e-6);
        assertTrue(hot.j(lowest - 0.05 * hot.intrinsicCoercivity()) < hot.j(lowest));
    }
}
