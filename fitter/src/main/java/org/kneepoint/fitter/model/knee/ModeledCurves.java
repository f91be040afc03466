package org.kneepoint.fitter.model.knee;

import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.curve.Quantity;
import org.kneepoint.fitter.loadline.IntrinsicCurve;

/**
 * A knee model, or any intrinsic curve with its HcJ, written out as an intrinsic curve: points evenly spaced in H
 * from a little above H = 0 (5 % of HcJ) down to HcJ, where J reaches 0 — the range it describes.
 */
public final class ModeledCurves {

    public static final int DEFAULT_POINTS = 400;

    private ModeledCurves() {
    }

    public static DemagnetizationCurve sample(KneeCurve model, double temperatureK, int points) {
        return sample(model, model.intrinsicCoercivity(), temperatureK, points);
    }

    /** {@code model}, whose J reaches 0 at H = −{@code hcj}, sampled the same way. */
    public static DemagnetizationCurve sample(IntrinsicCurve model, double hcj, double temperatureK, int points) {
        double[] h = new double[points];
        double[] j = new double[points];
        for (int i = 0; i < points; i++) {
            h[i] = 0.05 * hcj - 1.05 * hcj * i / (points - 1);
            j[i] = Math.max(0.0, model.j(h[i]));
        }
        // At H = −HcJ the curve is 0 by definition; an interpolated curve may leave a rounding residue there, which would
        // hide its HcJ from the characterization.
        j[points - 1] = 0.0;
        return DemagnetizationCurve.of(Quantity.J, h, j, temperatureK);
    }
}
