package org.kneepoint.fitter.select;

import java.util.List;

/**
 * One grade's row in a selection. Values the grade cannot give (outside its temperature range; the knee margin of a
 * curve that never falls to 0.9·Br) are NaN or null.
 *
 * @param name                  grade name
 * @param shortfalls            the requirements it misses; empty when it passes
 * @param fluxDensity           B at the operating point, T
 * @param kneeMarginField       H_op − H_knee, A/m (positive above the knee)
 * @param irreversibleLoss      fraction
 * @param maxWorkingTemperature K, or null if none (see {@link org.kneepoint.fitter.loadline.DesignCheckResult})
 * @param price                 price or cost index, or null
 * @param minWorkingTemperature K, or null if none (see {@link org.kneepoint.fitter.loadline.DesignCheckResult})
 * @param beyondMeasuredField   whether the operating point lies below the field range the grade's curve at the
 *                              temperature was measured to (its fitted model stands in there)
 */
public record RankedGrade(String name, List<Shortfall> shortfalls, double fluxDensity, double kneeMarginField,
        double irreversibleLoss, Double maxWorkingTemperature, Double price, Double minWorkingTemperature,
        boolean beyondMeasuredField) {

    public RankedGrade {
        shortfalls = List.copyOf(shortfalls);
    }

    /** Whether the grade meets every requirement. */
    public boolean passes() {
        return shortfalls.isEmpty();
    }
}
