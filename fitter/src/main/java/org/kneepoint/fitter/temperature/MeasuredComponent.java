package org.kneepoint.fitter.temperature;

import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import org.kneepoint.fitter.curve.Characterization;
import org.kneepoint.fitter.curve.CurveCharacterizer;
import org.kneepoint.fitter.curve.DemagnetizationBranch;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.model.knee.KneeCurve;

/**
 * One measured curve as a part of {@link CurveAtTemperature}: its monotone interpolant inside the
 * measured H range; below it the curve's fitted knee model, shifted to meet the interpolant at the
 * lowest measured H (so J stays continuous and non-decreasing); above the highest measured H the recoil
 * line from the last point. Br and HcJ are the characterization's; HcJ of a curve that stops before it
 * is the fitted model's.
 */
final class MeasuredComponent {

    private final double temperature;
    private final DemagnetizationBranch branch;
    private final KneeCurve model;
    private final double br;
    private final double hcj;
    private final double recoilSlope;
    private final double modelOffset;

    MeasuredComponent(DemagnetizationCurve curve, KneeCurve model) {
        Characterization c = CurveCharacterizer.characterize(curve);
        this.temperature = curve.temperatureK();
        this.branch = DemagnetizationBranch.of(curve);
        this.model = model;
        this.br = c.br();
        this.hcj = c.hcj() != null ? c.hcj() : model.intrinsicCoercivity();
        this.recoilSlope = MU0 * (c.muRec() - 1.0);
        this.modelOffset = branch.j(branch.lowestH()) - model.j(branch.lowestH());
    }

    double temperature() {
        return temperature;
    }

    double br() {
        return br;
    }

    double hcj() {
        return hcj;
    }

    /** Slope dJ/dH near H = 0, T·m/A. */
    double recoilSlope() {
        return recoilSlope;
    }

    /** Whether H lies below the lowest H this curve was measured to. */
    boolean beyondMeasured(double h) {
        return h < branch.lowestH();
    }

    double j(double h) {
        if (h < branch.lowestH()) {
            return model.j(h) + modelOffset;
        }
        if (h > branch.highestH()) {
            return branch.j(branch.highestH()) + recoilSlope * (h - branch.highestH());
        }
        return branch.j(h);
    }
}
