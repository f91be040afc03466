package org.kneepoint.fitter.curve;

import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import java.util.OptionalDouble;
import org.kneepoint.fitter.error.BadInputException;

/**
 * Characterizes a demagnetization curve: Br, HcB, HcJ, (BH)max and where it occurs, the knee
 * field Hk (J = 0.9·Br, the usual definition for permanent-magnet grades, IEC 60404-8-1 practice —
 * from memory), squareness Hk/HcJ and the recoil permeability μrec.
 *
 * <p>μrec is the slope of a least-squares line through the measured points near H = 0, on the
 * window from H = −Hk/2 to 0 (or, when the knee is not reached, from half the lowest measured H
 * to 0) — the straight part of the curve well above the knee (our choice; reported with the
 * result). All levels are found on the monotone interpolant of {@link DemagnetizationBranch}.
 */
public final class CurveCharacterizer {

    private static final int MINIMUM_WINDOW_POINTS = 3;
    private static final int SAMPLED_WINDOW_POINTS = 11;

    private CurveCharacterizer() {
    }

    public static Characterization characterize(DemagnetizationCurve curve) {
        return characterize(DemagnetizationBranch.of(curve), curve.temperatureK());
    }

    /** The characterization of a curve's branch already prepared (so a caller that needs the branch builds it once). */
    public static Characterization characterize(DemagnetizationBranch branch, Double temperatureK) {
        requireSecondQuadrant(branch);
        double br = branch.j(0.0);
        if (!(br > 0)) {
            throw new BadInputException(String.format(
                    "J at H = 0 is %.4g T; expected a magnet magnetized along +H with a positive remanence", br));
        }
        Double hcj = magnitude(branch.fieldAtJ(0.0));
        Double hcb = magnitude(branch.fieldAtB(0.0));
        Double hk = magnitude(branch.fieldAtJ(Characterization.KNEE_FRACTION * br));
        Double squareness = hk != null && hcj != null ? hk / hcj : null;
        EnergyProductMaximum maximum = EnergyProductMaximum.find(branch, hcb);
        RecoilWindow window = recoilWindow(branch, hk);
        double muRec = 1.0 + recoilSlope(branch, window) / MU0;
        return new Characterization(br, hcb, hcj,
                maximum == null ? null : maximum.bh(),
                maximum == null ? null : maximum.h(),
                maximum == null ? null : maximum.b(),
                hk, squareness, muRec, window, temperatureK);
    }

    private static void requireSecondQuadrant(DemagnetizationBranch branch) {
        if (branch.lowestH() >= 0) {
            throw new BadInputException(String.format(
                    "the curve lies wholly in the first quadrant (lowest H is %.4g A/m); a demagnetization curve needs points with H < 0",
                    branch.lowestH()));
        }
        if (branch.highestH() < 0) {
            throw new BadInputException(String.format(
                    "the curve does not reach H = 0 (highest H is %.4g A/m); Br needs a point at H ≥ 0", branch.highestH()));
        }
    }

    private static Double magnitude(OptionalDouble field) {
        return field.isPresent() ? Math.abs(field.getAsDouble()) : null;
    }

    private static RecoilWindow recoilWindow(DemagnetizationBranch branch, Double hk) {
        double from = hk != null ? -0.5 * hk : 0.5 * branch.lowestH();
        int points = branch.measuredBetween(from, 0.0)[0].length;
        return new RecoilWindow(from, 0.0, points >= MINIMUM_WINDOW_POINTS ? points : 0);
    }

    /** Least-squares slope dJ/dH over the window: measured points, or the interpolant sampled. */
    private static double recoilSlope(DemagnetizationBranch branch, RecoilWindow window) {
        double[] h;
        double[] j;
        if (window.points() > 0) {
            double[][] measured = branch.measuredBetween(window.from(), window.to());
            h = measured[0];
            j = measured[1];
        } else {
            h = new double[SAMPLED_WINDOW_POINTS];
            j = new double[SAMPLED_WINDOW_POINTS];
            for (int i = 0; i < SAMPLED_WINDOW_POINTS; i++) {
                h[i] = window.from() + (window.to() - window.from()) * i / (SAMPLED_WINDOW_POINTS - 1);
                j[i] = branch.j(h[i]);
            }
        }
        double meanH = 0;
        double meanJ = 0;
        for (int i = 0; i < h.length; i++) {
            meanH += h[i];
            meanJ += j[i];
        }
        meanH /= h.length;
        meanJ /= h.length;
        double sxy = 0;
        double sxx = 0;
        for (int i = 0; i < h.length; i++) {
            sxy += (h[i] - meanH) * (j[i] - meanJ);
            sxx += (h[i] - meanH) * (h[i] - meanH);
        }
        return sxy / sxx;
    }
}
