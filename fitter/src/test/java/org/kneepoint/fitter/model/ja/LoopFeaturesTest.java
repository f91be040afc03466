package org.kneepoint.fitter.model.ja;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import org.junit.jupiter.api.Test;

class LoopFeaturesTest {

    private static final JilesAthertonParameters SOFT_IRON = JilesAthertonPhysicsTest.SOFT_IRON;

    @Test
    void a_curve_measured_after_a_higher_prior_field_has_no_tip_or_reversal_slope() {
        double[] h = new double[100];
        for (int i = 0; i < h.length; i++) {
            h[i] = -10.0 * i;
        }
        double[] history = new double[h.length + 1];
        history[0] = 5000;
        System.arraycopy(h, 0, history, 1, h.length);
        double[] b = HysteresisSimulator.adaptive(SOFT_IRON).simulate(history).fluxDensity();
        double[] curveB = Arrays.copyOfRange(b, 1, b.length);
        LoopFeatures features = LoopFeatures.of(MeasuredLoop.secondQuadrant(h, curveB, 5000));
        assertEquals(5000, features.tipField());
        assertTrue(Double.isNaN(features.tipMagnetization()));
        assertTrue(Double.isNaN(features.reversalSlope()), "the start of the curve is not a reversal");
        assertTrue(Double.isNaN(features.tipSlope()));
    }

    @Test
    void a_major_loop_shows_coercivity_and_remanence_close_to_the_simulated_metrics() {
        int n = 1200;
        double[] h = new double[n];
        for (int i = 0; i < n; i++) {
            h[i] = 5000 * Math.cos(2 * Math.PI * i / (n - 1));
        }
        double[] b = HysteresisSimulator.adaptive(SOFT_IRON).simulate(h).fluxDensity();
        LoopFeatures features = LoopFeatures.of(MeasuredLoop.ofFluxDensity(h, b));
        LoopMetrics metrics = MajorLoopAnalysis.adaptive(SOFT_IRON).measure(5000);
        assertEquals(metrics.hc(), features.coercivity(), 0.01 * metrics.hc());
        assertEquals(metrics.mr(), features.remanence(), 0.01 * metrics.mr());
        assertEquals(metrics.mMax(), features.tipMagnetization(), 1e-6 * metrics.mMax());
        assertTrue(features.reversalSlope() > 0 && features.coercivitySlope() > features.remanenceSlope());
    }
}
