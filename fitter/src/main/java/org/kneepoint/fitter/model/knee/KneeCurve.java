package org.kneepoint.fitter.model.knee;

import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import java.util.OptionalDouble;
import java.util.function.DoubleUnaryOperator;
import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.kneepoint.fitter.curve.Characterization;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.NumericalFailureException;
import org.kneepoint.fitter.loadline.IntrinsicCurve;

/**
 * The parametric knee model fitted to measured curves: a recoil line times the share of it that is
 * left, J(H) = (Br + μ0·(μline − 1)·H)·f(−H/HcJ), with the knee's shape f from {@link KneeShape}
 * (f = 1 above the knee, f(1) = 0 so that J(−HcJ) = 0 exactly). The recoil permeability it reports is
 * its own slope at H = 0, the same quantity the characterization measures on data; for a square
 * curve it equals μline.
 *
 * @param remanence           Br, T
 * @param linePermeability    μline, relative permeability of the recoil line, 1 to {@value #MAX_LINE_PERMEABILITY}
 * @param intrinsicCoercivity HcJ, A/m
 * @param shape               the knee's shape
 */
public record KneeCurve(double remanence, double linePermeability, double intrinsicCoercivity, KneeShape shape)
        implements IntrinsicCurve {

    /** Upper bound of μline: cast AlNiCo's curves start steeper than any sintered or ceramic grade's. */
    static final double MAX_LINE_PERMEABILITY = 10.0;
    private static final double ROOT_ACCURACY = 1e-12;

    public KneeCurve {
        if (!(remanence > 0 && Double.isFinite(remanence)) || !(intrinsicCoercivity > 0 && Double.isFinite(intrinsicCoercivity))) {
            throw new BadInputException("a knee model needs positive finite Br and HcJ, got Br = " + remanence + " T, HcJ = "
                    + intrinsicCoercivity + " A/m");
        }
        if (!(linePermeability >= 1.0 && linePermeability <= MAX_LINE_PERMEABILITY)) {
            throw new BadInputException("the knee model's recoil line needs a permeability between 1 and "
                    + MAX_LINE_PERMEABILITY + ", got " + linePermeability);
        }
        if (shape == null) {
            throw new BadInputException("a knee model needs a knee shape, got null");
        }
    }

    @Override
    public double j(double h) {
        double t = -h / intrinsicCoercivity;
        double line = remanence + MU0 * (linePermeability - 1.0) * h;
        return line * shape.fraction(t, t > 0 ? Math.log(t) : Double.NaN);
    }

    /** The model's slope at H = 0 as a relative recoil permeability (a one-sided difference over 10⁻⁴·HcJ). */
    @Override
    public double recoilPermeability() {
        double step = 1e-4 * intrinsicCoercivity;
        return Math.max(1.0, 1.0 + (j(0.0) - j(-step)) / step / MU0);
    }

    /** The width of the knee, HcJ − Hk, A/m. */
    public double kneeWidth() {
        return intrinsicCoercivity + kneeField().orElseThrow();
    }

    @Override
    public OptionalDouble kneeField() {
        double level = Characterization.KNEE_FRACTION * remanence;
        return OptionalDouble.of(root(h -> j(h) - level, -intrinsicCoercivity, 0.0));
    }

    @Override
    public double operatingField(double pc, double opposingField) {
        DoubleUnaryOperator balance = h -> j(h) + MU0 * (pc + 1.0) * h + MU0 * pc * opposingField;
        double low = -intrinsicCoercivity;
        for (int i = 0; i < 60 && balance.applyAsDouble(low) > 0; i++) {
            low *= 2;
        }
        return root(balance, low, 0.0);
    }

    private double root(DoubleUnaryOperator function, double low, double high) {
        if (function.applyAsDouble(low) > 0 || function.applyAsDouble(high) < 0) {
            throw new NumericalFailureException(String.format(java.util.Locale.ROOT,
                    "the knee model (Br %.6g T, HcJ %.6g A/m) has no crossing between %.6g and %.6g A/m", remanence,
                    intrinsicCoercivity, low, high));
        }
        BracketingNthOrderBrentSolver solver = new BracketingNthOrderBrentSolver(0.0, ROOT_ACCURACY * intrinsicCoercivity, 0.0, 5);
        return solver.solve(200, function::applyAsDouble, low, high);
    }
}
