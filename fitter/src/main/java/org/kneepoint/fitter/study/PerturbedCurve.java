package org.kneepoint.fitter.study;

import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import java.util.OptionalDouble;
import java.util.function.DoubleUnaryOperator;
import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.kneepoint.fitter.curve.Characterization;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.NumericalFailureException;
import org.kneepoint.fitter.loadline.IntrinsicCurve;

/**
 * A grade's curve with its tolerances applied (a construction of our own, docs/design.md §4):
 * J'(H) = s_B·J(u(H/s_H)) + μ0·Δμ·H, where s_B scales Br (and all of J), s_H scales the field of the whole curve
 * (HcJ and the knee together) and Δμ is added to μrec. The warp u moves the knee field Hk alone by s_K with HcJ held:
 * it is piecewise linear through (0, 0), (−s_K·Hk, −Hk) and (−HcJ, −HcJ) and the identity beyond HcJ, so the straight
 * part's slope changes by 1/s_K too (a small change of μrec − 1). With s_K = 1 the warp is the identity.
 */
final class PerturbedCurve implements IntrinsicCurve {

    private static final double ROOT_ACCURACY = 1e-10;
    private static final double RELATIVE_ACCURACY = 1e-13;
    private static final double FUNCTION_ACCURACY = 1e-15;
    private static final int MAX_EVALUATIONS = 200;

    private final IntrinsicCurve base;
    private final CurveScaling scaling;
    private final double kneeField;
    private final double coercivity;

    PerturbedCurve(IntrinsicCurve base, CurveScaling scaling) {
        this.base = base;
        this.scaling = scaling;
        if (scaling.knee() != 1.0) {
            this.kneeField = -base.kneeField().orElseThrow(() -> new BadInputException(
                    "a knee tolerance needs a curve with a knee (J = 0.9·Br), and this one never falls that far"));
            this.coercivity = IntrinsicCoercivity.of(base);
            if (!(scaling.knee() * kneeField < coercivity)) {
                throw new BadInputException(String.format(java.util.Locale.ROOT,
                        "the knee band moves the knee field to %.4g A/m, beyond HcJ = %.4g A/m", scaling.knee() * kneeField,
                        coercivity));
            }
        } else {
            this.kneeField = Double.NaN;
            this.coercivity = Double.NaN;
        }
        if (!(recoilPermeability() >= 1.0)) {
            throw new BadInputException("the tolerances make the recoil permeability " + recoilPermeability() + ", below 1");
        }
    }

    @Override
    public double remanence() {
        return scaling.remanence() * base.remanence();
    }

    @Override
    public double recoilPermeability() {
        return 1.0 + (base.recoilPermeability() - 1.0) * scaling.remanence() / (scaling.coercivity() * scaling.knee())
                + scaling.recoilPermeability();
    }

    @Override
    public double j(double h) {
        return scaling.remanence() * base.j(warp(h / scaling.coercivity())) + MU0 * scaling.recoilPermeability() * h;
    }

    @Override
    public OptionalDouble kneeField() {
        double level = Characterization.KNEE_FRACTION * remanence();
        double low = -scaling.coercivity();
        for (int i = 0; i < 80 && j(low) > level; i++) {
            low *= 2.0;
        }
        return j(low) > level ? OptionalDouble.empty() : OptionalDouble.of(root(h -> j(h) - level, low, 0.0));
    }

    /**
     * H of the operating point. Without a knee warp the balance s_B·J(x) + μ0·(Pc + 1 + Δμ)·s_H·x + μ0·Pc·Ha = 0 in
     * x = H/s_H is the base curve's own balance for Pc' + 1 = (Pc + 1 + Δμ)·s_H/s_B and Pc'·Ha' = Pc·Ha/s_B, so the
     * base curve's solver answers it; otherwise (or for Pc' ≤ 0) a bracketing search on the perturbed curve does.
     */
    @Override
    public double operatingField(double pc, double opposingField) {
        double shiftedPc = (pc + 1.0 + scaling.recoilPermeability()) * scaling.coercivity() / scaling.remanence() - 1.0;
        if (scaling.knee() == 1.0 && shiftedPc > 0.0) {
            return scaling.coercivity()
                    * base.operatingField(shiftedPc, pc * opposingField / (scaling.remanence() * shiftedPc));
        }
        DoubleUnaryOperator balance = h -> j(h) + MU0 * (pc + 1.0) * h + MU0 * pc * opposingField;
        double low = -(remanence() + MU0 * pc * opposingField) / (MU0 * (pc + 1.0));
        for (int i = 0; i < 60 && balance.applyAsDouble(low) > 0; i++) {
            low *= 2.0;
        }
        return root(balance, low, 0.0);
    }

    /** Whether the base curve's field behind {@code h} lies beyond its measured range. */
    @Override
    public boolean beyondMeasuredField(double h) {
        return base.beyondMeasuredField(warp(h / scaling.coercivity()));
    }

    /** The base curve's field for the field {@code x} of the knee-warped curve (already divided by s_H). */
    private double warp(double x) {
        double k = scaling.knee();
        if (k == 1.0 || x < -coercivity) {
            return x;
        }
        if (x >= -k * kneeField) {
            return x / k;
        }
        return -kneeField + (x + k * kneeField) * (coercivity - kneeField) / (coercivity - k * kneeField);
    }

    /**
     * The root of the non-decreasing {@code function} in [low, high], the bracket first halved towards 0 while it
     * still holds the root, so that a steep knee far below the root (J → −∞ beyond it) never enters the solver.
     */
    private static double root(DoubleUnaryOperator function, double low, double high) {
        for (int i = 0; i < 200 && high == 0.0 && function.applyAsDouble(0.5 * low) <= 0.0; i++) {
            low *= 0.5;
        }
        if (function.applyAsDouble(low) > 0 || function.applyAsDouble(high) < 0) {
            throw new NumericalFailureException("the perturbed curve has no crossing between " + low + " and " + high + " A/m");
        }
        double accuracy = ROOT_ACCURACY * Math.max(Math.abs(low), 1.0);
        return new BracketingNthOrderBrentSolver(RELATIVE_ACCURACY, accuracy, FUNCTION_ACCURACY, 5)
                .solve(MAX_EVALUATIONS, function::applyAsDouble, low, high);
    }
}
