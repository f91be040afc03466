package org.kneepoint.fitter.loadline;

import java.util.function.DoubleUnaryOperator;
import org.kneepoint.fitter.error.NumericalFailureException;

/**
 * The root of a non-decreasing function on a bracket [low, high] with f(low) ≤ 0 ≤ f(high), by the
 * Illinois variant of regula falsi (Dowell and Jarratt, BIT 11, 168, 1971), which keeps the bracket
 * and converges superlinearly; bisection takes over if a step stalls.
 */
final class MonotoneRoot {

    private static final int MAX_ITERATIONS = 200;

    private MonotoneRoot() {
    }

    static double solve(DoubleUnaryOperator function, double low, double high, double relativeTolerance) {
        double fLow = function.applyAsDouble(low);
        double fHigh = function.applyAsDouble(high);
        if (fLow > 0.0 || fHigh < 0.0) {
            throw new NumericalFailureException("no sign change between " + low + " and " + high);
        }
        int side = 0;
        for (int iteration = 0; iteration < MAX_ITERATIONS; iteration++) {
            double width = high - low;
            if (width <= relativeTolerance * Math.max(Math.abs(low), Math.abs(high)) || fLow == 0.0 || fHigh == 0.0) {
                break;
            }
            double next = fHigh == fLow ? 0.5 * (low + high) : low - fLow * width / (fHigh - fLow);
            if (!(next > low && next < high)) {
                next = 0.5 * (low + high);
            }
            double value = function.applyAsDouble(next);
            if (value <= 0.0) {
                low = next;
                fLow = value;
                fHigh = side == -1 ? 0.5 * fHigh : fHigh;
                side = -1;
            } else {
                high = next;
                fHigh = value;
                fLow = side == 1 ? 0.5 * fLow : fLow;
                side = 1;
            }
        }
        return fLow == 0.0 ? low : fHigh == 0.0 ? high : 0.5 * (low + high);
    }
}
