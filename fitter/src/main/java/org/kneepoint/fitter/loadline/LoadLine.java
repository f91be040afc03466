package org.kneepoint.fitter.loadline;

import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import org.kneepoint.fitter.error.BadInputException;

/**
 * The load line B = −μ0·Pc·(H + Ha) (docs/design.md §4): permeance coefficient Pc and an opposing field Ha ≥ 0
 * (A/m, pointing against the magnetization).
 *
 * @param pc            permeance coefficient, positive
 * @param opposingField Ha, A/m, zero or positive
 */
public record LoadLine(double pc, double opposingField) {

    public LoadLine {
        if (!(pc > 0.0) || !Double.isFinite(pc)) {
            throw new BadInputException("permeance coefficient must be positive and finite, got " + pc);
        }
        if (!(opposingField >= 0.0) || !Double.isFinite(opposingField)) {
            throw new BadInputException("opposing field must be zero or positive and finite in A/m, got " + opposingField);
        }
    }

    /** The same Pc with another opposing field. */
    public LoadLine withOpposingField(double newOpposingField) {
        return new LoadLine(pc, newOpposingField);
    }

    /** B on the line at {@code h}. */
    public double fluxDensityAt(double h) {
        return -MU0 * pc * (h + opposingField);
    }

    /** The operating point on {@code curve}. */
    public OperatingPoint on(IntrinsicCurve curve) {
        double h = curve.operatingField(pc, opposingField);
        double b = fluxDensityAt(h);
        return new OperatingPoint(h, b, b - MU0 * h);
    }

    /**
     * The operating point on the recoil line J = Br' + μ0·(μrec − 1)·H: H = −(Br' + μ0·Pc·Ha)/(μ0·(μrec + Pc)).
     */
    public OperatingPoint onRecoilLine(double recoilRemanence, double recoilPermeability) {
        double h = -(recoilRemanence + MU0 * pc * opposingField) / (MU0 * (recoilPermeability + pc));
        double b = fluxDensityAt(h);
        return new OperatingPoint(h, b, b - MU0 * h);
    }
}
