package org.kneepoint.fitter.loadline;

import static org.kneepoint.fitter.units.MagneticConstant.MU0;

/**
 * Irreversible loss after exposure to an operating point (DESIGN §4): zero at or above the knee
 * field; below it the magnet recoils along J = Br' + μ0·(μrec − 1)·H through the point, so
 * Br' = J(Hop) − μ0·(μrec − 1)·Hop and the loss is 1 − Br'/Br(T), between 0 and 1. The fraction is
 * the same at T0, since the reversible coefficient scales Br' and Br alike. The rule counts only
 * points below the knee, so the loss jumps there from 0 to 0.1 − μ0·(μrec − 1)·Hk/Br (a few per cent),
 * in keeping with HD5, the field of 5 % loss, lying just beyond the knee (IEC 60404-8-1 as summarised
 * in REFERENCES §6a).
 */
public final class IrreversibleLoss {

    private IrreversibleLoss() {
    }

    /** The loss fraction after {@code point} on {@code curve}. */
    public static double after(IntrinsicCurve curve, OperatingPoint point) {
        double knee = curve.kneeField().orElse(Double.NEGATIVE_INFINITY);
        if (point.h() >= knee) {
            return 0.0;
        }
        return fraction(curve, point);
    }

    private static double fraction(IntrinsicCurve curve, OperatingPoint point) {
        double recoilRemanence = point.j() - MU0 * (curve.recoilPermeability() - 1.0) * point.h();
        return Math.min(1.0, Math.max(0.0, 1.0 - recoilRemanence / curve.remanence()));
    }
}
