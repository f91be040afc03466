package org.kneepoint.server.app.design;

import java.util.List;
import java.util.Locale;
import org.kneepoint.fitter.loadline.FieldConvention;
import org.kneepoint.fitter.study.SweepPoint;
import org.kneepoint.server.app.wording.Cautions;

/**
 * A temperature sweep as one JSON document (SI; percent and kelvin named in the key): Pc, the field and its
 * convention, the loss limit, one entry per temperature, the working temperatures for the limit (null when none),
 * whether anything is extrapolated or beyond the measured field, the cautions, and the verdict over every temperature
 * ({@link Verdicts#sweep}).
 */
public record SweepDocument(double pc, String fieldConvention, double opposingFieldH, Double externalFieldH, double lossLimitPercent,
        List<Step> steps, Double minWorkingTemperatureK, Double maxWorkingTemperatureK, boolean extrapolated,
        boolean beyondMeasuredField, List<String> cautions, Verdict verdict) {

    /**
     * One temperature: the operating point, 100·(Br(T)/Br(T0) − 1), the irreversible loss by the recoil line, the margin
     * to the knee (A/m, null without a knee), and whether the curve there is extrapolated or the point beyond its field.
     */
    public record Step(double temperatureK, CheckDocument.Point operatingPoint, double reversibleLossPercent,
            double irreversibleLossPercent, Double kneeMarginH, boolean extrapolated, boolean beyondMeasuredField) {

        static Step of(SweepPoint point) {
            return new Step(point.temperature(), new CheckDocument.Point(point.h(), point.b(), point.j()),
                    100.0 * point.reversibleChange(), 100.0 * point.irreversibleLoss(), point.kneeMarginH(), point.extrapolated(),
                    point.beyondMeasuredField());
        }
    }

    static SweepDocument of(SweepRun run) {
        boolean external = run.field().convention() == FieldConvention.EXTERNAL;
        return new SweepDocument(run.pc(), run.field().convention().name().toLowerCase(Locale.ROOT),
                run.field().circuitField(run.pc()), external ? run.field().field() : null, 100.0 * run.lossLimit(),
                run.sweep().points().stream().map(Step::of).toList(), run.sweep().working().minimum().temperature(),
                run.sweep().working().maximum().temperature(), run.extrapolated(), run.beyondMeasuredField(),
                Cautions.of(run.extrapolated(), run.beyondMeasuredField()), run.verdict());
    }
}
