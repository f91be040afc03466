package org.kneepoint.fitter.loadline;

import java.util.Arrays;
import org.hipparchus.analysis.solvers.BrentSolver;
import org.hipparchus.exception.MathRuntimeException;
import org.kneepoint.fitter.error.NumericalFailureException;

/**
 * The working-temperature range of a magnet on a load line for a loss limit (docs/design.md §4): the temperatures
 * whose irreversible loss ({@link IrreversibleLoss}, continuous in T) stays within the limit. The loss is
 * tabulated at {@value #STEPS} + 1 equal steps over the model's range and at the check temperature; the run of
 * acceptable temperatures holding the check temperature (else the run nearest to it) is taken, and each end
 * that lies inside the range is the root of loss(T) − limit in its bracketing step, found by Brent's method
 * (Hipparchus {@link BrentSolver}; R. P. Brent, "Algorithms for Minimization without Derivatives", 1973, ch. 4)
 * to {@value #ABSOLUTE_ACCURACY} K. An end at the model's edge says so; no acceptable temperature gives none.
 * A run of acceptable temperatures narrower than one step, away from the check temperature, can be missed.
 */
public final class WorkingTemperatures {

    static final int STEPS = 64;
    static final double ABSOLUTE_ACCURACY = 1e-7;
    private static final int MAX_EVALUATIONS = 200;

    private WorkingTemperatures() {
    }

    /** The range for {@code lossLimit} (a fraction) on {@code line}, around {@code temperature} (K). */
    public static WorkingRange of(TemperatureModel model, LoadLine line, double temperature, double lossLimit) {
        double[] nodes = nodes(model, temperature);
        boolean[] within = new boolean[nodes.length];
        int check = Arrays.binarySearch(nodes, temperature);
        for (int k = 0; k < nodes.length; k++) {
            within[k] = excess(model, line, nodes[k], lossLimit) <= 0.0;
        }
        int seed = nearestWithin(within, check);
        if (seed < 0) {
            return new WorkingRange(WorkingLimit.NONE, WorkingLimit.NONE);
        }
        int first = seed;
        while (first > 0 && within[first - 1]) {
            first--;
        }
        int last = seed;
        while (last < nodes.length - 1 && within[last + 1]) {
            last++;
        }
        WorkingLimit minimum = first == 0 ? limit(model, nodes[0], LimitReason.MODEL_RANGE_EDGE)
                : limit(model, root(model, line, lossLimit, nodes[first - 1], nodes[first]), LimitReason.LIMIT_REACHED);
        WorkingLimit maximum = last == nodes.length - 1 ? limit(model, nodes[last], LimitReason.MODEL_RANGE_EDGE)
                : limit(model, root(model, line, lossLimit, nodes[last], nodes[last + 1]), LimitReason.LIMIT_REACHED);
        return new WorkingRange(minimum, maximum);
    }

    private static WorkingLimit limit(TemperatureModel model, double temperature, LimitReason reason) {
        return new WorkingLimit(temperature, reason, model.isExtrapolated(temperature));
    }

    /** The grid over the model's range with the check temperature among its nodes, ascending and distinct. */
    private static double[] nodes(TemperatureModel model, double temperature) {
        double low = model.lowestTemperature();
        double high = model.highestTemperature();
        double[] nodes = new double[STEPS + 2];
        for (int k = 0; k <= STEPS; k++) {
            nodes[k] = k == STEPS ? high : low + k * (high - low) / STEPS;
        }
        nodes[STEPS + 1] = temperature;
        Arrays.sort(nodes);
        int distinct = 1;
        for (int k = 1; k < nodes.length; k++) {
            if (Double.doubleToLongBits(nodes[k]) != Double.doubleToLongBits(nodes[distinct - 1])) {
                nodes[distinct++] = nodes[k];
            }
        }
        return Arrays.copyOf(nodes, distinct);
    }

    private static int nearestWithin(boolean[] within, int check) {
        for (int distance = 0; distance < within.length; distance++) {
            if (check - distance >= 0 && within[check - distance]) {
                return check - distance;
            }
            if (check + distance < within.length && within[check + distance]) {
                return check + distance;
            }
        }
        return -1;
    }

    private static double excess(TemperatureModel model, LoadLine line, double temperature, double lossLimit) {
        return DesignCheck.lossAt(model, line, temperature) - lossLimit;
    }

    private static double root(TemperatureModel model, LoadLine line, double lossLimit, double from, double to) {
        try {
            return new BrentSolver(ABSOLUTE_ACCURACY).solve(MAX_EVALUATIONS, t -> excess(model, line, t, lossLimit), from, to);
        } catch (MathRuntimeException e) {
            throw new NumericalFailureException("the temperature where the loss reaches the limit was not found between "
                    + from + " K and " + to + " K: " + e.getMessage());
        }
    }
}
