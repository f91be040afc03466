package org.kneepoint.fitter.model.ja;

import org.kneepoint.fitter.error.BadInputException;

/**
 * How hard a Jiles–Atherton fit tries. The seed makes the global stage deterministic.
 *
 * @param seed              seed of the CMA-ES random generator
 * @param globalEvaluations evaluation budget of the global stage, 0 to skip it
 * @param localIterations   iteration limit of the Levenberg–Marquardt stage, ≥ 1
 */
public record JilesAthertonFitSettings(long seed, int globalEvaluations, int localIterations) {

    public JilesAthertonFitSettings {
        if (globalEvaluations < 0 || globalEvaluations > 1_000_000) {
            throw new BadInputException("global evaluations = " + globalEvaluations + "; expected 0 to 1000000");
        }
        if (localIterations < 1 || localIterations > 10_000) {
            throw new BadInputException("local iterations = " + localIterations + "; expected 1 to 10000");
        }
    }

    /** Seed 1992, 1,000 global evaluations, 100 local iterations. */
    public static JilesAthertonFitSettings defaults() {
        return new JilesAthertonFitSettings(1992L, 1000, 100);
    }

    public JilesAthertonFitSettings withGlobalEvaluations(int evaluations) {
        return new JilesAthertonFitSettings(seed, evaluations, localIterations);
    }

    public JilesAthertonFitSettings withSeed(long newSeed) {
        return new JilesAthertonFitSettings(newSeed, globalEvaluations, localIterations);
    }
}
