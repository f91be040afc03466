package org.kneepoint.server.app.design;

import java.util.List;
import java.util.Map;
import org.kneepoint.fitter.study.OutputSummary;
import org.kneepoint.fitter.study.ToleranceStudyResult;

/**
 * A check's tolerance study as the {@code tolerance} object of its JSON document (issue 14; SI, percent and kelvin
 * named in the key). A band is a 3σ process limit: normal truncated at its ends, or uniform.
 *
 * @param samples                  how many samples
 * @param seed                     the seed of the random numbers (the same seed repeats the study exactly)
 * @param distribution             {@code normal} or {@code uniform}
 * @param results                  for b, h, j, irreversibleLossPercent, reversibleLossPercent and maxWorkingTemperatureK:
 *                                 mean, sd, p05, p50, p95, min, max over the samples (null when no sample has one)
 * @param probabilityOverLossLimit the share of samples whose irreversible loss exceeds the loss limit
 * @param worstCase                the corner of all bands with the largest loss (then the least b): inputs and results
 * @param sensitivity              each input's share of the variance of {@code sensitivityOutput}, summing to 1
 *                                 (squared standardized regression coefficients, normalized)
 * @param sensitivityOutput        the output the shares explain: irreversibleLossPercent, or b where the loss is
 *                                 negligible (below 0.001 %) in every sample
 */
public record ToleranceDocument(int samples, long seed, String distribution, Map<String, OutputSummary> results,
        double probabilityOverLossLimit, ToleranceStudyResult.WorstCase worstCase, List<ToleranceStudyResult.Share> sensitivity,
        String sensitivityOutput) {

    static ToleranceDocument of(ToleranceStudyResult study) {
        return study == null ? null : new ToleranceDocument(study.samples(), study.seed(), study.distribution().label(),
                study.results(), study.probabilityOverLossLimit(), study.worstCase(), study.sensitivity(), study.sensitivityOutput());
    }
}
