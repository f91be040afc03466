package org.kneepoint.fitter.model.ja;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.OrdinaryDifferentialEquation;
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;
import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.error.BadInputException;

class IntegratorAccuracyTest {

    private static final JilesAthertonParameters SOFT_IRON = JilesAthertonPhysicsTest.SOFT_IRON;
    private static final double H_MAX = 5000;

    @Test
    void adaptive_loop_agrees_with_rk4_at_one_hundredth_of_its_mean_step() {
        JilesAthertonModel model = new JilesAthertonModel(SOFT_IRON);
        AdaptiveBranchSolver adaptive = new AdaptiveBranchSolver(model);
        int steps = adaptive.solve(0, 0, H_MAX).accepted();
        double mMax = adaptive.advance(0, 0, H_MAX);
        steps += adaptive.solve(H_MAX, mMax, -H_MAX).accepted();
        double meanStep = 3 * H_MAX / steps;
        LoopMetrics coarse = new MajorLoopAnalysis(adaptive).measure(H_MAX);
        LoopMetrics fine = new MajorLoopAnalysis(new FixedStepBranchSolver(model, meanStep / 100)).measure(H_MAX);
        assertEquals(fine.hc(), coarse.hc(), 1e-6 * fine.hc());
        assertEquals(fine.mr(), coarse.mr(), 1e-6 * fine.mr());
        assertEquals(fine.lossPerCycle(), coarse.lossPerCycle(), 1e-6 * fine.lossPerCycle());
    }

    // Independent reference: Hipparchus 4.0.1 DormandPrince853Integrator, a general-purpose
    // eighth-order ODE library (Hairer, Nørsett, Wanner), at tolerance 1e-12, restarted at each point.
    @Test
    void adaptive_simulation_agrees_with_hipparchus_dormand_prince_853() {
        JilesAthertonModel model = new JilesAthertonModel(SOFT_IRON);
        double[] history = {H_MAX, 3000, 1000, 0, -200, -314, -500, -1000, -3000, -H_MAX, -1000, 0, 1000, 2500,
            1500, 1000, 2000, 3000, H_MAX};
        double[] m = HysteresisSimulator.adaptive(SOFT_IRON).simulate(history).magnetization();
        DormandPrince853Integrator reference = new DormandPrince853Integrator(1e-10, 100, 1e-12 * SOFT_IRON.ms(), 1e-12);
        double h = 0;
        double[] state = {0};
        for (int i = 0; i < history.length; i++) {
            double direction = Math.signum(history[i] - h);
            OrdinaryDifferentialEquation equation = new OrdinaryDifferentialEquation() {
                @Override
                public int getDimension() {
                    return 1;
                }

                @Override
                public double[] computeDerivatives(double t, double[] y) {
                    return new double[] {model.susceptibility(t, y[0], direction)};
                }
            };
            state = reference.integrate(equation, new ODEState(h, state), history[i]).getPrimaryState();
            h = history[i];
            assertEquals(state[0], m[i], 1e-6 * Math.abs(state[0]) + 1e-8 * SOFT_IRON.ms(), "at point " + i);
        }
    }

    // Published set of docs/references.md §5b (Jiles & Atherton 1986, secondary). Plausibility bands for annealed soft
    // iron are common practice / from memory, not read: Hc of order 10²–10³ A/m, Br of order 1 T, and B at
    // 5 kA/m below the saturation polarization of iron, about 2.15 T (from memory).
    @Test
    void published_soft_iron_parameters_give_a_plausible_loop() {
        LoopMetrics metrics = MajorLoopAnalysis.adaptive(SOFT_IRON).measure(H_MAX);
        assertTrue(metrics.hc() > 100 && metrics.hc() < 1000, "Hc " + metrics.hc());
        assertTrue(metrics.br() > 0.3 && metrics.br() < 1.8, "Br " + metrics.br());
        assertTrue(metrics.bMax() > metrics.br() && metrics.bMax() < 2.15, "Bmax " + metrics.bMax());
        assertTrue(metrics.lossPerCycle() > 0 && metrics.lossPerCycle() < 4 * metrics.bMax() * H_MAX);
        assertTrue(metrics.hcb() < metrics.hc());
    }

    @Test
    void any_field_history_gives_finite_magnetization() {
        Random random = new Random(20261202L);
        for (int trial = 0; trial < 200; trial++) {
            double a = 10 + random.nextDouble() * 1e4;
            double ms = 1e4 + random.nextDouble() * 2e6;
            double alpha = random.nextDouble() * 0.999 * 3 * a / ms;
            double k = 1 + random.nextDouble() * 1e4;
            double c = random.nextDouble();
            JilesAthertonParameters p = new JilesAthertonParameters(ms, a, k, c, alpha);
            double[] history = new double[30];
            for (int i = 0; i < history.length; i++) {
                history[i] = (random.nextDouble() * 2 - 1) * Math.pow(10, 1 + 5 * random.nextDouble());
            }
            for (double value : HysteresisSimulator.adaptive(p).simulate(history).magnetization()) {
                assertTrue(Double.isFinite(value), "parameters " + p);
            }
        }
    }

    @Test
    void a_field_history_with_nan_is_rejected() {
        HysteresisSimulator simulator = HysteresisSimulator.adaptive(SOFT_IRON);
        BadInputException error = assertThrows(BadInputException.class,
                () -> simulator.simulate(new double[] {100, Double.NaN}));
        assertTrue(error.getMessage().contains("value 2"), error.getMessage());
        assertThrows(BadInputException.class, () -> simulator.simulate(new double[0]));
    }

    @Test
    void loop_metrics_and_solvers_reject_out_of_range_settings() {
        MajorLoopAnalysis analysis = MajorLoopAnalysis.adaptive(SOFT_IRON);
        assertThrows(BadInputException.class, () -> analysis.measure(0));
        assertThrows(BadInputException.class, () -> analysis.measure(Double.NaN));
        JilesAthertonModel model = new JilesAthertonModel(SOFT_IRON);
        assertThrows(BadInputException.class, () -> new AdaptiveBranchSolver(model, 0.5));
        assertThrows(BadInputException.class, () -> new FixedStepBranchSolver(model, 0));
    }
}
