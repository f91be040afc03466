package org.kneepoint.fitter.model.knee;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.loadline.AppliedField;
import org.kneepoint.fitter.loadline.DesignCheck;
import org.kneepoint.fitter.loadline.DesignCheckResult;
import org.kneepoint.fitter.loadline.IrreversibleLoss;
import org.kneepoint.fitter.loadline.LoadLine;
import org.kneepoint.fitter.loadline.OperatingPoint;

/**
 * A grade typed in from a data sheet on the knee model. The grade (issue 11; invented): Br 1.3 T, μrec 1.05,
 * HcJ 1600 kA/m, Hk 1450 kA/m. The hand calculations use the straight part of the curve, B = Br + μ0·μrec·H, the
 * textbook recoil line (R. J. Parker, Advances in Permanent Magnetism, Wiley 1990; docs/references.md §6c).
 */
class TypedKneeTest {

    private static final double BR = 1.3;
    private static final double MU_REC = 1.05;
    private static final double HCJ = 1.6e6;
    private static final double HK = 1.45e6;

    private final KneeCurve curve = TypedKnee.withKneeField(BR, MU_REC, HCJ, HK);

    @Test
    void the_knee_lies_at_the_given_field_and_the_curve_reaches_zero_at_hcj() {
        assertEquals(0.9 * BR, curve.j(-HK), 1e-9);
        assertEquals(-HK, curve.kneeField().getAsDouble(), 1e-3);
        assertEquals(0.0, curve.j(-HCJ), 1e-12);
        assertEquals(MU_REC, curve.recoilPermeability(), 1e-6);
    }

    @Test
    void on_the_straight_part_the_operating_point_is_the_textbook_recoil_line_and_there_is_no_loss() {
        // Pc 2: B = Br + μ0·μrec·H meets B = −μ0·Pc·H at H = −Br/(μ0·(Pc + μrec)) = −339.18 kA/m (by hand)
        double pc = 2.0;
        double expected = -BR / (MU0 * (pc + MU_REC));
        assertEquals(-339.18e3, expected, 10);
        OperatingPoint point = new LoadLine(pc, 0).on(curve);
        assertEquals(expected, point.h(), 1e-6 * -expected);
        assertEquals(BR + MU0 * MU_REC * expected, point.b(), 1e-9);
        assertEquals(0.0, IrreversibleLoss.after(curve, point), 1e-8);
    }

    @Test
    void at_the_knee_the_loss_is_the_recoil_line_through_it() {
        // the load line of Pc 1 through the knee (−Hk, B = 0.9·Br − μ0·Hk) needs Ha = −B/(μ0·Pc) − H
        double b = 0.9 * BR - MU0 * HK;
        double opposing = -b / MU0 - (-HK);
        DesignCheckResult check = DesignCheck.of(new KneeTemperatureLaw(curve, 0, 0, 293.15), 1.0, AppliedField.opposing(opposing),
                293.15, 0.01);
        assertEquals(-HK, check.point().h(), 1e-3);
        assertEquals(0.0, check.kneeMarginField(), 1e-3);
        // Br' = 0.9·Br + μ0·(μrec − 1)·Hk = 1.17 + 0.0911 = 1.2611 T, so the loss is 1 − 1.2611/1.3 = 2.99 % (by hand)
        double byHand = 1 - (0.9 * BR + MU0 * (MU_REC - 1) * HK) / BR;
        assertEquals(0.0299, byHand, 5e-4);
        assertEquals(byHand, check.irreversibleLoss(), 1e-6);
    }

    @Test
    void the_loss_grows_continuously_round_the_knee() {
        KneeTemperatureLaw law = new KneeTemperatureLaw(curve, -0.12, -0.6, 293.15);
        LoadLine line = new LoadLine(1.0, 0);
        double previous = DesignCheck.lossAt(law, line, 293.15);
        for (double t = 293.15; t <= law.highestTemperature() - 1; t += 0.05) {
            double loss = DesignCheck.lossAt(law, line, t);
            assertTrue(loss >= previous - 1e-12 && loss - previous < 2e-3, t + " K: " + previous + " → " + loss);
            previous = loss;
        }
        assertTrue(previous > 0.5, "the sweep goes round the knee: " + previous);
    }

    @Test
    void impossible_knees_are_refused_in_one_line() {
        assertThrows(BadInputException.class, () -> TypedKnee.withKneeField(BR, MU_REC, HCJ, 1.7e6));
        assertThrows(BadInputException.class, () -> TypedKnee.withKneeField(BR, MU_REC, HCJ, 1e4));
        assertThrows(BadInputException.class, () -> TypedKnee.withKneeField(BR, 1.5, 3e6, 1e6));
    }
}
