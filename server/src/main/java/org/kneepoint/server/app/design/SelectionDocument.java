package org.kneepoint.server.app.design;

import java.util.List;
import org.kneepoint.fitter.select.RankedGrade;
import org.kneepoint.fitter.select.Requirements;

/**
 * One grade of a selection as JSON: pass or fail with the reasons in words, and the ranked values (SI; null when
 * the grade is not assessable or a value is not reached). The later keys have the names {@link CheckDocument} gives
 * the same values.
 *
 * @param fieldConvention        how the field against the magnetization was given: {@code opposing} or {@code external}
 * @param minWorkingTemperatureK the lowest working temperature for the loss limit, K, or null (none, or not assessable)
 * @param beyondMeasuredField    whether the operating point lies below the field range the grade's curve was measured
 *                               to (its fitted knee model stands in there)
 * @param verdict                the grade's verdict ({@link Verdicts#row}): {@code passes} equals {@code pass}, its reasons
 *                               are {@code reasons}
 */
public record SelectionDocument(String grade, String family, boolean assessable, boolean pass, List<String> reasons,
        Double fluxDensity, Double kneeMarginH, Double irreversibleLossPercent, Double maxWorkingTemperatureK, boolean extrapolated,
        Double price, String fieldConvention, Double minWorkingTemperatureK, boolean beyondMeasuredField, Verdict verdict) {

    static SelectionDocument of(SelectionRow row, Requirements requirements) {
        RankedGrade ranked = row.ranked();
        return new SelectionDocument(row.grade(), row.family(), row.assessable(), row.passes(), reasons(row, requirements),
                ranked == null ? null : ranked.fluxDensity(), ranked == null ? null : ranked.kneeMarginField(),
                ranked == null ? null : 100.0 * ranked.irreversibleLoss(), ranked == null ? null : ranked.maxWorkingTemperature(),
                row.extrapolated(), ranked == null ? null : ranked.price(),
                requirements.field().convention().name().toLowerCase(java.util.Locale.ROOT),
                ranked == null ? null : ranked.minWorkingTemperature(), ranked != null && ranked.beyondMeasuredField(),
                Verdicts.row(row, requirements));
    }

    /** Why a grade fails or cannot be assessed, one sentence each; empty when it passes ({@link Verdicts#reasons}). */
    public static List<String> reasons(SelectionRow row, Requirements requirements) {
        return Verdicts.reasons(row, requirements);
    }
}
