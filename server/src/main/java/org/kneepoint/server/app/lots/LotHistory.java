package org.kneepoint.server.app.lots;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.curve.Characterization;
import org.kneepoint.fitter.curve.CurveCharacterizer;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.library.GradeSpecification;
import org.kneepoint.fitter.library.LotCurve;
import org.kneepoint.fitter.library.LotInfo;
import org.kneepoint.fitter.qualification.Limit;
import org.kneepoint.fitter.qualification.ProcessCapability;
import org.kneepoint.fitter.qualification.SameTemperature;
import org.kneepoint.fitter.qualification.Specification;
import org.kneepoint.fitter.qualification.SpecifiedQuantity;

/**
 * The history of a grade's lots at one temperature: each lot's Br, HcJ, (BH)max and Hk/HcJ (the
 * mean over its samples, each sample's curve chosen as {@link SameTemperature} says), and across
 * lots the mean, standard deviation and Cpk against the specification's minimum
 * ({@link ProcessCapability}). Lots not measured at the temperature are left out.
 */
public final class LotHistory {

    /** The quantities followed across lots, in the order of the issue. */
    private static final List<SpecifiedQuantity> FOLLOWED = List.of(SpecifiedQuantity.BR, SpecifiedQuantity.HCJ, SpecifiedQuantity.BH_MAX,
            SpecifiedQuantity.SQUARENESS);
    private static final double ROOM_TEMPERATURE_K = 293.15;

    private LotHistory() {
    }

    public static LotHistoryDocument run(Library library, LotHistoryRequest request) {
        Specifications.requireGrade(library, request.grade());
        List<Specification> specifications = library.qualificationReader().specifications(request.grade()).stream()
                .map(GradeSpecification::specification).toList();
        double temperatureK = request.temperatureK() != null ? request.temperatureK() : specifications.stream()
                .map(Specification::temperatureK).min(Comparator.comparingDouble(t -> Math.abs(t - ROOM_TEMPERATURE_K))).orElse(ROOM_TEMPERATURE_K);
        List<LotCurve> curves = library.qualificationReader().lotCurves(request.grade());
        List<LotHistoryDocument.LotValues> lots = new ArrayList<>();
        library.qualificationReader().lots(request.grade()).stream()
                .sorted(Comparator.comparing(LotInfo::measuredOn, Comparator.nullsLast(Comparator.naturalOrder())).thenComparing(LotInfo::name))
                .forEach(lot -> values(lot, curves, temperatureK).ifPresent(lots::add));
        Optional<Specification> specification = SameTemperature.specification(specifications, temperatureK);
        List<LotHistoryDocument.QuantityStatistics> statistics = FOLLOWED.stream()
                .map(quantity -> statistics(quantity, lots, specification.flatMap(spec -> spec.limit(quantity)).map(Limit::minimum).orElse(null)))
                .toList();
        return new LotHistoryDocument(request.grade(), temperatureK, lots, statistics);
    }

    private static Optional<LotHistoryDocument.LotValues> values(LotInfo lot, List<LotCurve> all, double temperatureK) {
        List<String> samples = all.stream().filter(curve -> curve.lot().equals(lot.name())).map(LotCurve::sample).distinct().toList();
        List<Characterization> measured = new ArrayList<>();
        for (String sample : samples) {
            List<DemagnetizationCurve> curves = all.stream().filter(curve -> curve.lot().equals(lot.name()) && curve.sample().equals(sample))
                    .map(LotCurve::curve).toList();
            SameTemperature.curve(curves, temperatureK).map(CurveCharacterizer::characterize).ifPresent(measured::add);
        }
        if (measured.isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(new LotHistoryDocument.LotValues(lot.name(), lot.measuredOn() == null ? null : lot.measuredOn().toString(),
                measured.size(), mean(measured, SpecifiedQuantity.BR), mean(measured, SpecifiedQuantity.HCJ),
                mean(measured, SpecifiedQuantity.BH_MAX), mean(measured, SpecifiedQuantity.SQUARENESS)));
    }

    private static Double mean(List<Characterization> measured, SpecifiedQuantity quantity) {
        double[] values = measured.stream().map(quantity::of).filter(Objects::nonNull).mapToDouble(Double::doubleValue).toArray();
        return values.length == 0 ? null : ProcessCapability.of(values, null).mean();
    }

    private static LotHistoryDocument.QuantityStatistics statistics(SpecifiedQuantity quantity, List<LotHistoryDocument.LotValues> lots,
            Double limit) {
        double[] values = lots.stream().map(lot -> value(lot, quantity)).filter(Objects::nonNull).mapToDouble(Double::doubleValue).toArray();
        if (values.length == 0) {
            return new LotHistoryDocument.QuantityStatistics(quantity.key(), limit, 0, null, null, null);
        }
        ProcessCapability capability = ProcessCapability.of(values, limit);
        return new LotHistoryDocument.QuantityStatistics(quantity.key(), limit, capability.count(), capability.mean(),
                capability.standardDeviation(), capability.cpk());
    }

    private static Double value(LotHistoryDocument.LotValues lot, SpecifiedQuantity quantity) {
        return switch (quantity) {
            case BR -> lot.br();
            case HCJ -> lot.hcj();
            case BH_MAX -> lot.bhMax();
            case SQUARENESS -> lot.squareness();
            case HK, HCB -> null;
        };
    }
}
