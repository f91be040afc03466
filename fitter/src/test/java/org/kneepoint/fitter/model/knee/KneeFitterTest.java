package org.kneepoint.fitter.model.knee;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import java.util.SplittableRandom;
import java.util.function.DoubleUnaryOperator;
import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.curve.CurveCharacterizer;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.curve.Quantity;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.loadline.LinearRecoilKnee;

class KneeFitterTest {

    static DemagnetizationCurve sampled(DoubleUnaryOperator j, double hTop, double hBottom, int points, double noise, long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        double[] h = new double[points];
        double[] values = new double[points];
        for (int i = 0; i < points; i++) {
            h[i] = hTop + (hBottom - hTop) * i / (points - 1);
            values[i] = j.applyAsDouble(h[i]) + noise * random.nextGaussian();
        }
        return DemagnetizationCurve.of(Quantity.J, h, values, 293.15);
    }

    /**
     * Invented sintered-like curve of a formula unlike the model's: (Br + μ0(μrec − 1)H)·(1 − exp(−(H + HcJ)/w)),
     * which passes J = 0 at −HcJ and turns negative beyond, as a measured curve does.
     */
    static double multiplicativeKnee(double h, double br, double muRec, double hcj, double width) {
        return (br + MU0 * (muRec - 1) * h) * (1 - Math.exp(-(h + hcj) / width));
    }

    @Test
    void fit_recovers_the_parameters_of_its_own_model_from_noisy_data() {
        LinearRecoilKnee truth = new LinearRecoilKnee(1.3, 1.05, 1.4e6, 3e4);
        double noise = 0.002;
        DemagnetizationCurve curve = sampled(truth::j, 1e5, -1.4e6, 500, noise, 11);
        KneeFit fit = KneeFitter.fit(curve);
        double sumSquares = 0;
        double[] measured = curve.values();
        double[] h = curve.h();
        for (int i = 0; i < h.length; i++) {
            sumSquares += Math.pow(measured[i] - truth.j(h[i]), 2);
        }
        assertTrue(Math.sqrt(sumSquares / h.length) > 0.8 * noise, "the noise is really there");
        assertEquals(1.3, fit.model().remanence(), 3 * fit.errors()[0] + 1e-4);
        assertEquals(1.05, fit.model().recoilPermeability(), 3 * fit.errors()[1] + 1e-3);
        assertEquals(1.4e6, fit.model().intrinsicCoercivity(), 3 * fit.errors()[2] + 1e3);
        assertEquals(3e4, fit.model().kneeWidth(), 3 * fit.errors()[3] + 300);
        assertEquals(noise, fit.rmsJ(), 0.1 * noise);
    }

    // Not circular: the data come from a different knee formula; the fitted model must still give the
    // curve's own Br, HcJ, Hk and μrec (as characterized from the data) closely.
    @Test
    void fit_follows_a_square_sintered_curve_of_another_formula() {
        DemagnetizationCurve curve = sampled(h -> multiplicativeKnee(h, 1.42, 1.04, 1.1e6, 0.01 * 1.1e6), 5e4, -1.11e6, 500, 0, 1);
        var characterized = CurveCharacterizer.characterize(curve);
        KneeFit fit = KneeFitter.fit(curve);
        assertEquals(characterized.br(), fit.model().remanence(), 0.002 * characterized.br());
        assertEquals(characterized.hcj(), fit.model().intrinsicCoercivity(), 0.01 * characterized.hcj());
        assertEquals(characterized.hk(), fit.hk(), 0.02 * characterized.hk());
        assertEquals(characterized.muRec(), fit.model().recoilPermeability(), 0.01);
        assertEquals(characterized.bhMax(), fit.bhMax(), 0.01 * characterized.bhMax());
        assertTrue(fit.rmsJ() < 0.01 * characterized.br(), "rms " + fit.rmsJ());
    }

    @Test
    void fit_follows_a_round_ferrite_curve_of_another_formula() {
        DemagnetizationCurve curve = sampled(h -> multiplicativeKnee(h, 0.40, 1.10, 2.6e5, 0.12 * 2.6e5), 1e4, -2.7e5, 300, 0, 1);
        var characterized = CurveCharacterizer.characterize(curve);
        KneeFit fit = KneeFitter.fit(curve);
        assertEquals(characterized.br(), fit.model().remanence(), 0.005 * characterized.br());
        assertEquals(characterized.hcj(), fit.model().intrinsicCoercivity(), 0.02 * characterized.hcj());
        assertEquals(characterized.hk(), fit.hk(), 0.03 * characterized.hk());
        assertTrue(fit.rmsJ() < 0.02 * characterized.br(), "rms " + fit.rmsJ());
    }

    @Test
    void a_curve_that_stops_before_its_knee_is_refused() {
        DemagnetizationCurve curve = sampled(h -> multiplicativeKnee(h, 1.3, 1.05, 2e6, 4e4), 5e4, -8e5, 100, 0, 1);
        var error = assertThrows(BadInputException.class, () -> KneeFitter.fit(curve));
        assertTrue(error.getMessage().startsWith("the curve stops before its knee"), error.getMessage());
    }

    @Test
    void flat_and_tiny_curves_are_refused() {
        assertThrows(BadInputException.class, () -> KneeFitter.fit(
                DemagnetizationCurve.of(Quantity.J, new double[] {0, -1e5}, new double[] {1.2, 1.2}, null)));
        assertThrows(BadInputException.class, () -> KneeFitter.fit(sampled(h -> 1.2, 1e4, -1e6, 50, 0, 1)));
        // Noise only: refused as bad input or as a fit that cannot converge, either way with a clear message.
        assertThrows(org.kneepoint.fitter.error.KneepointException.class, () -> KneeFitter.fit(sampled(h -> 0.0, 1e4, -1e6, 50, 0.01, 1)));
    }

    // Reference library: Commons Math's LevenbergMarquardtOptimizer on the same model and data must
    // land on the same parameters as the project's own 4-parameter optimizer.
    @Test
    void the_fit_agrees_with_commons_math_levenberg_marquardt() {
        DemagnetizationCurve curve = sampled(h -> multiplicativeKnee(h, 1.3, 1.05, 1.6e6, 5e4), 5e4, -1.62e6, 500, 0.001, 3);
        KneeFit fit = KneeFitter.fit(curve);
        double[][] data = org.kneepoint.fitter.curve.DemagnetizationBranch.of(curve).measuredBetween(fit.lowestH(), fit.highestH());
        var optimum = new org.apache.commons.math3.fitting.leastsquares.LevenbergMarquardtOptimizer().optimize(
                new org.apache.commons.math3.fitting.leastsquares.LeastSquaresBuilder()
                        .start(new double[] {1.25, 1.03, 1.5e6, 3e4}).model(new KneeResidual(data[0])).target(data[1])
                        .maxIterations(1000).maxEvaluations(2000).build());
        double[] reference = optimum.getPoint().toArray();
        LinearRecoilKnee model = fit.model();
        assertEquals(reference[0], model.remanence(), 1e-6 * reference[0]);
        assertEquals(reference[1], model.recoilPermeability(), 1e-6);
        assertEquals(reference[2], model.intrinsicCoercivity(), 1e-6 * reference[2]);
        assertEquals(reference[3], model.kneeWidth(), 1e-4 * reference[3]);
        assertEquals(optimum.getRMS(), fit.rmsJ(), 1e-9);
    }

    // A rounded AlNiCo-like curve J = Br·(1 − (−H/HcJ)^5) (invented): the exponential knee follows it
    // only approximately, and the fit says so instead of passing it off as good.
    @Test
    void a_rounded_alnico_like_curve_is_fitted_and_flagged_approximate() {
        DemagnetizationCurve curve = sampled(h -> 1.25 * (1 - Math.pow(Math.max(0, -h / 5.2e4), 5)), 0, -5.2e4, 200, 0, 1);
        KneeFit fit = KneeFitter.fit(curve);
        assertTrue(fit.approximate(), "rms " + fit.rmsJ());
        assertEquals(5.2e4, fit.model().intrinsicCoercivity(), 0.05 * 5.2e4);
        assertFalse(KneeFitter.fit(sampled(h -> multiplicativeKnee(h, 1.3, 1.05, 1.4e6, 3e4), 5e4, -1.41e6, 300, 0, 1)).approximate());
    }
}
