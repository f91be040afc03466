package org.kneepoint.fitter.elements;

import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import org.hipparchus.analysis.solvers.BrentSolver;
import org.kneepoint.fitter.loadline.IntrinsicCurve;

/**
 * H along the magnetization from B along it, on the grade's virgin curve: the root of μ0·H + J(H) = B, which is
 * increasing in H, by Brent's method (R. P. Brent, Algorithms for Minimization without Derivatives, Prentice-Hall,
 * 1973, ch. 4; Hipparchus {@link BrentSolver}). Since J ≤ Br for H ≤ 0 and J ≥ Br for H ≥ 0 the root lies between
 * 0 and (B − Br)/μ0.
 */
final class FieldFromFluxDensity {

    private static final double RELATIVE_ACCURACY = 1e-14;
    private static final double ABSOLUTE_ACCURACY = 1e-9;
    private static final int MAX_EVALUATIONS = 300;

    private FieldFromFluxDensity() {
    }

    /** H (A/m) where μ0·H + J(H) = {@code b} on {@code curve}. */
    static double on(IntrinsicCurve curve, double b) {
        double br = curve.remanence();
        if (b == br) {
            return 0.0;
        }
        double low = Math.min(0.0, (b - br) / MU0);
        double high = Math.max(0.0, (b - br) / MU0);
        double fLow = excess(curve, low, b);
        for (int step = 0; step < MAX_EVALUATIONS && !(fLow > Double.NEGATIVE_INFINITY); step++) {
            // far past HcJ a knee model's exponential overflows: move the lower end in until it is finite
            double middle = 0.5 * (low + high);
            double fMiddle = excess(curve, middle, b);
            if (fMiddle >= 0.0) {
                high = middle;
            } else {
                low = middle;
                fLow = fMiddle;
            }
        }
        if (fLow == 0.0) {
            return low;
        }
        return new BrentSolver(RELATIVE_ACCURACY, ABSOLUTE_ACCURACY).solve(MAX_EVALUATIONS, h -> excess(curve, h, b), low, high);
    }

    private static double excess(IntrinsicCurve curve, double h, double b) {
        return MU0 * h + curve.j(h) - b;
    }
}
