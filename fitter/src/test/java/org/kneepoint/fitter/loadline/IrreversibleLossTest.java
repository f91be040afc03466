package org.kneepoint.fitter.loadline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import org.junit.jupiter.api.Test;

class IrreversibleLossTest {

    private final LinearTemperatureLaw law = Grades.neodymiumLaw();

    @Test
    void loss_is_negligible_on_the_straight_part_of_the_curve() {
        // far above the knee the curve is its own recoil line, Br' = Br (docs/design.md §4): what remains is the knee term
        // D/Br·exp(−(H + HcJ)/w) of LinearRecoilKnee, below 1e-8 here
        for (double t = 293.15; t < 360; t += 5) {
            LinearRecoilKnee curve = law.at(t);
            OperatingPoint point = new LoadLine(2.0, 0.0).on(curve);
            assertTrue(point.h() > curve.kneeField().orElseThrow());
            assertEquals(0.0, IrreversibleLoss.after(curve, point), 1e-8);
        }
    }

    @Test
    void the_issue_typed_in_grade_loses_about_six_percent_just_above_its_knee_at_141_celsius() {
        // issue 11: Br 1.3 T, μrec 1.05, HcJ 1600 kA/m, Hk 1450 kA/m, α −0.12 %/K, β −0.6 %/K, Pc 1, 141 °C. The linear
        // recoil construction (the magnet recoils from its lowest point along a line of slope μ0·(μrec − 1); P. Campbell,
        // "Magnetic circuit design: recoil operation", magnetweb.com section 4B, 2001) worked by hand (independent bisection):
        //   D0 = Br − μ0·0.05·HcJ = 1.199469 T, 0.1·Br − μ0·0.05·Hk = 0.038894 T, w0 = 150 kA/m / ln(D0/0.038894) = 43.747 kA/m
        //   ΔT = 121 K: Br = 1.3·(1 − 0.1452) = 1.111240 T, HcJ = 1.6e6·0.274 = 438.4 kA/m, w = 11.9867 kA/m, D = 1.083695 T
        //   J(H) + 2·μ0·H = 0 at H = −405.136 kA/m, J = 1.018219 T (the knee lies at −407.957 kA/m, further out)
        //   Br' = J − μ0·0.05·H = 1.043675 T, loss = 1 − Br'/Br = 6.080 %
        LinearTemperatureLaw issueGrade = Grades.neodymiumLaw();
        LinearRecoilKnee curve = issueGrade.at(414.15);
        OperatingPoint point = new LoadLine(1.0, 0.0).on(curve);
        assertEquals(-405136.486, point.h(), 0.01);
        assertTrue(point.h() > curve.kneeField().orElseThrow());
        assertEquals(0.0608019, IrreversibleLoss.after(curve, point), 1e-6);
    }

    @Test
    void loss_below_the_knee_follows_the_recoil_line_through_the_point() {
        // Br' = J(Hop) − μ0·(μrec − 1)·Hop, loss = 1 − Br'/Br(T) (docs/design.md §4)
        LinearRecoilKnee curve = law.at(423.15);
        OperatingPoint point = new LoadLine(0.5, 3e5).on(curve);
        assertTrue(point.h() < curve.kneeField().orElseThrow());
        double recoilRemanence = point.j() - MU0 * 0.05 * point.h();
        assertEquals(1 - recoilRemanence / curve.remanence(), IrreversibleLoss.after(curve, point), 1e-12);
    }

    @Test
    void loss_just_below_the_knee_stays_under_five_percent() {
        // just below the knee J = 0.9·Br at H = −Hk, so Br' = 0.9·Br + μ0(μrec − 1)·Hk (docs/design.md §4, by hand); HD5, the field of
        // 5 % loss, lies just beyond the knee (IEC 60404-8-1 as summarised by S. Zurek, Encyclopedia Magnetica; docs/references.md §6a)
        LinearRecoilKnee curve = Grades.neodymium();
        double knee = curve.kneeField().orElseThrow();
        double h = knee * (1 + 1e-9);
        double loss = IrreversibleLoss.after(curve, new OperatingPoint(h, curve.j(h) + MU0 * h, curve.j(h)));
        assertEquals(0.1 - MU0 * 0.05 * 1.45e6 / 1.3, loss, 1e-6);
        assertTrue(loss < 0.05);
        double above = knee * (1 - 1e-9);
        assertEquals(loss, IrreversibleLoss.after(curve, new OperatingPoint(above, curve.j(above) + MU0 * above, curve.j(above))), 1e-6);
    }

    @Test
    void loss_has_no_jump_over_a_fine_sweep_of_temperature() {
        // a smooth loss changes by similar amounts over neighbouring steps; the knee threshold it replaces jumped by
        // 0.1 − μ0·(μrec − 1)·Hk/Br (≈ 5 %) in one step. Each step may change the loss by at most 1.5 times the step
        // before it (the exponential knee grows by e^(ΔH/w) ≈ e^0.04 per 0.05 K step here) plus 1e-9.
        LoadLine line = new LoadLine(1.0, 0.0);
        double before = DesignCheck.lossAt(law, line, 293.15);
        double change = 0.0;
        for (double t = 293.2; t < law.highestTemperature() - 1; t += 0.05) {
            double loss = DesignCheck.lossAt(law, line, t);
            assertTrue(Math.abs(loss - before) <= 1.5 * change + 1e-9, "jump at " + t + " K: " + (loss - before));
            change = Math.abs(loss - before);
            before = loss;
        }
        assertTrue(before > 0.9);
    }

    @Test
    void loss_has_no_jump_over_a_fine_sweep_of_opposing_field() {
        double before = DesignCheck.lossAt(law, new LoadLine(2.0, 0.0), 373.15);
        double change = 0.0;
        for (double field = 500; field < 1.2e6; field += 500) {
            double loss = DesignCheck.lossAt(law, new LoadLine(2.0, field), 373.15);
            assertTrue(Math.abs(loss - before) <= 1.5 * change + 1e-9, "jump at " + field + " A/m: " + (loss - before));
            change = Math.abs(loss - before);
            before = loss;
        }
        assertTrue(before > 0.5);
    }

    @Test
    void loss_grows_monotonically_with_temperature_and_opposing_field_over_a_grid() {
        // issue 5 check: irreversible loss never falls as the magnet gets hotter or the opposing field stronger
        for (double pc : new double[] {0.3, 1.0, 3.0}) {
            double[][] loss = new double[40][30];
            for (int i = 0; i < 40; i++) {
                for (int k = 0; k < 30; k++) {
                    loss[i][k] = DesignCheck.lossAt(law, new LoadLine(pc, k * 3e4), 253.15 + i * 5);
                }
            }
            for (int i = 0; i < 40; i++) {
                for (int k = 0; k < 30; k++) {
                    if (i > 0) {
                        assertTrue(loss[i][k] >= loss[i - 1][k], "Pc " + pc + " T step " + i + " Ha step " + k);
                    }
                    if (k > 0) {
                        assertTrue(loss[i][k] >= loss[i][k - 1], "Pc " + pc + " T step " + i + " Ha step " + k);
                    }
                }
            }
            assertEquals(0.0, loss[0][0], 1e-8);
            assertTrue(loss[39][29] > 0.5);
        }
    }
}
