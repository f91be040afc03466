package org.kneepoint.fitter.limits;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import java.util.Optional;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.curve.CurveKind;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.curve.Quantity;

class CurvePlausibilityTest {

    /** An invented knee curve J(H) from +50 kA/m down past HcJ, with Gaussian noise of {@code noise} tesla. */
    private static DemagnetizationCurve knee(int points, double noise, long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        double br = 1.3;
        double hcj = 1.2e6;
        double[] h = new double[points];
        double[] j = new double[points];
        for (int i = 0; i < points; i++) {
            h[i] = 5e4 - 1.4e6 * i / (points - 1);
            double clean = (br + MU0 * 0.05 * h[i]) * Math.tanh((h[i] + hcj) / 4e4);
            j[i] = clean + noise * gaussian(random);
        }
        return new DemagnetizationCurve(CurveKind.INTRINSIC, Quantity.J, h, j, 293.15);
    }

    private static double gaussian(SplittableRandom random) {
        return Math.sqrt(-2 * Math.log(1 - random.nextDouble())) * Math.cos(2 * Math.PI * random.nextDouble());
    }

    private static Optional<CurvePlausibility.Finding> check(CurveKind kind, Quantity quantity, double[] h, double[] values, Double t) {
        return CurvePlausibility.check(new DemagnetizationCurve(kind, quantity, h, values, t));
    }

    @Test
    void noisy_knee_curves_pass_at_every_seed() {
        for (long seed = 1; seed <= 50; seed++) {
            DemagnetizationCurve curve = knee(500, 0.004, seed);
            assertEquals(Optional.empty(), CurvePlausibility.check(curve), "seed " + seed);
        }
    }

    @Test
    void the_noise_estimate_finds_the_noise_that_was_added() {
        double[] j = knee(2000, 0.004, 3).j();
        double deviation = NoiseEstimate.deviation(j);
        assertEquals(0.004, deviation, 0.0008, "the noise is really there and is found");
        assertEquals(0.0, NoiseEstimate.deviation(new double[] {1, 2, 3}), 0.0);
    }

    @Test
    void a_curve_whose_j_rises_as_h_falls_is_refused_at_the_worst_point() {
        double[] h = {0, -1e5, -2e5, -3e5};
        double[] j = {0.5, 0.9, 1.2, 1.3};
        CurvePlausibility.Finding finding = check(CurveKind.INTRINSIC, Quantity.J, h, j, 293.15).orElseThrow();
        assertEquals(3, finding.point());
        assertEquals(0, finding.otherPoint());
        assertEquals(CurvePlausibility.Part.VALUE, finding.part());
    }

    @Test
    void a_rise_within_one_percent_of_br_is_taken_as_noise() {
        double[] h = {0, -1e5, -2e5, -3e5};
        double[] j = {1.30, 1.29, 1.302, 1.25};
        assertEquals(Optional.empty(), check(CurveKind.INTRINSIC, Quantity.J, h, j, 293.15));
    }

    @Test
    void b_of_twelve_tesla_at_zero_field_is_j_of_twelve_tesla_and_refused() {
        CurvePlausibility.Finding finding = check(CurveKind.NORMAL, Quantity.B, new double[] {0, -1e5}, new double[] {12.8, 12.6}, 293.15)
                .orElseThrow();
        assertEquals(0, finding.point());
        assertTrue(finding.problem().startsWith("B = 12.8 T at H = 0 A/m means J = 12.8 T"), finding.problem());
    }

    @Test
    void three_and_a_half_tesla_passes_at_4_kelvin_but_not_at_room_temperature() {
        double[] h = {0, -1e4};
        double[] j = {3.5, 3.4};
        assertEquals(Optional.empty(), check(CurveKind.INTRINSIC, Quantity.J, h, j, 4.2));
        assertTrue(check(CurveKind.INTRINSIC, Quantity.J, h, j, 293.15).isPresent());
    }

    @Test
    void a_field_of_1e20_and_a_temperature_of_1e308_are_refused() {
        assertEquals(CurvePlausibility.Part.FIELD,
                check(CurveKind.INTRINSIC, Quantity.J, new double[] {0, -1e20}, new double[] {1, 0.9}, 300.0).orElseThrow().part());
        CurvePlausibility.Finding hot = check(CurveKind.INTRINSIC, Quantity.J, new double[] {0, -1}, new double[] {1, 0.9}, 1e308).orElseThrow();
        assertEquals(CurvePlausibility.Part.TEMPERATURE, hot.part());
        assertEquals(-1, hot.point());
    }

    @Test
    void all_zero_data_one_field_and_zero_polarization_are_refused() {
        assertTrue(check(CurveKind.INTRINSIC, Quantity.J, new double[] {0, 0}, new double[] {0, 0}, null).orElseThrow().problem()
                .contains("all-zero"));
        assertEquals(CurvePlausibility.Part.FIELD,
                check(CurveKind.INTRINSIC, Quantity.J, new double[] {-5, -5}, new double[] {1, 1}, null).orElseThrow().part());
        assertTrue(check(CurveKind.NORMAL, Quantity.B, new double[] {0, -1e5}, new double[] {0, -MU0 * 1e5}, null).orElseThrow().problem()
                .contains("no magnetization"));
    }

    @Test
    void a_loop_with_area_passes_and_one_with_b_zero_everywhere_or_retracing_itself_does_not() {
        double[] h = {1e3, 0, -1e3, 0, 1e3};
        assertEquals(Optional.empty(), check(CurveKind.LOOP, Quantity.J, h, new double[] {1.3, 1.2, -1.3, -1.2, 1.3}, null));
        assertTrue(check(CurveKind.LOOP, Quantity.B, h, new double[] {0, 0, 0, 0, 0}, null).isPresent());
        assertTrue(check(CurveKind.LOOP, Quantity.J, h, new double[] {1.3, 0.2, -1.3, 0.2, 1.3}, null).isPresent());
    }

    @Test
    void a_thin_loop_of_a_soft_material_still_encloses_enough_area() {
        // Coercivity 1 A/m measured to 1000 A/m: area ≈ 4·Hc·Js, a fraction ≈ 1e-3 of the box (common practice).
        int n = 400;
        double[] h = new double[n];
        double[] j = new double[n];
        for (int i = 0; i < n; i++) {
            double phase = 2 * Math.PI * i / n;
            h[i] = 1000 * Math.cos(phase);
            j[i] = Math.tanh((h[i] + (Math.sin(phase) > 0 ? -1 : 1)) / 100);
        }
        assertEquals(Optional.empty(), LoopArea.check(h, j));
    }
}
