package org.kneepoint.server.app.lots;

import java.util.List;

/**
 * Every lot of a grade measured at one temperature, in order of measurement (lots without a date
 * last, then by name), with each quantity's mean, sample standard deviation and Cpk against its
 * minimum. A lot's value is the mean over its samples; null where no sample's curve reaches it.
 */
public record LotHistoryDocument(String grade, double temperatureK, List<LotValues> lots, List<QuantityStatistics> quantities) {

    /** One lot's Br (T), HcJ (A/m), (BH)max (J/m³) and Hk/HcJ, each the mean over its samples. */
    public record LotValues(String lot, String measuredOn, int samples, Double br, Double hcj, Double bhMax, Double squareness) {
    }

    /**
     * One quantity across the lots that reach it.
     *
     * @param limit             the specification's minimum at the temperature, or null
     * @param mean              null when no lot reaches the quantity
     * @param standardDeviation null below two lots
     * @param cpk               (mean − limit)/(3σ), null with no limit or fewer than five lots
     */
    public record QuantityStatistics(String name, Double limit, int count, Double mean, Double standardDeviation, Double cpk) {
    }
}
