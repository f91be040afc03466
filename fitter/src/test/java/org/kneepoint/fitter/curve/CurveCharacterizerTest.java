package org.kneepoint.fitter.curve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.error.BadInputException;

class CurveCharacterizerTest {

    private static final double BR = 1.2;
    private static final double MU_REC = 1.05;

    /** A linear magnet: straight J line down to −1.0 MA/m, then J falls to 0 at −1.1 MA/m (invented). */
    private static DemagnetizationCurve linearMagnet() {
        int n = 2201;
        double[] h = new double[n];
        double[] j = new double[n];
        for (int i = 0; i < n; i++) {
            h[i] = 0.1e6 - 1.2e6 * i / (n - 1);
            double line = BR + MU0 * (MU_REC - 1) * h[i];
            double atKnee = BR + MU0 * (MU_REC - 1) * -1.0e6;
            j[i] = h[i] >= -1.0e6 ? line : h[i] >= -1.1e6 ? atKnee * (h[i] + 1.1e6) / 0.1e6 : 0.0;
        }
        return DemagnetizationCurve.of(Quantity.J, h, j, 293.15);
    }

    // Linear-recoil relations (textbook, e.g. J. M. D. Coey, "Magnetism and Magnetic Materials",
    // Cambridge University Press 2010, ch. 13 — from memory): HcB = Br/(μ0·μrec);
    // (BH)max = Br²/(4·μ0·μrec) at B = Br/2, H = −HcB/2.
    @Test
    void linear_magnet_obeys_the_textbook_relations_for_hcb_and_bhmax() {
        Characterization c = CurveCharacterizer.characterize(linearMagnet());
        assertEquals(BR, c.br(), 1e-12);
        assertEquals(BR / (MU0 * MU_REC), c.hcb(), 1e-6 * c.hcb());
        assertEquals(BR * BR / (4 * MU0 * MU_REC), c.bhMax(), 1e-9 * c.bhMax());
        assertEquals(BR / 2, c.bAtBhMax(), 1e-6);
        assertEquals(-BR / (2 * MU0 * MU_REC), c.hAtBhMax(), 1e-5 * c.hcb());
        assertEquals(MU_REC, c.muRec(), 1e-9);
        assertEquals(1.1e6, c.hcj(), 1e-6 * 1.1e6);
    }

    // Knee field Hk = |H| at J = 0.9·Br and squareness Hk/HcJ (IEC 60404-8-1 practice, from memory).
    @Test
    void knee_field_is_where_j_falls_to_nine_tenths_of_br() {
        double hcj = 1.4e6;
        double width = 0.03 * hcj;
        Characterization c = CurveCharacterizer.characterize(
                InventedCurves.intrinsic(1.3, 1.04, hcj, width, 0.2e6, -1.6e6, 901, 0.0, 1));
        double expectedHk = -InventedCurves.fieldAt(0.9 * 1.3, 1.3, 1.04, hcj, width);
        assertEquals(expectedHk, c.hk(), 1e-4 * expectedHk);
        assertEquals(hcj, c.hcj(), 1e-9 * hcj);
        assertEquals(expectedHk / hcj, c.squareness(), 1e-4);
        assertEquals(1.3, c.br(), 1e-9);
    }

    @Test
    void order_and_repeated_readings_do_not_change_the_result() {
        DemagnetizationCurve ordered = InventedCurves.intrinsic(1.3, 1.04, 1.4e6, 4e4, 0.2e6, -1.6e6, 500, 0, 1);
        double[] h = ordered.h();
        double[] j = ordered.j();
        int n = h.length;
        double[] shuffledH = new double[n + 50];
        double[] shuffledJ = new double[n + 50];
        SplittableRandom random = new SplittableRandom(7);
        for (int i = 0; i < n + 50; i++) {
            int source = i < n ? i : random.nextInt(n);
            shuffledH[i] = h[source];
            shuffledJ[i] = j[source];
        }
        for (int i = shuffledH.length - 1; i > 0; i--) {
            int k = random.nextInt(i + 1);
            double th = shuffledH[i];
            shuffledH[i] = shuffledH[k];
            shuffledH[k] = th;
            double tj = shuffledJ[i];
            shuffledJ[i] = shuffledJ[k];
            shuffledJ[k] = tj;
        }
        Characterization expected = CurveCharacterizer.characterize(ordered);
        Characterization shuffled = CurveCharacterizer.characterize(
                DemagnetizationCurve.of(Quantity.J, shuffledH, shuffledJ, 293.15));
        assertEquals(expected, shuffled);
    }

    @Test
    void a_full_loop_is_characterized_on_its_descending_branch() {
        DemagnetizationCurve branch = InventedCurves.intrinsic(1.3, 1.04, 1.4e6, 4e4, 2.0e6, -2.0e6, 801, 0, 1);
        double[] h = branch.h();
        double[] j = branch.j();
        int n = h.length;
        double[] loopH = new double[2 * n - 1];
        double[] loopJ = new double[2 * n - 1];
        for (int i = 0; i < n; i++) {
            loopH[i] = h[i];
            loopJ[i] = j[i];
        }
        for (int i = 1; i < n; i++) {
            loopH[n - 1 + i] = h[n - 1 - i];
            loopJ[n - 1 + i] = -j[i];
        }
        DemagnetizationCurve loop = new DemagnetizationCurve(CurveKind.LOOP, Quantity.J, loopH, loopJ, 293.15);
        assertEquals(CurveCharacterizer.characterize(branch), CurveCharacterizer.characterize(loop));
    }

    @Test
    void noisy_curve_gives_the_noise_free_values_within_the_noise() {
        double noise = 0.003 * 1.3;
        DemagnetizationCurve clean = InventedCurves.intrinsic(1.3, 1.04, 1.4e6, 4e4, 0.2e6, -1.6e6, 1801, 0, 3);
        DemagnetizationCurve noisy = InventedCurves.intrinsic(1.3, 1.04, 1.4e6, 4e4, 0.2e6, -1.6e6, 1801, noise, 3);
        double[] difference = new double[clean.size()];
        double sumSquares = 0;
        for (int i = 0; i < difference.length; i++) {
            difference[i] = noisy.j()[i] - clean.j()[i];
            sumSquares += difference[i] * difference[i];
        }
        assertTrue(Math.sqrt(sumSquares / difference.length) > 0.8 * noise, "the noise is really there");
        Characterization expected = CurveCharacterizer.characterize(clean);
        Characterization c = CurveCharacterizer.characterize(noisy);
        assertEquals(expected.br(), c.br(), 0.005 * expected.br());
        assertEquals(expected.hcj(), c.hcj(), 0.01 * expected.hcj());
        assertEquals(expected.hk(), c.hk(), 0.02 * expected.hk());
        assertEquals(expected.bhMax(), c.bhMax(), 0.01 * expected.bhMax());
        assertEquals(expected.muRec(), c.muRec(), 0.01);
    }

    @Test
    void a_curve_that_stops_before_the_knee_reports_hk_and_hcj_as_not_reached() {
        Characterization c = CurveCharacterizer.characterize(
                InventedCurves.intrinsic(1.3, 1.04, 2.0e6, 4e4, 0.1e6, -1.0e6, 300, 0, 1));
        assertNull(c.hk());
        assertNull(c.hcj());
        assertNull(c.squareness());
        assertNotNull(c.hcb());
        assertNotNull(c.bhMax());
    }

    @Test
    void a_curve_that_stops_before_b_reaches_zero_reports_no_hcb_and_no_unreached_maximum() {
        Characterization c = CurveCharacterizer.characterize(
                InventedCurves.intrinsic(1.3, 1.04, 2.0e6, 4e4, 0.1e6, -0.3e6, 300, 0, 1));
        assertNull(c.hcb());
        assertNull(c.bhMax());
        assertNull(c.hAtBhMax());
        assertEquals(1.04, c.muRec(), 1e-6);
    }

    @Test
    void a_curve_wholly_in_the_first_quadrant_is_refused() {
        var error = assertThrows(BadInputException.class, () -> CurveCharacterizer.characterize(
                DemagnetizationCurve.of(Quantity.B, new double[] {0, 1e5, 2e5}, new double[] {1.2, 1.3, 1.4}, null)));
        assertTrue(error.getMessage().contains("first quadrant"), error.getMessage());
    }

    @Test
    void a_curve_that_never_reaches_h_zero_is_refused() {
        var error = assertThrows(BadInputException.class, () -> CurveCharacterizer.characterize(
                DemagnetizationCurve.of(Quantity.J, new double[] {-3e5, -2e5, -1e5}, new double[] {1.1, 1.15, 1.2}, null)));
        assertTrue(error.getMessage().contains("does not reach H = 0"), error.getMessage());
    }

    @Test
    void two_points_are_too_few() {
        var error = assertThrows(BadInputException.class, () -> CurveCharacterizer.characterize(
                DemagnetizationCurve.of(Quantity.J, new double[] {-1e5, 0}, new double[] {1.1, 1.2}, null)));
        assertEquals("a curve needs at least 3 points with distinct H, got 2", error.getMessage());
    }

    @Test
    void conflicting_duplicates_are_refused_with_their_point_numbers() {
        var error = assertThrows(BadInputException.class, () -> CurveCharacterizer.characterize(
                DemagnetizationCurve.of(Quantity.J, new double[] {-2e5, -1e5, 0, -1e5},
                        new double[] {1.1, 1.15, 1.2, 0.9}, null)));
        assertTrue(error.getMessage().startsWith("points 2 and 4 have the same H"), error.getMessage());
    }

    @Test
    void a_magnet_with_negative_remanence_is_refused() {
        var error = assertThrows(BadInputException.class, () -> CurveCharacterizer.characterize(
                DemagnetizationCurve.of(Quantity.J, new double[] {-2e5, -1e5, 0}, new double[] {-1.3, -1.25, -1.2}, null)));
        assertTrue(error.getMessage().contains("positive remanence"), error.getMessage());
    }

    @Test
    void b_and_j_convert_by_mu0_h() {
        DemagnetizationCurve normal = DemagnetizationCurve.of(Quantity.B, new double[] {-1e6, 0}, new double[] {0.0, 1.2}, null);
        assertEquals(MU0 * 1e6, normal.j()[0], 1e-15);
        assertEquals(0.0, normal.b()[0]);
        DemagnetizationCurve intrinsic = DemagnetizationCurve.of(Quantity.J, normal.h(), normal.j(), null);
        assertEquals(normal.b()[0], intrinsic.b()[0], 1e-15);
    }
}
