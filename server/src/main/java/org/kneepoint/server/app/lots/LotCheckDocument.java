package org.kneepoint.server.app.lots;

import java.util.List;

/**
 * The result of {@code lot check} (its JSON keys are fixed by issue 17): per sample and
 * temperature, each specified quantity with its value, limit, margin and verdict, and the largest
 * deviation of J(H) from the grade's reference curve; the lot's verdict and the reasons for it.
 * Values are SI; a null value was not reached by the measured curve, a null deviation had no
 * reference curve to compare with.
 */
public record LotCheckDocument(String lot, String grade, List<Sample> samples, String verdict, List<String> reasons) {

    /**
     * One sample at one temperature.
     *
     * @param maxDeviation    (J_lot − J_reference)/Br_reference where its magnitude is largest, or null
     * @param maxDeviationAtH the H of that point, A/m, or null
     */
    public record Sample(String sample, double temperatureK, List<QuantityResult> quantities, Double maxDeviation, Double maxDeviationAtH) {
    }

    /** One specified minimum: the measured value, the limit, value − limit, and pass, inconclusive or fail. */
    public record QuantityResult(String name, Double value, double limit, Double margin, String verdict) {
    }
}
