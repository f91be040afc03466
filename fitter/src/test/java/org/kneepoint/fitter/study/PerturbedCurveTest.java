package org.kneepoint.fitter.study;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.loadline.LinearRecoilKnee;

class PerturbedCurveTest {

    private static final LinearRecoilKnee CURVE = LinearRecoilKnee.withKneeField(1.3, 1.05, 1.6e6, 1.45e6);

    @Test
    void remanence_and_coercivity_ratios_scale_j_and_h_of_the_whole_curve() {
        PerturbedCurve curve = new PerturbedCurve(CURVE, new CurveScaling(1.02, 0.95, 1.0, 0.0));
        assertEquals(1.02 * 1.3, curve.remanence(), 1e-15);
        assertEquals(0.95 * 1.6e6, IntrinsicCoercivity.of(curve), 1e-3);
        assertEquals(0.95 * CURVE.kneeField().orElseThrow(), curve.kneeField().orElseThrow(), 1e-3);
        assertEquals(1 + 0.05 * 1.02 / 0.95, curve.recoilPermeability(), 1e-12);
    }

    @Test
    void knee_ratio_moves_the_knee_field_and_keeps_hcj() {
        PerturbedCurve curve = new PerturbedCurve(CURVE, new CurveScaling(1.0, 1.0, 1.05, 0.0));
        assertEquals(1.05 * CURVE.kneeField().orElseThrow(), curve.kneeField().orElseThrow(), 1e-3);
        assertEquals(1.6e6, IntrinsicCoercivity.of(curve), 1e-3);
        assertEquals(1.3, curve.remanence(), 1e-15);
    }

    @Test
    void recoil_difference_is_added_to_the_slope() {
        PerturbedCurve curve = new PerturbedCurve(CURVE, new CurveScaling(1.0, 1.0, 1.0, 0.01));
        assertEquals(1.06, curve.recoilPermeability(), 1e-12);
        double h = -2e5;
        assertEquals(CURVE.j(h) + org.kneepoint.fitter.units.MagneticConstant.MU0 * 0.01 * h, curve.j(h), 1e-15);
    }
}
