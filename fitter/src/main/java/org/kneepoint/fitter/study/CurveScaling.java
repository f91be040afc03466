package org.kneepoint.fitter.study;

/**
 * How a tolerance study perturbs a grade's intrinsic curve, the same at every temperature ({@link PerturbedCurve}):
 * J is multiplied by {@code remanence} (Br's ratio), H by {@code coercivity} (HcJ's ratio, the knee moving with it),
 * the knee field alone by {@code knee} (Hk's ratio with HcJ held), and {@code recoilPermeability} is added to μrec.
 */
public record CurveScaling(double remanence, double coercivity, double knee, double recoilPermeability) {

    /** The curve as it is. */
    public static final CurveScaling NONE = new CurveScaling(1.0, 1.0, 1.0, 0.0);

    /** Whether this scaling leaves the curve as it is. */
    public boolean isNone() {
        return equals(NONE);
    }
}
