package org.kneepoint.fitter.model.knee;

import java.util.List;

/**
 * The knee of a magnet whose grains reverse one by one at a spread of switching fields (sintered NdFeB
 * and SmCo, ferrite, bonded): f = G(z)/G(z₀) with G(z) = −tanh(z + c·z³), z = ((t^λ − 1)/λ)/σ (a Box–Cox
 * transform of the reduced field t = −H/HcJ; ln t at λ = 0) and z₀ its value at t = 0 (−∞ for λ ≤ 0).
 * 1 − G is twice the share of reversed grains, a logistic switching-field distribution for c = 0 in
 * ln H (λ = 0, round curves) or in H (λ = 1, square curves); c &gt; 0 thins its tail towards a Gaussian
 * and beyond. A form of our own, after the switching-field-distribution picture of Preisach-type models
 * (E. Della Torre, "Magnetic Hysteresis", IEEE Press, 1999, ch. 2 — from memory). f(1) = 0 exactly.
 *
 * @param width σ, the spread of switching fields relative to HcJ (in Box–Cox units)
 * @param skew  λ, the Box–Cox exponent: 1 symmetric in H, 0 in ln H, above 1 a squarer onset; as λ grows
 *              (with c = 1/3) the knee tends to an exponential one, 1 − f ∝ exp(λ·(t − 1))
 * @param tail  c ≥ 0, how much thinner than logistic the distribution's tail is
 */
public record SwitchingShape(double width, double skew, double tail) implements KneeShape {

    static final double MIN_WIDTH = 1e-3;
    static final double MAX_WIDTH = 3.0;
    static final double MIN_SKEW = -4.0;
    static final double MAX_SKEW = 500.0;
    static final double MAX_TAIL = 2.0;
    private static final double SMALL_SKEW = 1e-6;

    @Override
    public double fraction(double t, double logT) {
        return fraction(t, logT, null);
    }

    @Override
    public double fraction(double t, double logT, double[] d) {
        double z0 = skew > 0 ? -1.0 / (skew * width) : Double.NEGATIVE_INFINITY;
        if (!(t > 0)) {
            if (d != null) {
                java.util.Arrays.fill(d, 0, 4, 0.0);
            }
            return 1.0;
        }
        double power;
        double z;
        double zSkew;
        if (Math.abs(skew) < SMALL_SKEW) {
            power = 1.0 + skew * logT;
            z = (logT + 0.5 * skew * logT * logT) / width;
            zSkew = (0.5 * logT * logT + skew * logT * logT * logT / 3.0) / width;
        } else {
            power = Math.exp(skew * logT);
            z = (power - 1.0) / (skew * width);
            zSkew = (power * logT - width * z) / (skew * width);
        }
        double y = z + tail * z * z * z;
        double g = -tanh(y);
        double slope = -(1.0 - g * g);
        double g0 = 1.0;
        double slope0 = 0.0;
        double y0 = Double.NEGATIVE_INFINITY;
        if (skew > 0) {
            y0 = z0 + tail * z0 * z0 * z0;
            g0 = -tanh(y0);
            slope0 = -(1.0 - g0 * g0);
        }
        double f = g / g0;
        if (d != null) {
            double dyDz = 1.0 + 3.0 * tail * z * z;
            d[0] = slope * dyDz * power / (t * width) / g0;
            double dyWidth = dyDz * (-z / width);
            double dySkew = dyDz * zSkew;
            double dyTail = z * z * z;
            double dy0Width = 0.0;
            double dy0Skew = 0.0;
            double dy0Tail = 0.0;
            if (skew > 0 && slope0 != 0.0) {
                double dy0Dz0 = 1.0 + 3.0 * tail * z0 * z0;
                dy0Width = dy0Dz0 * (-z0 / width);
                dy0Skew = dy0Dz0 / (skew * skew * width);
                dy0Tail = z0 * z0 * z0;
            }
            double ratio = slope0 == 0.0 ? 0.0 : g * slope0 / (g0 * g0);
            d[1] = slope * dyWidth / g0 - ratio * dy0Width;
            d[2] = slope * dySkew / g0 - ratio * dy0Skew;
            d[3] = slope * dyTail / g0 - ratio * dy0Tail;
        }
        return f;
    }

    /** tanh from one exponential of a non-positive argument, so that it never overflows. */
    private static double tanh(double y) {
        double e = Math.exp(-2.0 * Math.abs(y));
        double magnitude = (1.0 - e) / (1.0 + e);
        return y < 0 ? -magnitude : magnitude;
    }

    @Override
    public double[] parameters() {
        return new double[] {width, skew, tail};
    }

    @Override
    public List<String> parameterNames() {
        return List.of("switchingWidth", "switchingSkew", "switchingTail");
    }

    @Override
    public SwitchingShape with(double[] p) {
        return new SwitchingShape(clamp(p[0], MIN_WIDTH, MAX_WIDTH), clamp(p[1], MIN_SKEW, MAX_SKEW), clamp(p[2], 0.0, MAX_TAIL));
    }

    @Override
    public String form() {
        return "switching";
    }

    static double clamp(double value, double low, double high) {
        return Math.min(high, Math.max(low, value));
    }
}
