package org.kneepoint.fitter.study;

import java.util.List;
import java.util.Map;

/**
 * What a tolerance study found: its settings, a summary of each output ({@link CheckOutput}, by key; null for an
 * output no sample has), the share of samples whose irreversible loss exceeds the limit, the worst corner of the
 * bands, and each input's share of the variance of {@code sensitivityOutput} (the loss, or {@code b} where the loss
 * does not vary).
 */
public record ToleranceStudyResult(int samples, long seed, BandDistribution distribution, Map<String, OutputSummary> results,
        double probabilityOverLossLimit, WorstCase worstCase, String sensitivityOutput, List<Share> sensitivity) {

    /**
     * The corner of the bands with the largest loss (then the least flux): each input's value there (SI, by name) and
     * the check's outputs (by key; null where there is none, such as no working range).
     */
    public record WorstCase(Map<String, Double> inputs, Map<String, Double> results) {
    }

    /** One input's share of the output variance, 0 to 1. */
    public record Share(String input, double share) {
    }
}
