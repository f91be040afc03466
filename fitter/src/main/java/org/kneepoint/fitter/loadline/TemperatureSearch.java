package org.kneepoint.fitter.loadline;

import java.util.function.DoublePredicate;

/**
 * The first temperature between {@code from} and {@code to} (either direction) at which a condition
 * turns true: a scan in {@value #STEPS} equal steps finds the first step where it holds, bisection
 * then narrows it to {@value #TOLERANCE} K. The condition is assumed false at {@code from}.
 */
final class TemperatureSearch {

    static final int STEPS = 32;
    static final double TOLERANCE = 1e-4;

    private TemperatureSearch() {
    }

    /** The crossing temperature, or NaN if the condition never holds up to {@code to}. */
    static double firstCrossing(DoublePredicate condition, double from, double to) {
        double step = (to - from) / STEPS;
        double before = from;
        for (int k = 1; k <= STEPS; k++) {
            double after = k == STEPS ? to : from + k * step;
            if (condition.test(after)) {
                return bisect(condition, before, after);
            }
            before = after;
        }
        return Double.NaN;
    }

    private static double bisect(DoublePredicate condition, double falseAt, double trueAt) {
        while (Math.abs(trueAt - falseAt) > TOLERANCE) {
            double middle = 0.5 * (falseAt + trueAt);
            if (condition.test(middle)) {
                trueAt = middle;
            } else {
                falseAt = middle;
            }
        }
        return 0.5 * (falseAt + trueAt);
    }
}
