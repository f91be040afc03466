package org.kneepoint.fitter.qualification;

import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.curve.Quantity;

/**
 * Invented lot curves for tests (no real grade's data): J = (Br + μ0·(μrec − 1)·H)·(1 − exp(−(H + HcJ)/w))
 * above −HcJ, 0 below, a formula of the tests' own. On the grid used (+200 to −1600 kA/m in steps of
 * 2 kA/m) H = 0 and H = −HcJ are grid points, so Br and HcJ are exact by construction.
 */
final class KneeCurves {

    static final double MU_REC = 1.04;
    static final double WIDTH = 0.03e6;

    private KneeCurves() {
    }

    static double j(double h, double br, double hcj) {
        return h <= -hcj ? 0.0 : (br + MU0 * (MU_REC - 1) * h) * (1 - Math.exp(-(h + hcj) / WIDTH));
    }

    static DemagnetizationCurve curve(double br, double hcj, double temperatureK) {
        int points = 901;
        double[] h = new double[points];
        double[] j = new double[points];
        for (int i = 0; i < points; i++) {
            h[i] = 0.2e6 - 1.8e6 * i / (points - 1);
            j[i] = j(h[i], br, hcj);
        }
        return DemagnetizationCurve.of(Quantity.J, h, j, temperatureK);
    }
}
