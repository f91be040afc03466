package org.kneepoint.fitter.select;

import java.util.List;

/**
 * One grade's row in a selection. Values the grade cannot give (outside its temperature range) are NaN
 * or null.
 *
 * @param name                  grade name
 * @param shortfalls            the requirements it misses; empty when it passes
 * @param fluxDensity           B at the operating point, T
 * @param kneeMarginField       H_op − H_knee, A/m (positive above the knee)
 * @param irreversibleLoss      fraction
 * @param maxWorkingTemperature K, or null if none (see {@link org.kneepoint.fitter.loadline.DesignCheckResult})
 * @param price                 price or cost index, or null
 */
public record RankedGrade(String name, List<Shortfall> shortfalls, double fluxDensity, double kneeMarginField,
        double irreversibleLoss, Double maxWorkingTemperature, Double price) {

    public RankedGrade {
        shortfalls = List.copyOf(shortfalls);
    }

    /** Whether the grade meets every requirement. */
    public boolean passes() {
        return shortfalls.isEmpty();
    }
}
