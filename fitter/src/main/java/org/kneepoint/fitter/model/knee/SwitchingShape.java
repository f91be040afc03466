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
        return fraction(t, logT, d, origin());
    }

    @Override
    public void fractions(double[] t, double[] logT, int count, double[] f, double[][] d) {
        Origin origin = origin();
        double[] point = new double[4];
        for (int i = 0; i < count; i++) {
            f[i] = fraction(t[i], logT[i], point, origin);
            for (int k = 0; k < 4; k++) {
                d[k][i] = point[k];
            }
        }
    }

    /**
     * What does not depend on t: G(z₀) and the derivatives of y₀ = z₀ + c·z₀³ by σ, λ and c, each weighted by
     * G'(z₀)/G(z₀)² (zero where G is flat at z₀ or z₀ = −∞).
     */
    private record Origin(double g0, double width, double skew, double tail) {
    }

    private Origin origin() {
        if (!(skew > 0)) {
            return new Origin(1.0, 0.0, 0.0, 0.0);
        }
        double z0 = -1.0 / (skew * width);
        double g0 = -tanh(z0 + tail * z0 * z0 * z0);
        double slope0 = -(1.0 - g0 * g0);
        if (slope0 == 0.0) {
            return new Origin(g0, 0.0, 0.0, 0.0);
        }
        double weight = slope0 / (g0 * g0);
        double dy0Dz0 = 1.0 + 3.0 * tail * z0 * z0;
        return new Origin(g0, weight * dy0Dz0 * (-z0 / width), weight * dy0Dz0 / (skew * skew * width), weight * z0 * z0 * z0);
    }

    /** f at t, and in d ∂f/∂t, ∂f/∂σ, ∂f/∂λ, ∂f/∂c (when d is not null). */
    private double fraction(double t, double logT, double[] d, Origin origin) {
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
        double f = g / origin.g0();
        if (d != null) {
            double slope = -(1.0 - g * g) / origin.g0();
            double dyDz = 1.0 + 3.0 * tail * z * z;
            d[0] = slope * dyDz * power / (t * width);
            d[1] = slope * dyDz * (-z / width) - g * origin.width();
            d[2] = slope * dyDz * zSkew - g * origin.skew();
            d[3] = slope * z * z * z - g * origin.tail();
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
