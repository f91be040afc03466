package org.kneepoint.fitter.loadline;

/**
 * Root of c + a·H = d·exp(−(H + HcJ)/w) with a ≥ 0 and c, d, w &gt; 0: the operating point and the knee
 * field of a {@link LinearRecoilKnee} curve, in closed form (derived here). With the linear solution
 * H_lin = −c/a and y = (H − H_lin)/w the equation becomes y·e^y = (d/(a·w))·e^(−(H_lin + HcJ)/w), so
 * H = H_lin + w·W(z) with the Lambert W function ({@link LambertW}), evaluated from ln z so that it
 * never overflows. y is the (positive) shift of the root from the recoil line's solution in knee widths;
 * its relative error is near rounding, so H is accurate far below 1e-9 relative. For a = 0 (μrec = 1)
 * the equation is solved directly: H = −HcJ + w·ln(d/c).
 */
final class KneeEquation {

    private KneeEquation() {
    }

    static double root(double c, double a, double d, double hcj, double width) {
        if (a == 0.0) {
            return -hcj + width * Math.log(d / c);
        }
        return fromLogarithms(-c / a, Math.log(d / width) - Math.log(a), hcj, width);
    }

    /** The same root from H_lin = −c/a and ln(d/(a·w)), for callers that keep the logarithms. */
    static double fromLogarithms(double linearField, double logDepthOverSlopeWidth, double hcj, double width) {
        double logArgument = logDepthOverSlopeWidth - (linearField + hcj) / width;
        return linearField + width * LambertW.ofLogarithm(logArgument);
    }
}
