package org.kneepoint.fitter.model.ja;

import java.util.Arrays;
import org.kneepoint.fitter.units.MagneticConstant;

/**
 * Fast evaluation of a model along a {@link MeasuredLoop}'s history for fitting: one classical
 * RK4 step per measured interval (restarting at each point, so at every reversal). The legs
 * before the compared pass (demagnetized → prior fields → first H, and the jumps back to the
 * first H between settling passes) are cut into steps no longer than the median measured step,
 * or than 1/{@value #LEAD_IN_STEPS} of the largest |H| where the data are denser. The path is laid out once; each evaluation allocates nothing but its result.
 */
public final class FixedStepLoopEvaluator {

    /** Steps per largest |H| on the legs before the compared pass, at the finest. */
    private static final int LEAD_IN_STEPS = 400;

    private final double[] path;
    private final int firstCompared;
    private final int points;

    public FixedStepLoopEvaluator(MeasuredLoop loop) {
        double[] h = loop.field();
        double largest = 0;
        for (double value : h) {
            largest = Math.max(largest, Math.abs(value));
        }
        for (double value : loop.priorField()) {
            largest = Math.max(largest, Math.abs(value));
        }
        double maximumStep = Math.max(medianStep(h), largest / LEAD_IN_STEPS);
        PathBuilder builder = new PathBuilder(maximumStep);
        builder.add(0);
        for (double prior : loop.priorField()) {
            builder.moveTo(prior);
        }
        for (int pass = 0; pass < loop.settlingPasses(); pass++) {
            builder.moveTo(h[0]);
            builder.addAll(h);
        }
        builder.moveTo(h[0]);
        this.firstCompared = builder.size() - 1;
        builder.addAll(h);
        this.path = builder.toArray();
        this.points = h.length;
    }

    /** Number of measured points. */
    public int size() {
        return points;
    }

    /** M at each measured point, A/m, written into {@code out} (length {@link #size()}). */
    public void magnetization(JilesAthertonModel model, double[] out) {
        double m = 0;
        int last = path.length - 1;
        for (int i = 0; i < last; i++) {
            if (i >= firstCompared) {
                out[i - firstCompared] = m;
            }
            double step = path[i + 1] - path[i];
            if (step != 0) {
                m = FixedStepBranchSolver.rungeKuttaStep(model, path[i], m, step, step > 0 ? 1 : -1);
            }
        }
        out[last - firstCompared] = m;
    }

    /** B = μ0·(H + M) at each measured point, tesla. */
    public double[] fluxDensity(JilesAthertonModel model) {
        double[] b = new double[points];
        magnetization(model, b);
        for (int i = 0; i < points; i++) {
            b[i] = MagneticConstant.MU0 * (path[firstCompared + i] + b[i]);
        }
        return b;
    }

    private static double medianStep(double[] h) {
        double[] steps = new double[h.length - 1];
        int n = 0;
        for (int i = 1; i < h.length; i++) {
            double step = Math.abs(h[i] - h[i - 1]);
            if (step > 0) {
                steps[n++] = step;
            }
        }
        double[] nonzero = Arrays.copyOf(steps, n);
        Arrays.sort(nonzero);
        return nonzero[n / 2];
    }

    /** Grows the path, cutting long legs into equal steps no longer than the given maximum. */
    private static final class PathBuilder {
        private final double maximumStep;
        private double[] nodes = new double[256];
        private int size;

        PathBuilder(double maximumStep) {
            this.maximumStep = maximumStep;
        }

        void add(double h) {
            if (size == nodes.length) {
                nodes = Arrays.copyOf(nodes, 2 * size);
            }
            nodes[size++] = h;
        }

        void addAll(double[] values) {
            for (int i = 1; i < values.length; i++) {
                add(values[i]);
            }
        }

        void moveTo(double target) {
            double from = nodes[size - 1];
            int steps = (int) Math.ceil(Math.abs(target - from) / maximumStep);
            for (int i = 1; i <= steps; i++) {
                add(i == steps ? target : from + (target - from) * i / steps);
            }
        }

        int size() {
            return size;
        }

        double[] toArray() {
            return Arrays.copyOf(nodes, size);
        }
    }
}
