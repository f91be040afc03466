package org.kneepoint.fitter.loadline;

import java.util.function.DoubleUnaryOperator;
import org.hipparchus.analysis.solvers.BrentSolver;
import org.kneepoint.fitter.error.NumericalFailureException;

/**
 * The root of a non-decreasing function on a bracket [low, high] with f(low) ≤ 0 ≤ f(high), by
 * Brent's method (R. P. Brent, Algorithms for Minimization without Derivatives, Prentice-Hall, 1973,
 * ch. 4; Hipparchus 4.0.1 {@link BrentSolver}), the one bracketing root finder the physics uses.
 */
final class MonotoneRoot {

    private static final int MAX_EVALUATIONS = 200;

    private MonotoneRoot() {
    }

    static double solve(DoubleUnaryOperator function, double low, double high, double relativeTolerance) {
        double fLow = function.applyAsDouble(low);
        double fHigh = function.applyAsDouble(high);
        if (fLow > 0.0 || fHigh < 0.0) {
            throw new NumericalFailureException("no sign change between " + low + " and " + high);
        }
        if (fLow == 0.0) {
            return low;
        }
        if (fHigh == 0.0) {
            return high;
        }
        double absolute = 0.5 * relativeTolerance * Math.max(Math.abs(low), Math.abs(high));
        return new BrentSolver(relativeTolerance, absolute).solve(MAX_EVALUATIONS, function::applyAsDouble, low, high);
    }
}
