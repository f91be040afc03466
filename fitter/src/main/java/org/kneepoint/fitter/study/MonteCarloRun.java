package org.kneepoint.fitter.study;

import java.util.List;
import java.util.SplittableRandom;
import java.util.stream.IntStream;

/**
 * A Monte Carlo run: {@code samples} sets of input values drawn from their bands (each sample draws every input in
 * order from one {@link SplittableRandom} seeded with {@code seed}, so a seed repeats a run exactly), and the model's
 * outputs for each. Held by column: {@code inputs[i][n]} is input i of sample n, {@code outputs[o][n]} output o.
 */
public record MonteCarloRun(double[][] inputs, double[][] outputs) {

    /**
     * Draws the run's inputs (in order, from one generator) and then evaluates the samples, in parallel: each
     * sample's outputs depend only on its own inputs, so the run is the same on any number of cores. {@code model}
     * must therefore be safe to call from several threads (immutable).
     */
    public static MonteCarloRun of(List<StudyInput> studyInputs, SampleModel model, BandDistribution distribution,
            int samples, long seed) {
        if (samples < 2) {
            throw new IllegalArgumentException("a study needs at least 2 samples, got " + samples);
        }
        SplittableRandom random = new SplittableRandom(seed);
        int count = studyInputs.size();
        double[][] rows = new double[samples][count];
        double[][] inputs = new double[count][samples];
        for (int n = 0; n < samples; n++) {
            for (int i = 0; i < count; i++) {
                rows[n][i] = studyInputs.get(i).value(distribution.draw(random));
                inputs[i][n] = rows[n][i];
            }
        }
        double[][] results = new double[samples][];
        IntStream.range(0, samples).parallel().forEach(n -> results[n] = model.outputs(rows[n]));
        double[][] outputs = new double[results[0].length][samples];
        for (int n = 0; n < samples; n++) {
            for (int o = 0; o < outputs.length; o++) {
                outputs[o][n] = results[n][o];
            }
        }
        return new MonteCarloRun(inputs, outputs);
    }

    /** The share of samples whose output {@code index} exceeds {@code limit}. */
    public double shareAbove(int index, double limit) {
        double[] values = outputs[index];
        long above = java.util.Arrays.stream(values).filter(v -> v > limit).count();
        return (double) above / values.length;
    }
}
