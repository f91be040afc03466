package org.kneepoint.fitter.model.ja;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.units.MagneticConstant;

class FixedStepLoopEvaluatorTest {

    private static final JilesAthertonParameters SOFT_IRON = JilesAthertonPhysicsTest.SOFT_IRON;

    private static double[] loopField(int n, double hMax) {
        double[] h = new double[n];
        for (int i = 0; i < n; i++) {
            h[i] = hMax * Math.cos(2 * Math.PI * i / (n - 1));
        }
        return h;
    }

    @Test
    void fixed_step_evaluation_follows_the_history_the_simulator_is_given() {
        double[] h = loopField(1200, 5000);
        int passes = 2;
        double prior = -3000;
        double[] history = new double[1 + (passes + 1) * h.length];
        history[0] = prior;
        for (int pass = 0; pass <= passes; pass++) {
            System.arraycopy(h, 0, history, 1 + pass * h.length, h.length);
        }
        double[] simulated = HysteresisSimulator.adaptive(SOFT_IRON).simulate(history).magnetization();
        MeasuredLoop loop = new MeasuredLoop(h, loopField(1200, 1), new double[] {prior}, passes);
        double[] m = new double[h.length];
        new FixedStepLoopEvaluator(loop).magnetization(new JilesAthertonModel(SOFT_IRON), m);
        for (int i = 0; i < h.length; i++) {
            assertEquals(simulated[1 + passes * h.length + i], m[i], 2e-5 * SOFT_IRON.ms(), "at point " + i);
        }
    }

    @Test
    void flux_density_is_mu0_times_field_plus_magnetization() {
        double[] h = loopField(400, 5000);
        MeasuredLoop loop = MeasuredLoop.ofFluxDensity(h, loopField(400, 1));
        FixedStepLoopEvaluator evaluator = new FixedStepLoopEvaluator(loop);
        JilesAthertonModel model = new JilesAthertonModel(SOFT_IRON);
        double[] m = new double[h.length];
        evaluator.magnetization(model, m);
        double[] b = evaluator.fluxDensity(model);
        for (int i = 0; i < h.length; i++) {
            assertEquals(MagneticConstant.MU0 * (h[i] + m[i]), b[i], 1e-15);
        }
    }
}
