package org.kneepoint.fitter.model.knee;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import java.util.function.DoubleUnaryOperator;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.kneepoint.fitter.curve.CurveCharacterizer;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.curve.Quantity;
import org.kneepoint.fitter.error.BadInputException;

class KneeFitterTest {

    private static final double NOISE = 4e-4;

    /**
     * Invented sintered-like curve: (Br + μ0(μrec − 1)H)·(1 − exp(−(H + HcJ)/w)), which passes J = 0 at
     * −HcJ and turns negative beyond, as a measured curve does.
     */
    static double multiplicativeKnee(double h, double br, double muRec, double hcj, double width) {
        return (br + MU0 * (muRec - 1) * h) * (1 - Math.exp(-(h + hcj) / width));
    }

    static Stream<Arguments> families() {
        return Stream.of(
                Arguments.of("square sintered NdFeB (tanh branch)", DemagnetizationForms.takacsBranch(1.30, 1.6e6, 0.04 * 1.6e6, 0.05), 5e4, -1.7e6, 400),
                Arguments.of("very square sintered NdFeB (tanh branch)", DemagnetizationForms.takacsBranch(1.40, 1.2e6, 0.012 * 1.2e6, 0.04), 5e4, -1.3e6, 400),
                Arguments.of("sintered SmCo (Gaussian switching fields)", DemagnetizationForms.switchingDistribution(1.10, 1.03, 2.0e6, 0.06, false), 5e4, -2.2e6, 400),
                Arguments.of("hard ferrite (log-normal switching fields)", DemagnetizationForms.switchingDistribution(0.42, 1.08, 3.0e5, 0.3, true), 1e4, -3.3e5, 300),
                Arguments.of("bonded NdFeB (log-normal switching fields)", DemagnetizationForms.switchingDistribution(0.70, 1.20, 7.5e5, 0.22, true), 2e4, -8.2e5, 300),
                Arguments.of("cast AlNiCo (hyperbolic)", DemagnetizationForms.hyperbolicAlnico(1.25, 5.0e4, 0.85), 0, -5.5e4, 200),
                Arguments.of("sintered, multiplicative exponential knee", (DoubleUnaryOperator) h -> multiplicativeKnee(h, 1.42, 1.04, 1.1e6, 0.01 * 1.1e6), 5e4, -1.11e6, 500));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("families")
    void the_fit_follows_each_family_within_the_scatter_of_its_points(String family, DoubleUnaryOperator form, double top, double bottom, int points) {
        DemagnetizationCurve curve = DemagnetizationForms.sampled(form, top, bottom, points, NOISE, 7);
        DemagnetizationCurve exact = DemagnetizationForms.sampled(form, top, bottom, points, 0, 7);
        var characterized = CurveCharacterizer.characterize(exact);
        KneeFit fit = KneeFitter.fit(curve);
        assertEquals(NOISE, fit.scatterJ(), 0.2 * NOISE, "the scatter estimate finds the noise that was really added");
        assertTrue(fit.rmsJ() <= KneeFit.WITHIN_SCATTER * fit.scatterJ(), family + ": rms " + fit.rmsJ() + " scatter " + fit.scatterJ());
        assertFalse(fit.approximate());
        assertEquals(form.applyAsDouble(0), fit.model().remanence(), 5e-4 * form.applyAsDouble(0), "Br");
        assertEquals(characterized.hcj(), fit.model().intrinsicCoercivity(), 2e-3 * characterized.hcj(), "HcJ");
        assertEquals(characterized.hk(), fit.hk(), 5e-3 * characterized.hk(), "Hk");
    }

    @Test
    void fit_recovers_the_parameters_of_its_own_model_from_noisy_data() {
        KneeCurve truth = new KneeCurve(1.3, 1.05, 1.4e6, new SwitchingShape(0.03, 1.5, 0.05));
        double noise = 0.002;
        DemagnetizationCurve curve = DemagnetizationForms.sampled(truth::j, 1e5, -1.4e6, 500, noise, 11);
        KneeFit fit = KneeFitter.fit(curve);
        assertEquals(noise, fit.scatterJ(), 0.15 * noise, "the noise is really there");
        assertEquals(1.3, fit.model().remanence(), 3 * fit.errors()[0] + 1e-4);
        assertEquals(1.05, fit.model().linePermeability(), 3 * fit.errors()[1] + 1e-3);
        assertEquals(1.4e6, fit.model().intrinsicCoercivity(), 3 * fit.errors()[2] + 1e3);
        assertEquals(truth.kneeWidth(), fit.model().kneeWidth(), 3 * fit.kneeWidthError() + 300);
        assertEquals(noise, fit.rmsJ(), 0.1 * noise);
    }

    @Test
    void an_alnico_curve_that_stops_before_hcj_converges_with_hcj_extrapolated() {
        DoubleUnaryOperator form = DemagnetizationForms.hyperbolicAlnico(1.25, 5.0e4, 0.85);
        KneeFit fit = KneeFitter.fit(DemagnetizationForms.sampled(form, 0, -4.5e4, 31, 2e-4, 3));
        assertEquals(-4.5e4, fit.lowestH(), 1e-9);
        double hcj = CurveCharacterizer.characterize(DemagnetizationForms.sampled(form, 0, -5.5e4, 2001, 0, 3)).hcj();
        assertEquals(hcj, fit.model().intrinsicCoercivity(), 0.03 * hcj);
    }

    @Test
    void a_curve_that_stops_before_its_knee_is_refused() {
        DemagnetizationCurve curve = DemagnetizationForms.sampled(h -> multiplicativeKnee(h, 1.3, 1.05, 2e6, 4e4), 5e4, -8e5, 100, 0, 1);
        var error = assertThrows(BadInputException.class, () -> KneeFitter.fit(curve));
        assertTrue(error.getMessage().startsWith("the curve stops before its knee"), error.getMessage());
    }

    @Test
    void flat_and_tiny_curves_are_refused() {
        assertThrows(BadInputException.class, () -> KneeFitter.fit(
                DemagnetizationCurve.of(Quantity.J, new double[] {0, -1e5}, new double[] {1.2, 1.2}, null)));
        assertThrows(BadInputException.class, () -> KneeFitter.fit(DemagnetizationForms.sampled(h -> 1.2, 1e4, -1e6, 50, 0, 1)));
        // Noise only: refused as bad input or as a fit that cannot converge, either way with a clear message.
        assertThrows(org.kneepoint.fitter.error.KneepointException.class,
                () -> KneeFitter.fit(DemagnetizationForms.sampled(h -> 0.0, 1e4, -1e6, 50, 0.01, 1)));
    }
}
