package org.kneepoint.fitter.model.curieweiss;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.error.BadInputException;

class CurieWeissFitterTest {

    private final CurieWeissFitter fitter = new CurieWeissFitter();

    // Law: Kothari, Math. Proc. Camb. Phil. Soc. 28(3), 338 (1932), χ = C/(T − θ); synthetic data, invented values.
    @Test
    void fit_recovers_curie_constant_weiss_temperature_and_background_from_noisy_data() {
        CurieWeissParameters truth = new CurieWeissParameters(0.35, -15, -1.2e-5);
        Random random = new Random(7L);
        int n = 40;
        double[] t = new double[n];
        double[] chi = new double[n];
        double noiseSquares = 0;
        for (int i = 0; i < n; i++) {
            t[i] = 10 + 290.0 * i / (n - 1);
            double clean = truth.susceptibility(t[i]);
            double noise = 2e-3 * Math.abs(clean) * random.nextGaussian();
            chi[i] = clean + noise;
            noiseSquares += noise * noise;
        }
        assertTrue(Math.sqrt(noiseSquares / n) > 1e-7, "the noise is really there");
        CurieWeissFit fit = fitter.fit(t, chi);
        CurieWeissParameters p = fit.parameters();
        assertEquals(0.35, p.curieConstant(), 0.01 * 0.35);
        assertEquals(-15, p.weissTemperature(), 0.5);
        assertEquals(-1.2e-5, p.temperatureIndependentSusceptibility(), 3e-6);
        assertEquals(0.35, p.curieConstant(), 4 * fit.curieConstantError());
        assertEquals(-15, p.weissTemperature(), 4 * fit.weissTemperatureError());
        assertTrue(fit.curieWeissSignificant());
        assertEquals(SusceptibilityBehaviour.PARAMAGNETIC, fit.behaviour());
        assertEquals(1.0, fit.correlation()[1][1], 1e-12);
        assertTrue(fit.rmsResidual() > 0);
    }

    @Test
    void a_ferromagnet_above_its_curie_point_gives_a_positive_weiss_temperature() {
        CurieWeissParameters truth = new CurieWeissParameters(2.0, 630, 0);
        double[] t = new double[12];
        double[] chi = new double[12];
        Random random = new Random(11L);
        for (int i = 0; i < t.length; i++) {
            t[i] = 700 + 30 * i;
            chi[i] = truth.susceptibility(t[i]) * (1 + 1e-3 * random.nextGaussian());
        }
        CurieWeissFit fit = fitter.fit(t, chi);
        assertEquals(630, fit.parameters().weissTemperature(), 3);
        assertTrue(fit.parameters().weissTemperature() < fit.temperatureMin());
    }

    // Water, χ_SI = −9.04e-6 at 20 °C (docs/references.md §8, secondary), taken as temperature-independent here.
    @Test
    void a_temperature_independent_diamagnet_is_classified_without_a_curie_term() {
        Random random = new Random(3L);
        double[] t = {280, 290, 300, 310, 320, 330, 340, 350};
        double[] chi = new double[t.length];
        for (int i = 0; i < t.length; i++) {
            chi[i] = -9.04e-6 + 1e-9 * random.nextGaussian();
        }
        CurieWeissFit fit = fitter.fit(t, chi);
        assertEquals(SusceptibilityBehaviour.DIAMAGNETIC, fit.behaviour());
        assertFalse(fit.curieWeissSignificant());
    }

    @Test
    void three_points_are_interpolated_with_unbounded_errors() {
        CurieWeissParameters truth = new CurieWeissParameters(0.1, 5, 1e-5);
        double[] t = {20, 60, 200};
        double[] chi = {truth.susceptibility(20), truth.susceptibility(60), truth.susceptibility(200)};
        CurieWeissFit fit = fitter.fit(t, chi);
        assertEquals(5, fit.parameters().weissTemperature(), 1e-4);
        assertEquals(Double.POSITIVE_INFINITY, fit.curieConstantError());
    }

    @Test
    void the_order_of_the_points_does_not_matter() {
        CurieWeissParameters truth = new CurieWeissParameters(0.2, -4, 2e-5);
        double[] t = {300, 15, 120, 40, 220, 70, 10};
        double[] chi = new double[t.length];
        for (int i = 0; i < t.length; i++) {
            chi[i] = truth.susceptibility(t[i]) * (1 + 1e-3 * Math.sin(7 * i));
        }
        double[] tSorted = {10, 15, 40, 70, 120, 220, 300};
        double[] chiSorted = {chi[6], chi[1], chi[3], chi[5], chi[2], chi[4], chi[0]};
        assertEquals(fitter.fit(tSorted, chiSorted).parameters().weissTemperature(),
                fitter.fit(t, chi).parameters().weissTemperature(), 1e-6);
    }

    @Test
    void bad_data_is_rejected_with_a_clear_message() {
        assertTrue(assertThrows(BadInputException.class, () -> fitter.fit(new double[] {100, 200}, new double[] {1e-5, 2e-5}))
                .getMessage().contains("at least 3"));
        assertTrue(assertThrows(BadInputException.class,
                () -> fitter.fit(new double[] {100, 200, 200}, new double[] {1e-5, 2e-5, 3e-5})).getMessage().contains("twice"));
        assertTrue(assertThrows(BadInputException.class,
                () -> fitter.fit(new double[] {100, 200, 300}, new double[] {1e-5, Double.NaN, 3e-5})).getMessage().contains("point 2"));
        assertThrows(BadInputException.class, () -> fitter.fit(new double[] {-5, 200, 300}, new double[] {1e-5, 2e-5, 3e-5}));
        assertThrows(BadInputException.class, () -> fitter.fit(new double[] {100, 200, 300}, new double[] {1e-5, 2e-5}));
        CurieWeissParameters p = new CurieWeissParameters(0.1, 50, 0);
        assertTrue(assertThrows(BadInputException.class, () -> p.susceptibility(40)).getMessage().contains("T > θ"));
    }
}
