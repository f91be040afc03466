package org.kneepoint.fitter.limits;

import java.util.Arrays;

/**
 * A robust estimate of the noise of a sampled curve: the median absolute deviation of its second
 * differences, scaled to a standard deviation (MAD·1.4826 for Gaussian noise, divided by √6
 * because a second difference sums three readings with weights 1, −2, 1). Smooth parts of the
 * curve contribute almost nothing and a knee or a few outliers cannot move a median.
 */
final class NoiseEstimate {

    private static final double MAD_TO_SIGMA = 1.4826;

    private NoiseEstimate() {
    }

    /** The noise deviation of values in their sampling order; 0 for fewer than five values. */
    static double deviation(double[] values) {
        if (values.length < 5) {
            return 0;
        }
        double[] second = new double[values.length - 2];
        for (int i = 0; i < second.length; i++) {
            second[i] = values[i] - 2 * values[i + 1] + values[i + 2];
        }
        double center = median(second);
        double[] deviations = Arrays.stream(second).map(d -> Math.abs(d - center)).toArray();
        return MAD_TO_SIGMA * median(deviations) / Math.sqrt(6);
    }

    private static double median(double[] values) {
        double[] sorted = values.clone();
        Arrays.sort(sorted);
        int middle = sorted.length / 2;
        return sorted.length % 2 == 1 ? sorted[middle] : 0.5 * (sorted[middle - 1] + sorted[middle]);
    }
}
