package org.kneepoint.fitter.qualification;

/**
 * Mean, sample standard deviation and the lower process capability index of one quantity across
 * lots: Cpk = (mean − limit)/(3σ) against a lower limit alone (D. C. Montgomery, Introduction to
 * Statistical Quality Control, 7th ed., Wiley 2013, §8.3, eq. 8.8 for Cpl — from memory; see
 * docs/references.md §11). σ is the sample standard deviation (n − 1). Cpk is reported only from
 * {@value #MINIMUM_LOTS} lots on (our choice, after common practice: fewer say little about spread).
 *
 * @param count the number of lots
 * @param mean  the mean
 * @param standardDeviation the sample standard deviation, or null for fewer than two lots
 * @param cpk   (mean − limit)/(3σ), or null with no limit, fewer than {@value #MINIMUM_LOTS} lots or σ = 0
 */
public record ProcessCapability(int count, double mean, Double standardDeviation, Double cpk) {

    /** Lots needed before Cpk is reported. */
    public static final int MINIMUM_LOTS = 5;

    /** The statistics of the values against the lower limit (null when none). */
    public static ProcessCapability of(double[] values, Double lowerLimit) {
        if (values.length == 0) {
            throw new IllegalArgumentException("process capability needs at least one value");
        }
        double mean = 0;
        for (double value : values) {
            mean += value;
        }
        mean /= values.length;
        if (values.length < 2) {
            return new ProcessCapability(1, mean, null, null);
        }
        double squares = 0;
        for (double value : values) {
            squares += (value - mean) * (value - mean);
        }
        double sigma = Math.sqrt(squares / (values.length - 1));
        Double cpk = lowerLimit == null || values.length < MINIMUM_LOTS || sigma == 0 ? null : (mean - lowerLimit) / (3 * sigma);
        return new ProcessCapability(values.length, mean, sigma, cpk);
    }
}
