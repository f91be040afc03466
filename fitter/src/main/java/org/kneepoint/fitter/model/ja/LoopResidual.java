package org.kneepoint.fitter.model.ja;

/**
 * Residuals B_model − B_measured (tesla) of a parameter vector in fit coordinates, evaluated with
 * {@link FixedStepLoopEvaluator}. Counts evaluations and remembers the best vector seen, so a
 * stage stopped by its budget still hands on its best point. One instance per fit; not shared
 * between threads.
 */
final class LoopResidual {

    /** B, tesla, put in place of a non-finite model value, so such parameters score as a very poor fit. */
    private static final double OUT_OF_RANGE = 1e3;

    private final FixedStepLoopEvaluator evaluator;
    private final double[] measured;
    private int evaluations;
    private double[] best;
    private double bestSumOfSquares = Double.POSITIVE_INFINITY;

    /** Residuals at the evaluator's default (fine) step. */
    LoopResidual(MeasuredLoop loop) {
        this(new FixedStepLoopEvaluator(loop), loop);
    }

    /** Residuals at a step of 1/{@code stepsPerLargestField} of the largest |H|. */
    LoopResidual(MeasuredLoop loop, int stepsPerLargestField) {
        this(new FixedStepLoopEvaluator(loop, stepsPerLargestField), loop);
    }

    private LoopResidual(FixedStepLoopEvaluator evaluator, MeasuredLoop loop) {
        this.evaluator = evaluator;
        this.measured = loop.fluxDensity();
    }

    int size() {
        return measured.length;
    }

    int evaluations() {
        return evaluations;
    }

    double[] best() {
        return best.clone();
    }

    double bestSumOfSquares() {
        return bestSumOfSquares;
    }

    /** Modelled B at each point, tesla; remembers q when it is the best seen. */
    double[] modelled(double[] q) {
        evaluations++;
        double[] b = evaluator.fluxDensity(new JilesAthertonModel(FitParameterization.toParameters(q)));
        double sum = 0;
        for (int i = 0; i < b.length; i++) {
            if (!Double.isFinite(b[i])) {
                b[i] = OUT_OF_RANGE;
            }
            double r = b[i] - measured[i];
            sum += r * r;
        }
        if (sum < bestSumOfSquares) {
            bestSumOfSquares = sum;
            best = q.clone();
        }
        return b;
    }

    /** B_model − B_measured at each point, tesla. */
    double[] residuals(double[] q) {
        double[] r = modelled(q);
        for (int i = 0; i < r.length; i++) {
            r[i] -= measured[i];
        }
        return r;
    }

    double sumOfSquares(double[] q) {
        double sum = 0;
        for (double value : residuals(q)) {
            sum += value * value;
        }
        return Double.isFinite(sum) ? sum : Double.MAX_VALUE;
    }

    double[] measured() {
        return measured.clone();
    }
}
