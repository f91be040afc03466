package org.kneepoint.fitter.model.knee;

import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.curve.Quantity;
import org.kneepoint.fitter.loadline.LinearRecoilKnee;

/**
 * A knee model written out as an intrinsic curve: points evenly spaced in H from a little above
 * H = 0 (5 % of HcJ) down to HcJ, where the model's J reaches 0 — the range it describes.
 */
public final class ModeledCurves {

    public static final int DEFAULT_POINTS = 400;

    private ModeledCurves() {
    }

    public static DemagnetizationCurve sample(LinearRecoilKnee model, double temperatureK, int points) {
        double hcj = model.intrinsicCoercivity();
        double[] h = new double[points];
        double[] j = new double[points];
        for (int i = 0; i < points; i++) {
            h[i] = 0.05 * hcj - 1.05 * hcj * i / (points - 1);
            j[i] = Math.max(0.0, model.j(h[i]));
        }
        return DemagnetizationCurve.of(Quantity.J, h, j, temperatureK);
    }
}
