package org.kneepoint.fitter.loadline;

import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import java.util.OptionalDouble;
import org.kneepoint.fitter.curve.Characterization;
import org.kneepoint.fitter.curve.CurveCharacterizer;
import org.kneepoint.fitter.curve.DemagnetizationBranch;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.error.BadInputException;

/**
 * A stored demagnetization curve seen as an {@link IntrinsicCurve}: J(H) from the curve's monotone
 * interpolant ({@link DemagnetizationBranch}), μrec from its characterization. It never extrapolates:
 * a load line that meets the curve below the lowest measured H is refused.
 */
public final class MeasuredIntrinsicCurve implements IntrinsicCurve {

    private static final double RELATIVE_TOLERANCE = 1e-12;

    private final DemagnetizationBranch branch;
    private final double recoilPermeability;

    private MeasuredIntrinsicCurve(DemagnetizationBranch branch, double recoilPermeability) {
        if (!(branch.highestH() >= 0.0 && branch.lowestH() < 0.0)) {
            throw new BadInputException("a stored curve must cover H = 0 and negative H to give operating points, got H from "
                    + branch.lowestH() + " to " + branch.highestH() + " A/m");
        }
        this.branch = branch;
        this.recoilPermeability = recoilPermeability;
    }

    /** The curve's branch with the recoil permeability of its characterization. */
    public static MeasuredIntrinsicCurve of(DemagnetizationCurve curve) {
        return new MeasuredIntrinsicCurve(DemagnetizationBranch.of(curve), CurveCharacterizer.characterize(curve).muRec());
    }

    @Override
    public double remanence() {
        return branch.j(0.0);
    }

    @Override
    public double recoilPermeability() {
        return recoilPermeability;
    }

    @Override
    public double j(double h) {
        if (h < branch.lowestH() || h > branch.highestH()) {
            throw new BadInputException("H = " + h + " A/m lies outside the measured range " + branch.lowestH() + " to "
                    + branch.highestH() + " A/m");
        }
        return branch.j(h);
    }

    @Override
    public OptionalDouble kneeField() {
        return branch.fieldAtJ(Characterization.KNEE_FRACTION * remanence());
    }

    @Override
    public double operatingField(double pc, double opposingField) {
        double low = branch.lowestH();
        if (branch.j(low) + MU0 * (pc + 1.0) * low + MU0 * pc * opposingField > 0.0) {
            throw new BadInputException(String.format("the load line (Pc = %.6g, Ha = %.6g A/m) meets the curve below its"
                    + " lowest measured H = %.6g A/m", pc, opposingField, low));
        }
        return MonotoneRoot.solve(h -> branch.j(h) + MU0 * (pc + 1.0) * h + MU0 * pc * opposingField, low, 0.0,
                RELATIVE_TOLERANCE);
    }
}
