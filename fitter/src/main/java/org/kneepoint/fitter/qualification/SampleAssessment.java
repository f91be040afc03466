package org.kneepoint.fitter.qualification;

import java.util.List;

/**
 * One sample of a lot at one temperature against the grade.
 *
 * @param sample                 the sample's name
 * @param temperatureK           the measurement temperature, K
 * @param specificationTemperatureK the temperature of the specification applied, or null when the grade has none there
 * @param checks                 each specified minimum, in the order of {@link SpecifiedQuantity}
 * @param referenceTemperatureK  the temperature of the grade's reference curve compared with, or null when there is none
 * @param deviation              the largest deviation from that reference curve, or null (no reference, no common field range)
 */
public record SampleAssessment(String sample, double temperatureK, Double specificationTemperatureK, List<QuantityCheck> checks,
        Double referenceTemperatureK, CurveDeviation deviation) {

    public SampleAssessment {
        checks = List.copyOf(checks);
    }

    /** The worst verdict of the checks; inconclusive when nothing was specified. */
    public Verdict verdict() {
        return Verdict.worst(checks.stream().map(QuantityCheck::verdict).toList(), Verdict.INCONCLUSIVE);
    }
}
