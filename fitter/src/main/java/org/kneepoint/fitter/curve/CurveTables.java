package org.kneepoint.fitter.curve;

import java.util.Locale;
import java.util.OptionalDouble;
import org.kneepoint.fitter.error.BadInputException;

/**
 * Makes the point tables that exports write: the stored points as they are, or N points evenly
 * spaced in H over the curve's descending branch, taken from its monotone interpolant — so B and
 * J never fold back and a solver's interpolation stays single-valued. Optionally shifted along H
 * by HcB so that B = 0 at H = 0, for solvers that want the curve in the first quadrant.
 */
public final class CurveTables {

    /** Most points an export may ask for. */
    public static final int MAX_POINTS = 1_000_000;

    private CurveTables() {
    }

    public static CurveTable of(DemagnetizationCurve curve, Quantity quantity, Integer points, boolean shifted) {
        if (shifted && quantity != Quantity.B) {
            throw new BadInputException("--shifted moves the normal (B) curve so that B = 0 at H = 0; ask for the normal curve");
        }
        if (points != null && (points < 2 || points > MAX_POINTS)) {
            throw new BadInputException("the number of points must be between 2 and " + MAX_POINTS + ", got " + points);
        }
        double[] h;
        double[] values;
        String description;
        if (points == null) {
            h = curve.h();
            values = quantity == Quantity.B ? curve.b() : curve.j();
            description = "the " + curve.size() + " stored points";
        } else {
            DemagnetizationBranch branch = DemagnetizationBranch.of(curve);
            h = new double[points];
            values = new double[points];
            for (int i = 0; i < points; i++) {
                double field = i == points - 1 ? branch.lowestH()
                        : branch.highestH() + (branch.lowestH() - branch.highestH()) * i / (points - 1);
                h[i] = field;
                values[i] = quantity == Quantity.B ? branch.b(field) : branch.j(field);
            }
            description = points + " points evenly spaced in H on the monotone interpolant of the curve";
        }
        if (shifted) {
            OptionalDouble hcbField = DemagnetizationBranch.of(curve).fieldAtB(0.0);
            if (hcbField.isEmpty()) {
                throw new BadInputException("the curve does not reach B = 0, so it cannot be shifted by HcB");
            }
            double shift = -hcbField.getAsDouble();
            for (int i = 0; i < h.length; i++) {
                h[i] += shift;
            }
            description += String.format(Locale.ROOT, ", shifted by HcB = %.6g A/m so that B = 0 at H = 0", shift);
        }
        return new CurveTable(h, values, quantity, description);
    }
}
