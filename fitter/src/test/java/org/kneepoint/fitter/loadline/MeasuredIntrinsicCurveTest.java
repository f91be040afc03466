package org.kneepoint.fitter.loadline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.curve.Quantity;
import org.kneepoint.fitter.error.BadInputException;

class MeasuredIntrinsicCurveTest {

    private static MeasuredIntrinsicCurve sampled(LinearRecoilKnee model, double lowest) {
        int n = 401;
        double[] h = new double[n];
        double[] j = new double[n];
        for (int i = 0; i < n; i++) {
            h[i] = lowest * (1 - i / (n - 1.0));
            j[i] = model.j(h[i]);
        }
        return MeasuredIntrinsicCurve.of(DemagnetizationCurve.of(Quantity.J, h, j, 293.15));
    }

    @Test
    void stored_curve_gives_the_operating_point_of_the_model_it_samples() {
        LinearRecoilKnee model = Grades.neodymium();
        MeasuredIntrinsicCurve stored = sampled(model, -1.7e6);
        for (double pc : new double[] {0.3, 1.0, 4.0}) {
            LoadLine line = new LoadLine(pc, 2e5);
            assertEquals(line.on(model).h(), line.on(stored).h(), 1e-4 * 1.6e6);
        }
        assertEquals(model.kneeField().orElseThrow(), stored.kneeField().orElseThrow(), 1e-4 * 1.6e6);
        assertEquals(1.3, stored.remanence(), 1e-9);
    }

    @Test
    void load_line_below_the_measured_range_is_refused() {
        MeasuredIntrinsicCurve stored = sampled(Grades.neodymium(), -4e5);
        assertThrows(BadInputException.class, () -> new LoadLine(0.2, 5e5).on(stored));
    }
}
