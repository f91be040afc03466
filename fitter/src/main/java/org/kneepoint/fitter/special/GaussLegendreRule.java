package org.kneepoint.fitter.special;

import java.util.function.DoubleUnaryOperator;

/**
 * An n-point Gauss–Legendre rule on [−1, 1], nodes found by Newton's method on the Legendre
 * polynomial P_n (three-term recurrence, NIST DLMF 18.9.1) and weights 2/[(1 − x²)·P_n'(x)²]
 * (DLMF 3.5.19). Exact for polynomials of degree 2n − 1; used for smooth one-dimensional
 * integrals inside the shape formulas.
 */
public final class GaussLegendreRule {

    private final double[] nodes;
    private final double[] weights;

    /** Builds the rule with {@code size} points, 1 ≤ size ≤ 200. */
    public GaussLegendreRule(int size) {
        if (size < 1 || size > 200) {
            throw new IllegalArgumentException("Gauss–Legendre rule needs 1 to 200 points, got " + size);
        }
        nodes = new double[size];
        weights = new double[size];
        for (int i = 0; i < size; i++) {
            double x = Math.cos(Math.PI * (i + 0.75) / (size + 0.5));
            double derivative;
            double step;
            do {
                double previous = 1.0;
                double current = x;
                for (int order = 2; order <= size; order++) {
                    double next = ((2 * order - 1) * x * current - (order - 1) * previous) / order;
                    previous = current;
                    current = next;
                }
                derivative = size * (x * current - previous) / (x * x - 1.0);
                step = current / derivative;
                x -= step;
            } while (Math.abs(step) > 1e-15);
            nodes[i] = x;
            weights[i] = 2.0 / ((1.0 - x * x) * derivative * derivative);
        }
    }

    /** Number of points. */
    public int size() {
        return nodes.length;
    }

    /** The i-th node on [−1, 1]. */
    public double node(int i) {
        return nodes[i];
    }

    /** The i-th weight on [−1, 1]. */
    public double weight(int i) {
        return weights[i];
    }

    /** ∫ f over [lower, upper] by this rule. */
    public double integrate(DoubleUnaryOperator function, double lower, double upper) {
        double half = 0.5 * (upper - lower);
        double middle = 0.5 * (upper + lower);
        double sum = 0.0;
        for (int i = 0; i < nodes.length; i++) {
            sum += weights[i] * function.applyAsDouble(middle + half * nodes[i]);
        }
        return half * sum;
    }
}
