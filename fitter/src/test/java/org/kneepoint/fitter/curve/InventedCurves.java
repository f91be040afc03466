package org.kneepoint.fitter.curve;

import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import java.util.SplittableRandom;

/**
 * Invented demagnetization curves for tests (not data of any real grade). The knee shape
 * J = (Br + μ0·(μrec − 1)·H)·(1 − exp(−(H + HcJ)/w)) is a formula of the tests' own, unrelated to
 * the characterization code, so the tests are not circular; HcJ is exact by construction.
 */
final class InventedCurves {

    private InventedCurves() {
    }

    /** J of the invented knee curve at {@code h} (0 at and below −HcJ). */
    static double j(double h, double br, double muRec, double hcj, double width) {
        if (h <= -hcj) {
            return 0.0;
        }
        return (br + MU0 * (muRec - 1) * h) * (1 - Math.exp(-(h + hcj) / width));
    }

    /** An intrinsic curve from +hStart down to hEnd (negative) with {@code points} points. */
    static DemagnetizationCurve intrinsic(double br, double muRec, double hcj, double width,
            double hStart, double hEnd, int points, double noiseTesla, long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        double[] h = new double[points];
        double[] j = new double[points];
        for (int i = 0; i < points; i++) {
            h[i] = hStart + (hEnd - hStart) * i / (points - 1);
            j[i] = j(h[i], br, muRec, hcj, width) + noiseTesla * random.nextGaussian();
        }
        return DemagnetizationCurve.of(Quantity.J, h, j, 293.15);
    }

    /** The H where the invented curve's J equals {@code level}, by bisection on the formula itself. */
    static double fieldAt(double level, double br, double muRec, double hcj, double width) {
        double low = -hcj;
        double high = 0;
        for (int i = 0; i < 200; i++) {
            double middle = 0.5 * (low + high);
            if (j(middle, br, muRec, hcj, width) < level) {
                low = middle;
            } else {
                high = middle;
            }
        }
        return 0.5 * (low + high);
    }
}
