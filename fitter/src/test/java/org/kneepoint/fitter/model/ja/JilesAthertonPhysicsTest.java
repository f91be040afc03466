package org.kneepoint.fitter.model.ja;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.analysis.solvers.BrentSolver;
import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.units.MagneticConstant;

class JilesAthertonPhysicsTest {

    // docs/references.md §5b: Ms, a, k, c, α attributed to Jiles & Atherton (1986), read in a secondary source.
    static final JilesAthertonParameters SOFT_IRON = new JilesAthertonParameters(1.6e6, 1100, 400, 0.2, 1.6e-3);

    // Jiles, Thoelke, Devine, IEEE Trans. Magn. 28(1), 27 (1992): χan = Ms/(3a − α·Ms) (from memory, re-derived).
    @Test
    void anhysteretic_slope_at_the_origin_is_ms_over_three_a_minus_alpha_ms() {
        JilesAthertonModel model = new JilesAthertonModel(SOFT_IRON);
        double h = 1e-3;
        double ms = SOFT_IRON.ms();
        double m = new BrentSolver(1e-15, 1e-12).solve(100,
                x -> x - model.anhysteretic(h + SOFT_IRON.alpha() * x), -ms, ms);
        assertEquals(ms / (3 * SOFT_IRON.a() - SOFT_IRON.alpha() * ms), m / h, 1e-6 * (m / h));
    }

    // Same source: χin = c·Ms/(3a), with coupling c·Ms/(3a − c·α·Ms) (docs/references.md §5a, from memory, re-derived).
    @Test
    void initial_susceptibility_is_c_ms_over_three_a_minus_c_alpha_ms() {
        HysteresisSimulator simulator = HysteresisSimulator.adaptive(SOFT_IRON);
        double h = 1e-4 * SOFT_IRON.a();
        double m = simulator.simulate(new double[] {h}).magnetization()[0];
        double c = SOFT_IRON.c();
        double expected = c * SOFT_IRON.ms() / (3 * SOFT_IRON.a() - c * SOFT_IRON.alpha() * SOFT_IRON.ms());
        assertEquals(expected, m / h, 1e-3 * expected);
        JilesAthertonParameters uncoupled = new JilesAthertonParameters(1.6e6, 1100, 400, 0.2, 0);
        double m0 = HysteresisSimulator.adaptive(uncoupled).simulate(new double[] {h}).magnetization()[0];
        assertEquals(c * 1.6e6 / 3300, m0 / h, 1e-3 * c * 1.6e6 / 3300);
    }

    // Jiles & Atherton (1986), docs/references.md §5a: with c = 1 the magnetization is purely reversible and
    // follows the anhysteretic M = Man(H + α·M) on the way up and on the way down.
    @Test
    void with_c_equal_to_one_there_is_no_hysteresis() {
        JilesAthertonParameters reversible = new JilesAthertonParameters(1.6e6, 1100, 400, 1.0, 1.6e-3);
        JilesAthertonModel model = new JilesAthertonModel(reversible);
        double[] history = {5000, 2000, 500, 0, -500, -2000, -5000, -2000, -500, 0, 500, 2000, 5000};
        double[] m = HysteresisSimulator.adaptive(reversible).simulate(history).magnetization();
        for (int i = 0; i < history.length; i++) {
            double h = history[i];
            double anhysteretic = new BrentSolver(1e-15, 1e-9).solve(100,
                    x -> x - model.anhysteretic(h + reversible.alpha() * x), -reversible.ms(), reversible.ms());
            assertEquals(anhysteretic, m[i], 1e-5 * reversible.ms());
        }
        LoopMetrics metrics = MajorLoopAnalysis.adaptive(reversible).measure(5000);
        assertEquals(0, metrics.hc(), 1e-5 * reversible.a());
        assertEquals(0, metrics.lossPerCycle(), 1e-6 * metrics.bMax() * 5000);
    }

    // Jiles & Atherton (1986): the model is odd in (H, M), so a settled loop is point-symmetric.
    @Test
    void loop_is_point_symmetric_about_the_origin() {
        int n = 400;
        double hMax = 5000;
        double[] history = new double[8 * n + 1];
        for (int i = 0; i <= 8 * n; i++) {
            history[i] = hMax * Math.cos(Math.PI * i / (2.0 * n));
        }
        double[] m = HysteresisSimulator.adaptive(SOFT_IRON).simulate(history).magnetization();
        for (int i = 4 * n; i <= 6 * n; i++) {
            int mirror = i + 2 * n;
            assertEquals(-history[mirror], history[i], 1e-9 * hMax);
            assertEquals(-m[mirror], m[i], 1e-6 * SOFT_IRON.ms());
        }
    }

    // Loss per cycle is the loop area ∮H dB; here the polygon area by the shoelace formula (Gauss's area formula).
    @Test
    void loss_per_cycle_equals_the_loop_area_computed_two_ways() {
        double hMax = 5000;
        LoopMetrics metrics = MajorLoopAnalysis.adaptive(SOFT_IRON).measure(hMax);
        int n = 20000;
        double[] history = new double[2 * n + 2];
        history[0] = hMax;
        for (int i = 0; i <= 2 * n; i++) {
            history[i + 1] = hMax * Math.cos(Math.PI * i / n);
        }
        Trajectory loop = HysteresisSimulator.adaptive(SOFT_IRON).simulate(history);
        double[] h = loop.field();
        double[] b = loop.fluxDensity();
        double twiceArea = 0;
        for (int i = 1; i < h.length; i++) {
            int next = i + 1 < h.length ? i + 1 : 1;
            twiceArea += h[i] * b[next] - h[next] * b[i];
        }
        double shoelace = Math.abs(twiceArea) / 2;
        assertEquals(shoelace, metrics.lossPerCycle(), 1e-4 * shoelace);
        assertTrue(metrics.lossPerCycle() > 0);
    }

    @Test
    void flux_density_figures_follow_from_magnetization() {
        LoopMetrics metrics = MajorLoopAnalysis.adaptive(SOFT_IRON).measure(5000);
        assertEquals(MagneticConstant.MU0 * metrics.mr(), metrics.br(), 1e-15);
        assertEquals(metrics.hc(), metrics.hcj(), 0);
        assertTrue(metrics.hcb() > 0 && metrics.hcb() < metrics.hc());
        assertEquals(MagneticConstant.MU0 * (5000 + metrics.mMax()), metrics.bMax(), 1e-15);
    }

    // Recoil (docs/design.md §4, linear-recoil picture; Jiles & Atherton 1986 for the model): after a partial reversal
    // to H1 < 0 on the falling major branch, returning to H = 0 recovers only part of the remanence.
    @Test
    void recoil_from_the_second_quadrant_loses_remanence_irreversibly() {
        double hMax = 5000;
        double[] m = HysteresisSimulator.adaptive(SOFT_IRON).simulate(new double[] {hMax, 0, -250, 0}).magnetization();
        double mr = m[1];
        double atReversal = m[2];
        double recovered = m[3];
        assertTrue(recovered < mr, "recoil remanence " + recovered + " below Mr " + mr);
        assertTrue(recovered > atReversal, "recoil rises from the reversal point");
    }
}
