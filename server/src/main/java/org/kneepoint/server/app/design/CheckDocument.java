package org.kneepoint.server.app.design;

import com.fasterxml.jackson.annotation.JsonInclude;
import java.util.List;
import java.util.Locale;
import org.kneepoint.fitter.loadline.AppliedField;
import org.kneepoint.fitter.loadline.DesignCheckResult;
import org.kneepoint.fitter.loadline.FieldConvention;
import org.kneepoint.fitter.loadline.LocalKneeResult;
import org.kneepoint.fitter.loadline.OperatingPoint;
import org.kneepoint.fitter.loadline.WorkingLimit;
import org.kneepoint.fitter.loadline.WorkingRange;
import org.kneepoint.server.app.wording.Cautions;

/**
 * A design check as one JSON document (SI; percentages and kelvin named in the key): the operating point, the
 * losses, the knee field and the margins to the knee in field and in temperature, the minimum and maximum working
 * temperatures and why each ends, the local check of the shape, the field and its convention, whether the model was
 * extrapolated (in all, and per result), the cautions. The old keys keep their place; the later ones were added.
 *
 * @param reversibleLossPercent   100·(Br(T)/Br(T0) − 1), negative when the flux falls
 * @param kneeMarginTemperatureK  how many kelvin hotter reach the knee (negative: cooler leaves it), null when the knee
 *                                does not reach the point within the model's temperature range
 * @param irreversibleLossPercent  100·(1 − Br'/Br(T)), Br' the remanence of the recoil line through the operating point
 * @param kneeMarginH             H_op − H_knee, A/m, positive above the knee; null when the curve never falls to 0.9·Br
 * @param kneeField               H of the knee (J = 0.9·Br) at T, A/m; null when the curve never falls that far
 * @param maxWorkingTemperatureStop why the maximum working temperature ends there: {@code loss-limit} (the loss reaches
 *                                the limit), {@code model-limit} (the top of the model's temperature range) or
 *                                {@code none-in-range} (the loss exceeds the limit at every temperature of the model)
 * @param localCheck              the local check of the shape, null when the load line was given by its Pc
 * @param fieldConvention         how the field against the magnetization was given: {@code opposing} (circuit
 *                                convention, B = −μ0·Pc·(H + Ha)) or {@code external} (uniform field on a free magnet,
 *                                H = −Hext − N·M)
 * @param opposingFieldH          Ha of the load line, A/m (the given field, or Hext/(1 − N) for an external one)
 * @param externalFieldH          Hext, A/m, or null for a field in the circuit convention
 * @param demagnetizingFactor     N = 1/(1 + Pc), the factor behind Pc (the one an external field is converted with)
 * @param minWorkingTemperatureK  the lowest working temperature for the loss limit, K, or null (none)
 * @param minWorkingTemperatureStop why it ends there, in the words of {@code maxWorkingTemperatureStop}
 * @param operatingPointExtrapolated whether the curve at T (the operating point and the knee) is extrapolated
 * @param lossExtrapolated        whether the loss rests on an extrapolated curve
 * @param minWorkingTemperatureExtrapolated whether the curve at the minimum working temperature is extrapolated
 * @param maxWorkingTemperatureExtrapolated whether the curve at the maximum working temperature is extrapolated
 * @param beyondMeasuredField     whether the operating point lies below the field range the grade's curve at T was
 *                                measured to, so that its fitted knee model stands in for the data there (always false
 *                                for a typed-in grade)
 * @param tolerance               the tolerance study, left out of the document when none was asked for
 * @param verdict                 whether the check meets its loss limit, in words, with each shortfall ({@link Verdicts#check})
 */
public record CheckDocument(double pc, Point operatingPoint, double reversibleLossPercent, double irreversibleLossPercent,
        Double kneeMarginH, Double maxWorkingTemperatureK, boolean extrapolated, List<String> cautions, Double kneeField,
        Double kneeMarginTemperatureK, String maxWorkingTemperatureStop, double lossLimitPercent, LocalCheck localCheck,
        String fieldConvention, double opposingFieldH, Double externalFieldH, double demagnetizingFactor,
        Double minWorkingTemperatureK, String minWorkingTemperatureStop, boolean operatingPointExtrapolated,
        boolean lossExtrapolated, boolean minWorkingTemperatureExtrapolated, boolean maxWorkingTemperatureExtrapolated,
        boolean beyondMeasuredField, @JsonInclude(JsonInclude.Include.NON_NULL) ToleranceDocument tolerance, Verdict verdict) {

    /** An operating point: H (A/m), B and J (T). */
    public record Point(double h, double b, double j) {

        static Point of(OperatingPoint point) {
            return new Point(point.h(), point.b(), point.j());
        }
    }

    /**
     * The local check of a shape: the share of its volume below the knee, the cells, and the lowest local field and
     * where it is (metres from the centre; region in words).
     */
    public record LocalCheck(double volumeBelowKneePercent, int resolution, int cells, double averageDemagnetizingField,
            double lowestField, double x, double y, double z, String region) {

        static LocalCheck of(LocalKneeResult local) {
            return local == null ? null : new LocalCheck(100.0 * local.fractionBelowKnee(), local.resolution(), local.cells(),
                    local.averageDemagnetizingField(), local.worstField(), local.worstX(), local.worstY(), local.worstZ(),
                    local.worstRegion().name().toLowerCase(java.util.Locale.ROOT).replace('_', ' '));
        }
    }

    static CheckDocument of(CheckRun run) {
        DesignCheckResult result = run.result();
        AppliedField field = result.appliedField();
        WorkingRange working = result.working();
        return new CheckDocument(result.loadLine().pc(), Point.of(result.point()), 100.0 * result.reversibleChange(),
                100.0 * result.irreversibleLoss(), result.kneeMarginField(), result.maxWorkingTemperature(), run.extrapolated(),
                Cautions.of(run.extrapolated(), result.beyondMeasuredField()), result.kneeField(), result.kneeMarginTemperature(), stop(working.maximum()),
                100.0 * run.lossLimit(), LocalCheck.of(run.local()), field.convention().name().toLowerCase(Locale.ROOT),
                result.loadLine().opposingField(), field.convention() == FieldConvention.EXTERNAL ? field.field() : null,
                AppliedField.demagnetizingFactor(result.loadLine().pc()), working.minimum().temperature(), stop(working.minimum()),
                result.pointExtrapolated(), result.lossExtrapolated(), working.minimum().extrapolated(),
                working.maximum().extrapolated(), result.beyondMeasuredField(), ToleranceDocument.of(run.tolerance()), run.verdict());
    }

    /** A working-temperature limit's reason in the document's words. */
    static String stop(WorkingLimit limit) {
        return switch (limit.reason()) {
            case LIMIT_REACHED -> "loss-limit";
            case MODEL_RANGE_EDGE -> "model-limit";
            case NONE_IN_RANGE -> "none-in-range";
        };
    }
}
