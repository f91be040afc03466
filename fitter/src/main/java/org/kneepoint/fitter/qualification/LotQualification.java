package org.kneepoint.fitter.qualification;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.kneepoint.fitter.curve.Characterization;
import org.kneepoint.fitter.curve.CurveCharacterizer;
import org.kneepoint.fitter.curve.DemagnetizationBranch;
import org.kneepoint.fitter.curve.DemagnetizationCurve;

/**
 * Checks a lot's curves against the grade's specifications and reference curves: for each sample
 * and measurement temperature, the curve is characterized ({@link CurveCharacterizer}), each
 * specified minimum compared under the guard band ({@link QuantityCheck}), and J(H) compared with
 * the grade's reference curve at that temperature ({@link CurveDeviation}).
 */
public final class LotQualification {

    private LotQualification() {
    }

    public static LotAssessment assess(List<SampleCurve> lotCurves, List<Specification> specifications,
            List<DemagnetizationCurve> references, GuardBand band) {
        List<SampleAssessment> samples = new ArrayList<>();
        for (Map.Entry<String, List<DemagnetizationCurve>> sample : bySample(lotCurves).entrySet()) {
            for (double temperatureK : temperatures(sample.getValue())) {
                DemagnetizationCurve curve = SameTemperature.curve(sample.getValue(), temperatureK).orElse(null);
                if (curve != null) {
                    samples.add(assess(sample.getKey(), curve, specifications, references, band));
                }
            }
        }
        List<Verdict> verdicts = samples.stream().filter(sample -> !sample.checks().isEmpty()).map(SampleAssessment::verdict).toList();
        return new LotAssessment(samples, Verdict.worst(verdicts, Verdict.INCONCLUSIVE));
    }

    private static SampleAssessment assess(String sample, DemagnetizationCurve curve, List<Specification> specifications,
            List<DemagnetizationCurve> references, GuardBand band) {
        double temperatureK = curve.temperatureK();
        Characterization measured = CurveCharacterizer.characterize(curve);
        Optional<Specification> specification = SameTemperature.specification(specifications, temperatureK);
        List<QuantityCheck> checks = new ArrayList<>();
        specification.ifPresent(spec -> spec.limits().stream().filter(limit -> limit.minimum() != null)
                .forEach(limit -> checks.add(QuantityCheck.of(limit.quantity(), limit.quantity().of(measured), limit.minimum(), band))));
        Optional<DemagnetizationCurve> reference = SameTemperature.curve(references, temperatureK);
        CurveDeviation deviation = reference.map(ref -> CurveDeviation.between(DemagnetizationBranch.of(curve),
                DemagnetizationBranch.of(ref), CurveCharacterizer.characterize(ref).br())).orElse(null);
        return new SampleAssessment(sample, temperatureK, specification.map(Specification::temperatureK).orElse(null), checks,
                reference.map(DemagnetizationCurve::temperatureK).orElse(null), deviation);
    }

    private static Map<String, List<DemagnetizationCurve>> bySample(List<SampleCurve> curves) {
        Map<String, List<DemagnetizationCurve>> samples = new LinkedHashMap<>();
        curves.forEach(curve -> samples.computeIfAbsent(curve.sample(), name -> new ArrayList<>()).add(curve.curve()));
        return samples;
    }

    /** The distinct measurement temperatures of one sample's curves, ascending, those within the tolerance counted once. */
    private static List<Double> temperatures(List<DemagnetizationCurve> curves) {
        List<Double> distinct = new ArrayList<>();
        curves.stream().map(DemagnetizationCurve::temperatureK).sorted().forEach(t -> {
            if (distinct.isEmpty() || !SameTemperature.same(distinct.get(distinct.size() - 1), t)) {
                distinct.add(t);
            }
        });
        return distinct;
    }
}
