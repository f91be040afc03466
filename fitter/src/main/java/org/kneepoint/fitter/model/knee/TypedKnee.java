package org.kneepoint.fitter.model.knee;

import static org.kneepoint.fitter.curve.Characterization.KNEE_FRACTION;
import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import java.util.Locale;
import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.kneepoint.fitter.error.BadInputException;

/**
 * The knee model ({@link KneeCurve}) of a grade typed in from a data sheet's Br, μrec, HcJ and knee field Hk, so that
 * typed-in and fitted grades share one parametric model. The shape is the switching form symmetric in H
 * ({@link SwitchingShape} with λ = 1, c = 0: a logistic spread of switching fields, the square knee of sintered
 * grades; our choice, as a data sheet gives no shape). Its width σ is found so that J(−Hk) = 0.9·Br exactly, and the
 * recoil line's permeability μline so that the model's slope at H = 0 is the given μrec; on the straight part the curve
 * is then B = Br + μ0·μrec·H, the textbook recoil line (docs/references.md §6c).
 */
public final class TypedKnee {

    private static final double SQUARE_SKEW = 1.0;
    private static final int SLOPE_PASSES = 4;

    private TypedKnee() {
    }

    /** The curve whose knee (J = 0.9·Br) lies at H = −{@code kneeField}, given as a positive magnitude below HcJ. */
    public static KneeCurve withKneeField(double remanence, double recoilPermeability, double intrinsicCoercivity, double kneeField) {
        check(remanence, recoilPermeability, intrinsicCoercivity);
        double slope = MU0 * (recoilPermeability - 1.0);
        if (!(kneeField > 0.0 && kneeField < intrinsicCoercivity) || !((1.0 - KNEE_FRACTION) * remanence - slope * kneeField > 0.0)) {
            throw new BadInputException(String.format(Locale.ROOT, "knee field Hk = %.6g A/m must lie between 0 and HcJ = %.6g A/m"
                    + " and above the point where the recoil line alone falls to 0.9·Br (%.6g A/m)", kneeField, intrinsicCoercivity,
                    slope > 0 ? (1.0 - KNEE_FRACTION) * remanence / slope : Double.POSITIVE_INFINITY));
        }
        double line = recoilPermeability;
        KneeCurve curve = null;
        for (int pass = 0; pass < SLOPE_PASSES; pass++) {
            curve = new KneeCurve(remanence, line, intrinsicCoercivity, new SwitchingShape(width(remanence, line, intrinsicCoercivity,
                    kneeField), SQUARE_SKEW, 0.0));
            line = Math.max(1.0, line + recoilPermeability - curve.recoilPermeability());
        }
        return curve;
    }

    /** The curve with an assumed square knee of switching width σ = {@code relativeWidth} (relative to HcJ), not data. */
    public static KneeCurve square(double remanence, double recoilPermeability, double intrinsicCoercivity, double relativeWidth) {
        check(remanence, recoilPermeability, intrinsicCoercivity);
        return new KneeCurve(remanence, recoilPermeability, intrinsicCoercivity, new SwitchingShape(relativeWidth, SQUARE_SKEW, 0.0));
    }

    /** σ with (Br + μ0·(μline − 1)·H)·f(Hk/HcJ) = 0.9·Br at H = −Hk; f falls from 1 (σ → 0) towards 1 − t (σ large). */
    private static double width(double br, double line, double hcj, double hk) {
        double t = hk / hcj;
        double level = KNEE_FRACTION * br / (br - MU0 * (line - 1.0) * hk);
        double lowest = Math.log(SwitchingShape.MIN_WIDTH);
        double highest = Math.log(SwitchingShape.MAX_WIDTH);
        if (!(fraction(highest, t) < level)) {
            throw new BadInputException(String.format(Locale.ROOT, "knee field Hk = %.6g A/m lies too far below HcJ = %.6g A/m for a"
                    + " knee: J would fall to 0.9·Br before it even on a straight line to HcJ", hk, hcj));
        }
        if (!(fraction(lowest, t) > level)) {
            return SwitchingShape.MIN_WIDTH;
        }
        double logWidth = new BracketingNthOrderBrentSolver(1e-14, 5).solve(200, logW -> fraction(logW, t) - level, lowest, highest);
        return Math.exp(logWidth);
    }

    private static double fraction(double logWidth, double t) {
        return new SwitchingShape(Math.exp(logWidth), SQUARE_SKEW, 0.0).fraction(t, Math.log(t));
    }

    private static void check(double br, double muRec, double hcj) {
        if (!(br > 0 && Double.isFinite(br)) || !(hcj > 0 && Double.isFinite(hcj))) {
            throw new BadInputException("a typed-in grade needs positive finite Br and HcJ, got Br = " + br + " T, HcJ = " + hcj + " A/m");
        }
        if (!(muRec >= 1.0 && muRec <= 2.0)) {
            throw new BadInputException("recoil permeability must lie between 1 and 2, got " + muRec);
        }
        if (!(br - MU0 * (muRec - 1.0) * hcj > 0.0)) {
            throw new BadInputException(String.format(Locale.ROOT, "the recoil line from Br = %.6g T with μrec = %.6g reaches J = 0"
                    + " before HcJ = %.6g A/m; a curve needs Br > μ0·(μrec − 1)·HcJ", br, muRec, hcj));
        }
    }
}
