package org.kneepoint.fitter.study;

import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.kneepoint.fitter.error.NumericalFailureException;
import org.kneepoint.fitter.loadline.IntrinsicCurve;
import org.kneepoint.fitter.loadline.LinearRecoilKnee;
import org.kneepoint.fitter.model.knee.KneeCurve;
import org.kneepoint.fitter.temperature.TemperatureCurve;

/**
 * HcJ of an intrinsic curve as a positive number (A/m): the curve's own where it knows it (a measured curve's
 * characterized HcJ, a model's parameter), else the field where J falls to 0 by a bracketing Brent search.
 */
public final class IntrinsicCoercivity {

    private IntrinsicCoercivity() {
    }

    /** HcJ of {@code curve}, A/m, positive; a curve that never falls to J = 0 is a numerical failure. */
    public static double of(IntrinsicCurve curve) {
        if (curve instanceof TemperatureCurve measured) {
            return measured.intrinsicCoercivity();
        }
        if (curve instanceof KneeCurve knee) {
            return knee.intrinsicCoercivity();
        }
        if (curve instanceof LinearRecoilKnee linear) {
            return linear.intrinsicCoercivity();
        }
        double low = -curve.remanence() / org.kneepoint.fitter.units.MagneticConstant.MU0;
        for (int i = 0; i < 60 && curve.j(low) > 0.0; i++) {
            low *= 2.0;
        }
        if (!(curve.j(low) <= 0.0)) {
            throw new NumericalFailureException("the curve never falls to J = 0, so it has no HcJ");
        }
        return -new BracketingNthOrderBrentSolver(1e-13, 1e-10 * -low, 1e-15, 5).solve(200, curve::j, low, 0.0);
    }
}
