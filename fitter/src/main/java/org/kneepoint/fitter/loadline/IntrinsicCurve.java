package org.kneepoint.fitter.loadline;

import java.util.OptionalDouble;

/**
 * The intrinsic demagnetization curve J(H) of one grade at one temperature, in the second quadrant:
 * J in tesla non-decreasing in H (A/m, H ≤ 0), with its remanence and recoil permeability
 * (docs/design.md §4). Implementations are immutable.
 */
public interface IntrinsicCurve {

    /** Br = J(0), T. */
    double remanence();

    /** Relative recoil permeability μrec ≥ 1; the recoil line has slope μ0·(μrec − 1) in J. */
    double recoilPermeability();

    /** J at field strength {@code h} (A/m). */
    double j(double h);

    /** The knee field: the (negative) H where J falls to 0.9·Br, or empty if the curve never gets there. */
    OptionalDouble kneeField();

    /** H of the operating point on the load line B = −μ0·Pc·(H + Ha). */
    double operatingField(double pc, double opposingField);

    /**
     * Whether J at {@code h} lies below the field range the curve was measured to, so that a fitted model stands in for
     * the data there; a parametric curve has no measured range and never does.
     */
    default boolean beyondMeasuredField(double h) {
        return false;
    }
}
