package org.kneepoint.fitter.loadline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.curve.CurveKind;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.curve.Quantity;
import org.kneepoint.fitter.error.BadInputException;

class DamagedCurveTest {

    private final LinearTemperatureLaw law = Grades.neodymiumLaw();

    @Test
    void damaged_curve_is_the_recoil_line_down_to_the_worst_point_and_the_virgin_curve_beyond() {
        // The recoil construction (docs/design.md §4; P. Campbell, Permanent Magnet Materials and their Application,
        // CUP 1994, from memory): the line J = Br' + μ0(μrec − 1)H drawn from the worst point meets the virgin curve there.
        List<DutyStepResult> duty = DutySequence.run(law, 1.0, List.of(new DutyStep(293.15, 2.0e6)));
        double loss = duty.get(0).irreversibleLoss();
        double worstH = duty.get(0).point().h();
        assertTrue(loss > 0.01, "the step must damage the magnet, loss " + loss);
        IntrinsicCurve virgin = law.at(293.15);
        DemagnetizationCurve sampled = sample(virgin, 293.15, Quantity.J);
        DemagnetizationCurve damaged = DamagedCurve.of(sampled, loss, virgin.remanence(), virgin.recoilPermeability());
        double[] h = damaged.h();
        double[] j = damaged.j();
        double slope = MU0 * (virgin.recoilPermeability() - 1.0);
        boolean corner = false;
        for (int i = 0; i < h.length; i++) {
            if (i > 0) {
                assertTrue(h[i] < h[i - 1], "ordered by descending H");
            }
            double expected = h[i] > worstH ? (1 - loss) * virgin.remanence() + slope * h[i] : virgin.j(h[i]);
            assertEquals(expected, j[i], 2e-4 * virgin.remanence(), "at H = " + h[i]);
            corner |= Math.abs(h[i] - worstH) < 2e3;
        }
        assertTrue(corner, "the corner at the worst point is one of the points");
        assertEquals((1 - loss) * virgin.remanence(), j[indexOf(h, 0.0)], 1e-12);
    }

    @Test
    void damaged_normal_curve_keeps_b_equal_to_mu0_h_plus_j() {
        IntrinsicCurve virgin = law.at(393.15);
        DemagnetizationCurve normal = sample(virgin, 393.15, Quantity.B);
        DemagnetizationCurve damaged = DamagedCurve.of(normal, 0.05, virgin.remanence(), virgin.recoilPermeability());
        assertEquals(CurveKind.NORMAL, damaged.kind());
        assertEquals(0.95 * virgin.remanence(), damaged.b()[indexOf(damaged.h(), 0.0)], 1e-12);
    }

    @Test
    void no_loss_leaves_the_curve_as_it_is_and_a_loop_is_refused() {
        IntrinsicCurve virgin = law.at(293.15);
        DemagnetizationCurve sampled = sample(virgin, 293.15, Quantity.J);
        assertSame(sampled, DamagedCurve.of(sampled, 0.0, virgin.remanence(), virgin.recoilPermeability()));
        DemagnetizationCurve loop = new DemagnetizationCurve(CurveKind.LOOP, Quantity.J, sampled.h(), sampled.values(), 293.15);
        assertThrows(BadInputException.class, () -> DamagedCurve.of(loop, 0.1, 1.3, 1.05));
    }

    private static DemagnetizationCurve sample(IntrinsicCurve curve, double temperature, Quantity quantity) {
        int n = 401;
        double[] h = new double[n];
        double[] values = new double[n];
        for (int i = 0; i < n; i++) {
            h[i] = -4e3 * i;
            values[i] = curve.j(h[i]) + (quantity == Quantity.B ? MU0 * h[i] : 0.0);
        }
        return DemagnetizationCurve.of(quantity, h, values, temperature);
    }

    private static int indexOf(double[] h, double field) {
        for (int i = 0; i < h.length; i++) {
            if (h[i] == field) {
                return i;
            }
        }
        throw new AssertionError("no point at H = " + field);
    }
}
