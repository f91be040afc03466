package org.kneepoint.fitter.loadline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

class OperatingPointTest {

    private static final LinearRecoilKnee LINEAR = new LinearRecoilKnee(1.2, 1.05, 3e6, 1e4);

    @Test
    void linear_magnet_works_at_br_pc_over_pc_plus_recoil_permeability() {
        // Bd = Br·Pc/(Pc + μrec) on the recoil line (common practice)
        for (double pc : new double[] {0.2, 1.0, 2.5, 10.0}) {
            OperatingPoint point = new LoadLine(pc, 0.0).on(LINEAR);
            assertEquals(1.2 * pc / (pc + 1.05), point.b(), 1e-9 * point.b());
            assertEquals(-point.b() / (MU0 * pc), point.h(), 1e-9 * Math.abs(point.h()));
        }
    }

    @Test
    void opposing_field_shifts_the_linear_point_by_mu0_mu_rec_pc_ha_over_pc_plus_mu_rec() {
        // B = (Br·Pc − μ0·μrec·Pc·Ha)/(Pc + μrec): the recoil line met by B = −μ0·Pc·(H + Ha) (docs/design.md §4), solved by hand
        double pc = 2.0;
        double ha = 2e5;
        OperatingPoint point = new LoadLine(pc, ha).on(LINEAR);
        assertEquals((1.2 * pc - MU0 * 1.05 * pc * ha) / (pc + 1.05), point.b(), 1e-9 * point.b());
    }

    @Test
    void knee_point_lies_on_the_curve_and_the_load_line_to_1e_9_for_random_grades() {
        SplittableRandom random = new SplittableRandom(17);
        for (int trial = 0; trial < 2000; trial++) {
            LinearRecoilKnee curve = Grades.random(random);
            double hcj = curve.intrinsicCoercivity();
            LoadLine line = new LoadLine(random.nextDouble(0.05, 20), random.nextDouble(0, 1.5 * hcj));
            double h = curve.operatingField(line.pc(), line.opposingField());
            double bracketed = MonotoneRoot.solve(x -> curve.j(x) + MU0 * (line.pc() + 1) * x + MU0 * line.pc() * line.opposingField(),
                    -4 * hcj, 0.0, 1e-14);
            assertEquals(bracketed, h, 1e-9 * Math.abs(bracketed), "trial " + trial);
        }
    }

    @Test
    void energy_product_is_minus_b_times_h() {
        OperatingPoint point = new LoadLine(1.0, 0.0).on(LINEAR);
        assertEquals(-point.b() * point.h(), point.energyProduct(), 0.0);
    }
}
