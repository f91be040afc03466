package org.kneepoint.fitter.loadline;

/**
 * The principal branch of the Lambert W function for non-negative arguments, y = W(z) with
 * y·e^y = z, taken from L = ln z as the root of y + ln y = L (R. M. Corless, G. H. Gonnet,
 * D. E. G. Hare, D. J. Jeffrey, D. E. Knuth, "On the Lambert W function", Adv. Comput. Math. 5,
 * 329, 1996: series W = z − z² + … for small z, asymptotic W = L − ln L + ln L/L for large L, Halley's
 * iteration, their eq. 5.9). Between L = {@value #LOWEST} and {@value #HIGHEST} a cubic Hermite table
 * in L (step 1/{@value #STEPS_PER_UNIT}, slope dy/dL = y/(1 + y)) gives a start within about 1e-7,
 * and one Halley step brings it to rounding level; outside, the series or the asymptotic start.
 */
final class LambertW {

    static final double LOWEST = -20.0;
    static final double HIGHEST = 60.0;
    static final int STEPS_PER_UNIT = 16;

    private static final double[] NODES = nodes();

    private LambertW() {
    }

    /** W(e^L), for any real L. */
    static double ofLogarithm(double logArgument) {
        if (logArgument < LOWEST) {
            double z = Math.exp(logArgument);
            return z * (1.0 - z);
        }
        if (logArgument >= HIGHEST) {
            double log = Math.log(logArgument);
            return halley(halley(logArgument - log + log / logArgument, logArgument), logArgument);
        }
        double position = (logArgument - LOWEST) * STEPS_PER_UNIT;
        int k = (int) position;
        double t = position - k;
        double y0 = NODES[k];
        double y1 = NODES[k + 1];
        double step = 1.0 / STEPS_PER_UNIT;
        double m0 = step * y0 / (1.0 + y0);
        double m1 = step * y1 / (1.0 + y1);
        double t2 = t * t;
        double t3 = t2 * t;
        double start = (2 * t3 - 3 * t2 + 1) * y0 + (t3 - 2 * t2 + t) * m0 + (-2 * t3 + 3 * t2) * y1 + (t3 - t2) * m1;
        return halley(start, logArgument);
    }

    /** One Halley step on g(y) = y + ln y − L: g' = 1 + 1/y, g'' = −1/y². */
    private static double halley(double y, double logArgument) {
        double g = y + Math.log(y) - logArgument;
        double slope = 1.0 + 1.0 / y;
        double curvature = -1.0 / (y * y);
        return y - 2.0 * g * slope / (2.0 * slope * slope - g * curvature);
    }

    private static double[] nodes() {
        int count = (int) ((HIGHEST - LOWEST) * STEPS_PER_UNIT) + 2;
        double[] values = new double[count];
        for (int k = 0; k < count; k++) {
            double logArgument = LOWEST + (double) k / STEPS_PER_UNIT;
            double y = logArgument < 1.0 ? Math.exp(logArgument) / (1.0 + Math.exp(logArgument)) : logArgument - Math.log(logArgument);
            for (int iteration = 0; iteration < 30; iteration++) {
                y = halley(y, logArgument);
            }
            values[k] = y;
        }
        return values;
    }
}
