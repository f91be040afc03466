package org.kneepoint.fitter.loadline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import org.junit.jupiter.api.Test;

class IrreversibleLossTest {

    private final LinearTemperatureLaw law = Grades.neodymiumLaw();

    @Test
    void loss_is_zero_above_the_knee() {
        // DESIGN §4: only an operating point below the knee recoils to a lower remanence
        for (double t = 293.15; t < 360; t += 5) {
            LinearRecoilKnee curve = law.at(t);
            OperatingPoint point = new LoadLine(2.0, 0.0).on(curve);
            assertTrue(point.h() > curve.kneeField().orElseThrow());
            assertEquals(0.0, IrreversibleLoss.after(curve, point), 0.0);
        }
    }

    @Test
    void loss_below_the_knee_follows_the_recoil_line_through_the_point() {
        // Br' = J(Hop) − μ0·(μrec − 1)·Hop, loss = 1 − Br'/Br(T) (DESIGN §4)
        LinearRecoilKnee curve = law.at(423.15);
        OperatingPoint point = new LoadLine(0.5, 3e5).on(curve);
        assertTrue(point.h() < curve.kneeField().orElseThrow());
        double recoilRemanence = point.j() - MU0 * 0.05 * point.h();
        assertEquals(1 - recoilRemanence / curve.remanence(), IrreversibleLoss.after(curve, point), 1e-12);
    }

    @Test
    void loss_just_below_the_knee_stays_under_five_percent() {
        // just below the knee J = 0.9·Br at H = −Hk, so Br' = 0.9·Br + μ0(μrec − 1)·Hk (DESIGN §4, by hand); HD5, the field of
        // 5 % loss, lies just beyond the knee (IEC 60404-8-1 as summarised by S. Zurek, Encyclopedia Magnetica; REFERENCES §6a)
        LinearRecoilKnee curve = Grades.neodymium();
        double knee = curve.kneeField().orElseThrow();
        double h = knee * (1 + 1e-9);
        double loss = IrreversibleLoss.after(curve, new OperatingPoint(h, curve.j(h) + MU0 * h, curve.j(h)));
        assertEquals(0.1 - MU0 * 0.05 * 1.45e6 / 1.3, loss, 1e-6);
        assertTrue(loss < 0.05);
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
            assertEquals(0.0, loss[0][0], 0.0);
            assertTrue(loss[39][29] > 0.5);
        }
    }
}
