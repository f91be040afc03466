package org.kneepoint.fitter.model.knee;

import java.util.List;

/**
 * The shape of a knee: the fraction f(t) of the recoil line's polarization that is left at the reduced
 * field t = −H/HcJ, with f = 1 at t ≤ 0 (or smoothly so) and f(1) = 0 exactly, so that J(−HcJ) = 0.
 * {@link KneeCurve} multiplies it by the recoil line. Implementations are immutable records whose
 * parameters the knee fit adjusts; {@link #fraction(double, double, double[])} also gives the
 * derivatives the fit needs.
 */
public sealed interface KneeShape permits SwitchingShape, RationalShape {

    /** f at reduced field t (logT = ln t, NaN for t ≤ 0). */
    double fraction(double t, double logT);

    /**
     * f at t and its derivatives: {@code derivatives[0]} = ∂f/∂t, then ∂f/∂ of each shape parameter in
     * the order of {@link #parameters()}.
     */
    double fraction(double t, double logT, double[] derivatives);

    /**
     * As {@link #fraction(double, double, double[])} at the first {@code count} reduced fields at once, with what does
     * not depend on t worked out once: {@code f[i]}, and {@code derivatives[k][i]} in the order of that method's.
     */
    void fractions(double[] t, double[] logT, int count, double[] f, double[][] derivatives);

    /** The shape parameters, in a fixed order. */
    double[] parameters();

    /** Names of the shape parameters as reported in JSON, in the order of {@link #parameters()}. */
    List<String> parameterNames();

    /** The same kind of shape with other parameters, pulled inside the kind's bounds. */
    KneeShape with(double[] parameters);

    /** A short name of the form: {@code switching} or {@code rational}. */
    String form();
}
