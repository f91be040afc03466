package org.kneepoint.fitter.temperature;

import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import java.util.OptionalDouble;
import java.util.function.DoubleUnaryOperator;
import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.kneepoint.fitter.curve.Characterization;
import org.kneepoint.fitter.error.NumericalFailureException;
import org.kneepoint.fitter.loadline.IntrinsicCurve;

/**
 * The intrinsic curve at one temperature from {@link CurveAtTemperature}:
 * J(H) = Br(T)·Σ w_k·J_k(H·HcJ_k/HcJ(T))/Br_k over one or two measured curves k with weights w_k
 * (1 at a measured temperature or beyond the range), plus what it had to assume: whether the
 * temperature lies outside the measured ones, and whether a field lies below a measured range.
 */
public final class TemperatureCurve implements IntrinsicCurve {

    private static final double ROOT_ACCURACY = 1e-12;

    private final double temperature;
    private final double br;
    private final double hcj;
    private final MeasuredComponent[] components;
    private final double[] weights;
    private final boolean extrapolated;

    TemperatureCurve(double temperature, double br, double hcj, MeasuredComponent[] components, double[] weights, boolean extrapolated) {
        this.temperature = temperature;
        this.br = br;
        this.hcj = hcj;
        this.components = components.clone();
        this.weights = weights.clone();
        this.extrapolated = extrapolated;
    }

    /** Temperature, K. */
    public double temperature() {
        return temperature;
    }

    /** HcJ(T), A/m: where J reaches 0. */
    public double intrinsicCoercivity() {
        return hcj;
    }

    /** True when the temperature lies outside the measured ones (the nearest curve scaled by the temperature law). */
    public boolean extrapolated() {
        return extrapolated;
    }

    /** True when J at {@code h} needs a curve below the lowest H it was measured to (its fitted knee model used there). */
    @Override
    public boolean beyondMeasuredField(double h) {
        for (int k = 0; k < components.length; k++) {
            if (weights[k] > 0 && components[k].beyondMeasured(h * components[k].hcj() / hcj)) {
                return true;
            }
        }
        return false;
    }

    @Override
    public double remanence() {
        return br;
    }

    /** μrec from the measured curves' slopes near H = 0, scaled like J and H. */
    @Override
    public double recoilPermeability() {
        double slope = 0;
        for (int k = 0; k < components.length; k++) {
            slope += weights[k] * components[k].recoilSlope() * components[k].hcj() / components[k].br();
        }
        return Math.max(1.0, 1.0 + slope * br / hcj / MU0);
    }

    @Override
    public double j(double h) {
        double sum = 0;
        for (int k = 0; k < components.length; k++) {
            if (weights[k] > 0) {
                MeasuredComponent c = components[k];
                sum += weights[k] * c.j(h * c.hcj() / hcj) / c.br();
            }
        }
        return br * sum;
    }

    @Override
    public OptionalDouble kneeField() {
        double level = Characterization.KNEE_FRACTION * br;
        return OptionalDouble.of(root(h -> j(h) - level, -hcj, 0.0));
    }

    @Override
    public double operatingField(double pc, double opposingField) {
        DoubleUnaryOperator balance = h -> j(h) + MU0 * (pc + 1.0) * h + MU0 * pc * opposingField;
        double low = -hcj;
        for (int i = 0; i < 60 && balance.applyAsDouble(low) > 0; i++) {
            low *= 2;
        }
        return root(balance, low, 0.0);
    }

    private double root(DoubleUnaryOperator function, double low, double high) {
        double atLow = function.applyAsDouble(low);
        double atHigh = function.applyAsDouble(high);
        if (atLow > 0 || atHigh < 0) {
            throw new NumericalFailureException(String.format(java.util.Locale.ROOT,
                    "the curve at %.2f K has no crossing between %.6g and %.6g A/m", temperature, low, high));
        }
        if (atLow == 0) {
            return low;
        }
        return new BracketingNthOrderBrentSolver(0.0, ROOT_ACCURACY * hcj, 0.0, 5).solve(500, function::applyAsDouble, low, high);
    }
}
