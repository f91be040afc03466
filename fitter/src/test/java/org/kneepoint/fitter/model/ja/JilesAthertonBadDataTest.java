package org.kneepoint.fitter.model.ja;

import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.error.BadInputException;

class JilesAthertonBadDataTest {

    private final JilesAthertonFitter fitter = new JilesAthertonFitter();

    private static double[] sweep(int n) {
        double[] h = new double[n];
        for (int i = 0; i < n; i++) {
            h[i] = 5000 * Math.cos(2 * Math.PI * i / (n - 1));
        }
        return h;
    }

    private static String messageOf(Runnable fit) {
        return assertThrows(BadInputException.class, fit::run).getMessage();
    }

    @Test
    void flat_field_is_rejected() {
        double[] h = new double[100];
        double[] b = new double[100];
        for (int i = 0; i < 100; i++) {
            h[i] = 1000;
            b[i] = 0.001 * i;
        }
        assertTrue(messageOf(() -> MeasuredLoop.ofFluxDensity(h, b)).contains("H is flat"));
    }

    @Test
    void flat_flux_density_is_rejected() {
        double[] b = new double[100];
        Arrays.fill(b, 0.5);
        assertTrue(messageOf(() -> MeasuredLoop.ofFluxDensity(sweep(100), b)).contains("B is flat"));
    }

    @Test
    void a_single_branch_offered_as_a_loop_is_rejected() {
        double[] h = new double[200];
        double[] b = new double[200];
        for (int i = 0; i < 200; i++) {
            h[i] = -5000 + 50.0 * i;
            b[i] = 1.5 * Math.tanh(h[i] / 1000);
        }
        MeasuredLoop loop = MeasuredLoop.ofFluxDensity(h, b);
        assertTrue(messageOf(() -> fitter.fitLoop(loop, FitProgress.ignore())).contains("single branch"));
    }

    @Test
    void noise_without_a_response_to_the_field_is_rejected() {
        Random random = new Random(1L);
        double[] h = sweep(600);
        double[] b = new double[600];
        for (int i = 0; i < 600; i++) {
            b[i] = 0.01 * random.nextGaussian();
        }
        MeasuredLoop loop = MeasuredLoop.ofFluxDensity(h, b);
        assertTrue(messageOf(() -> fitter.fitLoop(loop, FitProgress.ignore())).contains("noise"));
    }

    @Test
    void two_points_are_rejected() {
        assertTrue(messageOf(() -> MeasuredLoop.ofFluxDensity(new double[] {0, 1000}, new double[] {0, 1}))
                .contains("at least " + MeasuredLoop.MINIMUM_POINTS));
    }

    @Test
    void nan_is_rejected_with_its_position() {
        double[] h = sweep(100);
        double[] b = new double[100];
        for (int i = 0; i < 100; i++) {
            b[i] = 1e-4 * h[i];
        }
        b[41] = Double.NaN;
        assertTrue(messageOf(() -> MeasuredLoop.ofFluxDensity(h, b)).contains("point 42"));
        h[3] = Double.POSITIVE_INFINITY;
        b[41] = 0;
        assertTrue(messageOf(() -> MeasuredLoop.ofFluxDensity(h, b)).contains("point 4"));
    }

    @Test
    void a_second_quadrant_curve_with_rising_field_or_no_magnetizing_field_is_rejected() {
        double[] h = new double[50];
        double[] b = new double[50];
        for (int i = 0; i < 50; i++) {
            h[i] = -20.0 * i;
            b[i] = 1 + 1e-3 * h[i];
        }
        h[10] = 100;
        assertTrue(messageOf(() -> fitter.fitSecondQuadrant(MeasuredLoop.secondQuadrant(h, b, 5000),
                FitProgress.ignore())).contains("rises at point 11"));
        h[10] = -200;
        assertTrue(messageOf(() -> fitter.fitSecondQuadrant(MeasuredLoop.ofFluxDensity(h, b),
                FitProgress.ignore())).contains("magnetizing field"));
        assertTrue(messageOf(() -> fitter.fitSecondQuadrant(MeasuredLoop.secondQuadrant(h, b, -10),
                FitProgress.ignore())).contains("positive"));
    }

    @Test
    void mismatched_lengths_and_bad_settings_are_rejected() {
        assertThrows(BadInputException.class, () -> MeasuredLoop.ofFluxDensity(sweep(100), new double[99]));
        assertThrows(BadInputException.class, () -> MeasuredLoop.ofMagnetization(sweep(100), new double[99], 0));
        assertThrows(BadInputException.class, () -> new MeasuredLoop(sweep(100), sweep(100), new double[0], -1));
        assertThrows(BadInputException.class, () -> new JilesAthertonFitSettings(1, -1, 10));
        assertThrows(BadInputException.class, () -> new JilesAthertonFitSettings(1, 10, 0));
    }

    @Test
    void a_loop_that_never_reaches_positive_field_is_rejected() {
        double[] h = new double[200];
        double[] b = new double[200];
        for (int i = 0; i < 200; i++) {
            h[i] = -3000 + 2000 * Math.cos(2 * Math.PI * i / 199);
            b[i] = 1e-4 * h[i] + (i < 100 ? 0.1 : -0.1);
        }
        MeasuredLoop loop = MeasuredLoop.ofFluxDensity(h, b);
        assertTrue(messageOf(() -> fitter.fitLoop(loop, FitProgress.ignore())).contains("positive H"));
    }
}
