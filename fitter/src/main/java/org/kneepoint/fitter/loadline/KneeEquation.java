package org.kneepoint.fitter.loadline;

import org.kneepoint.fitter.error.NumericalFailureException;

/**
 * Root of c + a·H − d·exp(−(H + HcJ)/w) = 0 with a ≥ 0, c, d, w &gt; 0: the operating point and the
 * knee field of a {@link LinearRecoilKnee} curve. The left side is increasing and concave in H, so
 * Newton's method started where it is ≤ 0 climbs to the root from the left without overshooting
 * (a standard property of Newton's method on convex/concave monotone functions, e.g. Süli and Mayers,
 * An Introduction to Numerical Analysis, CUP 2003, §1.4). The start is the linear solution −c/a, or
 * −HcJ where that lies further left; when the root lies past −HcJ the first step from −HcJ overshoots
 * once to the left and the climb follows. A bracket guards every step.
 */
final class KneeEquation {

    /** Relative size of the last Newton step at which the iteration stops (error then far below 1e-9). */
    static final double RELATIVE_STEP = 1e-11;

    private static final int MAX_ITERATIONS = 100;

    private KneeEquation() {
    }

    static double root(double c, double a, double d, double hcj, double width) {
        double low = Double.NEGATIVE_INFINITY;
        double high = 0.0;
        double h = Math.max(-c / a, -hcj);
        for (int iteration = 0; iteration < MAX_ITERATIONS; iteration++) {
            double exponential = d * Math.exp(-(h + hcj) / width);
            double value = c + a * h - exponential;
            if (value <= 0.0) {
                low = h;
            } else {
                high = h;
            }
            double next = h - value / (a + exponential / width);
            if (!(next > low && next < high)) {
                next = low == Double.NEGATIVE_INFINITY ? h - 2.0 * Math.abs(value / (a + exponential / width)) : 0.5 * (low + high);
            }
            double step = next - h;
            h = next;
            if (Math.abs(step) <= RELATIVE_STEP * (Math.abs(h) + width)) {
                return h;
            }
        }
        throw new NumericalFailureException("operating point did not converge for c = " + c + ", a = " + a + ", d = " + d
                + ", HcJ = " + hcj + " A/m, w = " + width + " A/m");
    }
}
