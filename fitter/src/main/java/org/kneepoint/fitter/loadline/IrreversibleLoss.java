package org.kneepoint.fitter.loadline;

import static org.kneepoint.fitter.units.MagneticConstant.MU0;

/**
 * Irreversible loss after exposure to an operating point by the linear recoil construction (docs/design.md §4):
 * from the point (H, J) on the curve at temperature the magnet recoils along a line of slope μ0·(μrec − 1)
 * in J, so its new remanence is Br' = J(H) − μ0·(μrec − 1)·H and the loss is 1 − Br'/Br(T), kept within
 * 0 and 1. There is no threshold at the knee: on the straight part of the curve Br' = Br and the loss is
 * ≈ 0, and it grows continuously as the point goes round the knee. The fraction is the same at T0, since
 * the reversible coefficient scales Br' and Br alike. The construction is the recoil line drawn from the
 * lowest point reached on the demagnetization curve: P. Campbell, "Magnetic circuit design: recoil
 * operation", sections 4B and 4C of magnetweb.com (Princeton Electro-Technology, 2001), and his "Permanent
 * Magnet Materials and their Application", Cambridge University Press 1994 (the book from memory).
 */
public final class IrreversibleLoss {

    private IrreversibleLoss() {
    }

    /** The loss fraction after {@code point} on {@code curve}. */
    public static double after(IntrinsicCurve curve, OperatingPoint point) {
        double recoilRemanence = point.j() - MU0 * (curve.recoilPermeability() - 1.0) * point.h();
        return Math.min(1.0, Math.max(0.0, 1.0 - recoilRemanence / curve.remanence()));
    }
}
