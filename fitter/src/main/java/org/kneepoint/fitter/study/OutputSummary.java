package org.kneepoint.fitter.study;

import java.util.Arrays;
import org.hipparchus.stat.descriptive.rank.Percentile;
import org.hipparchus.stat.descriptive.rank.Percentile.EstimationType;

/**
 * One output of a study summed up over its samples: mean, sample standard deviation, the 5th, 50th and 95th
 * percentiles (Hyndman and Fan's definition 7, linear between order statistics, Hipparchus {@link Percentile} R_7;
 * docs/references.md §10), the least and the greatest value.
 */
public record OutputSummary(double mean, double sd, double p05, double p50, double p95, double min, double max) {

    /** The summary of {@code values}; null when there are none (an output no sample has, such as no working range). */
    public static OutputSummary of(double[] values) {
        double[] present = Arrays.stream(values).filter(Double::isFinite).toArray();
        if (present.length == 0) {
            return null;
        }
        double mean = Arrays.stream(present).sum() / present.length;
        double squares = Arrays.stream(present).map(v -> (v - mean) * (v - mean)).sum();
        double sd = present.length > 1 ? Math.sqrt(squares / (present.length - 1)) : 0.0;
        Percentile percentile = new Percentile().withEstimationType(EstimationType.R_7);
        Arrays.sort(present);
        percentile.setData(present);
        return new OutputSummary(mean, sd, percentile.evaluate(5.0), percentile.evaluate(50.0), percentile.evaluate(95.0),
                present[0], present[present.length - 1]);
    }
}
