package org.kneepoint.fitter.model.ja;

/**
 * Receives progress of a fit: the overall fraction done, 0 to 1, and the current stage. Called on
 * the fitting thread; it should return quickly. The fitter itself writes nothing anywhere.
 */
@FunctionalInterface
public interface FitProgress {

    void report(double fractionDone, FitStage stage);

    /** A listener that ignores every report. */
    static FitProgress ignore() {
        return (fraction, stage) -> { };
    }
}
