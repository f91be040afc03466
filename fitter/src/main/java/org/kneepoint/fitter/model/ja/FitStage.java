package org.kneepoint.fitter.model.ja;

/** The stages of a Jiles–Atherton identification, in order. */
public enum FitStage {
    /** Starting values from the loop's Hc, Mr, tip and slopes. */
    STARTING_VALUES,
    /** CMA-ES over bounded, log- and logit-scaled parameters. */
    GLOBAL_SEARCH,
    /** Levenberg–Marquardt least squares in B. */
    LOCAL_LEAST_SQUARES,
    /** Standard errors and correlations at the optimum. */
    UNCERTAINTY,
    /** Finished. */
    DONE
}
