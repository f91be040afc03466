package org.kneepoint.fitter.loadline;

import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import static org.kneepoint.fitter.curve.Characterization.KNEE_FRACTION;

import java.util.OptionalDouble;
import org.kneepoint.fitter.error.BadInputException;

/**
 * A linear-recoil intrinsic curve with a smooth knee (a form of our own, derived here):
 * J(H) = Br + μ0·(μrec − 1)·H − D·exp(−(H + HcJ)/w), with D = Br − μ0·(μrec − 1)·HcJ so that
 * J(−HcJ) = 0 exactly. dJ/dH = μ0·(μrec − 1) + (D/w)·exp(…) &gt; 0, so J is smooth and strictly
 * increasing; well above the knee (H + HcJ ≫ w) it is the recoil line, and the knee width w sets
 * how square the knee is. Given the knee field Hk (J = 0.9·Br at H = −Hk) the width follows in
 * closed form: w = (HcJ − Hk)/ln(D/(0.1·Br − μ0·(μrec − 1)·Hk)).
 *
 * @param remanence           Br, T
 * @param recoilPermeability  μrec, 1 to 2
 * @param intrinsicCoercivity HcJ, A/m, positive
 * @param kneeWidth           w, A/m, positive
 */
public record LinearRecoilKnee(double remanence, double recoilPermeability, double intrinsicCoercivity, double kneeWidth)
        implements IntrinsicCurve {

    public LinearRecoilKnee {
        positive("remanence Br", remanence, "T");
        positive("intrinsic coercivity HcJ", intrinsicCoercivity, "A/m");
        positive("knee width", kneeWidth, "A/m");
        if (!(recoilPermeability >= 1.0 && recoilPermeability <= 2.0)) {
            throw new BadInputException("recoil permeability must lie between 1 and 2, got " + recoilPermeability);
        }
        if (!(remanence - MU0 * (recoilPermeability - 1.0) * intrinsicCoercivity > 0.0)) {
            throw new BadInputException(String.format("the recoil line from Br = %.6g T with μrec = %.6g reaches J = 0 before"
                    + " HcJ = %.6g A/m; a curve needs Br > μ0·(μrec − 1)·HcJ", remanence, recoilPermeability,
                    intrinsicCoercivity));
        }
    }

    /** The curve whose knee field (J = 0.9·Br) is {@code kneeField} A/m, given as a positive magnitude below HcJ. */
    public static LinearRecoilKnee withKneeField(double remanence, double recoilPermeability, double intrinsicCoercivity,
            double kneeField) {
        double slope = MU0 * (recoilPermeability - 1.0);
        double gap = (1.0 - KNEE_FRACTION) * remanence - slope * kneeField;
        if (!(kneeField > 0.0 && kneeField < intrinsicCoercivity) || !(gap > 0.0)) {
            throw new BadInputException(String.format("knee field Hk = %.6g A/m must lie between 0 and HcJ = %.6g A/m and above"
                    + " the point where the recoil line alone falls to 0.9·Br (%.6g A/m)", kneeField, intrinsicCoercivity,
                    slope > 0 ? (1.0 - KNEE_FRACTION) * remanence / slope : Double.POSITIVE_INFINITY));
        }
        double depth = remanence - slope * intrinsicCoercivity;
        if (!(depth > gap)) {
            throw new BadInputException("knee field Hk = " + kneeField + " A/m is too far below HcJ for μrec = "
                    + recoilPermeability + " (need 0.9·Br > μ0·(μrec − 1)·(HcJ − Hk))");
        }
        return new LinearRecoilKnee(remanence, recoilPermeability, intrinsicCoercivity,
                (intrinsicCoercivity - kneeField) / Math.log(depth / gap));
    }

    /** Slope of the recoil line in J, μ0·(μrec − 1), T·m/A. */
    public double recoilSlope() {
        return MU0 * (recoilPermeability - 1.0);
    }

    /** D = J of the recoil line at −HcJ, T. */
    public double kneeDepth() {
        return remanence - recoilSlope() * intrinsicCoercivity;
    }

    @Override
    public double j(double h) {
        return remanence + recoilSlope() * h - kneeDepth() * Math.exp(-(h + intrinsicCoercivity) / kneeWidth);
    }

    @Override
    public OptionalDouble kneeField() {
        return OptionalDouble.of(KneeEquation.root((1.0 - KNEE_FRACTION) * remanence, recoilSlope(), kneeDepth(),
                intrinsicCoercivity, kneeWidth));
    }

    @Override
    public double operatingField(double pc, double opposingField) {
        return KneeEquation.root(remanence + MU0 * pc * opposingField, MU0 * (pc + recoilPermeability), kneeDepth(),
                intrinsicCoercivity, kneeWidth);
    }

    private static void positive(String name, double value, String unit) {
        if (!(value > 0.0) || !Double.isFinite(value)) {
            throw new BadInputException(name + " must be positive and finite in " + unit + ", got " + value);
        }
    }
}
