package org.kneepoint.fitter.model.ja;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Loops measured coarsely: the fixed-step evaluator sub-steps each measured interval, so the
 * point spacing no longer biases the fit (issue: with one RK4 step per interval, 41 noise-free
 * points per branch made k 40 % and c 107 % too high).
 */
class CoarseLoopFitTest {

    // docs/references.md §5b (Jiles & Atherton 1986, secondary) as the true parameters of synthetic data.
    private static final JilesAthertonParameters TRUTH = JilesAthertonPhysicsTest.SOFT_IRON;
    private static final double H_MAX = 5000;
    private static final double NOISE = 0.003;

    /** +Hmax → −Hmax → +Hmax, equally spaced, {@code perBranch} points on each branch (the tip shared). */
    static double[] loopField(int perBranch) {
        double[] h = new double[2 * perBranch - 1];
        for (int i = 0; i < perBranch; i++) {
            h[i] = H_MAX - 2 * H_MAX * i / (perBranch - 1);
            h[perBranch - 1 + i] = -H_MAX + 2 * H_MAX * i / (perBranch - 1);
        }
        return h;
    }

    private static double[] parameters(JilesAthertonParameters p) {
        return new double[] {p.ms(), p.a(), p.k(), p.c(), p.alpha()};
    }

    private static double[] errors(JilesAthertonStandardErrors e) {
        return new double[] {e.ms(), e.a(), e.k(), e.c(), e.alpha()};
    }

    private static JilesAthertonFit fit(double[] h, double[] b) {
        return new JilesAthertonFitter().fitLoop(MeasuredLoop.ofFluxDensity(h, b), FitProgress.ignore());
    }

    private static double[] noisy(double[] clean, long seed) {
        double bMax = Arrays.stream(clean).max().orElseThrow();
        Random random = new Random(seed);
        double[] b = clean.clone();
        for (int i = 0; i < b.length; i++) {
            b[i] += NOISE * bMax * random.nextGaussian();
        }
        return b;
    }

    @ParameterizedTest
    @ValueSource(ints = {21, 41, 201})
    void fixed_step_evaluation_of_a_coarse_loop_follows_the_adaptive_simulation_to_a_millionth_of_ms(int perBranch) {
        // the adaptive simulator is checked against Hipparchus's Dormand–Prince 8(5,3) in IntegratorAccuracyTest
        double[] h = loopField(perBranch);
        double[] reference = HysteresisSimulator.adaptive(TRUTH).simulate(h).magnetization();
        double[] m = new double[h.length];
        new FixedStepLoopEvaluator(MeasuredLoop.ofFluxDensity(h, h)).magnetization(new JilesAthertonModel(TRUTH), m);
        for (int i = 0; i < h.length; i++) {
            assertEquals(reference[i], m[i], 1e-6 * TRUTH.ms(), "at point " + i);
        }
    }

    @Test
    void the_step_count_does_not_depend_on_how_many_points_the_loop_has() {
        int coarse = new FixedStepLoopEvaluator(MeasuredLoop.ofFluxDensity(loopField(21), loopField(21))).steps();
        int fine = new FixedStepLoopEvaluator(MeasuredLoop.ofFluxDensity(loopField(201), loopField(201))).steps();
        // the initial curve to Hmax and two branches of 2·Hmax at Hmax/200 per step: 1,000 steps
        assertEquals(5 * FixedStepLoopEvaluator.STEPS_PER_LARGEST_FIELD, coarse);
        assertEquals(coarse, fine);
    }

    @Test
    void loops_with_21_41_and_201_points_per_branch_give_parameters_within_their_standard_errors_of_each_other() {
        int[] spacings = {21, 41, 201};
        double[][] exact = new double[3][];
        double[][] errors = new double[3][];
        double[] truth = parameters(TRUTH);
        for (int s = 0; s < 3; s++) {
            double[] h = loopField(spacings[s]);
            double[] clean = HysteresisSimulator.adaptive(TRUTH).simulate(h).fluxDensity();
            exact[s] = parameters(fit(h, clean).parameters());
            // the yardstick: the standard errors the same loop carries with 0.3 % scatter on B
            double[] b = noisy(clean, 20261204L + s);
            JilesAthertonFit noisyFit = fit(h, b);
            assertTrue(noisyFit.rmsB() > 0.5 * NOISE * 1.69, "the noise is really there: rms " + noisyFit.rmsB());
            errors[s] = errors(noisyFit.standardErrors());
        }
        String[] names = {"Ms", "a", "k", "c", "α"};
        for (int s = 0; s < 3; s++) {
            for (int j = 0; j < 5; j++) {
                // the integration bias is below 1 % of the standard error that 0.3 % scatter gives
                assertEquals(truth[j], exact[s][j], 0.01 * errors[s][j], names[j] + " of the noise-free loop with "
                        + spacings[s] + " points per branch");
                for (int t = 0; t < s; t++) {
                    assertEquals(exact[t][j], exact[s][j], 0.01 * Math.min(errors[s][j], errors[t][j]), names[j]
                            + ": " + spacings[t] + " against " + spacings[s] + " points per branch");
                }
            }
        }
    }
}
