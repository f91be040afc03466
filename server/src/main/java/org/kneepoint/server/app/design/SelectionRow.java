package org.kneepoint.server.app.design;

import org.kneepoint.fitter.select.RankedGrade;

/**
 * One grade of the library in a selection: its ranked row, or why it could not be assessed.
 *
 * @param grade         the grade's name
 * @param family        its material family
 * @param ranked        the grade against the requirements, or null when it is not assessable
 * @param notAssessable why the grade has no temperature model (null when it has one)
 * @param extrapolated  whether the required temperature or the maximum working temperature lies outside the
 *                      grade's measured temperatures
 */
public record SelectionRow(String grade, String family, RankedGrade ranked, String notAssessable, boolean extrapolated) {

    /** Whether the grade could be checked at all. */
    public boolean assessable() {
        return ranked != null;
    }

    /** Whether the grade meets every requirement. */
    public boolean passes() {
        return ranked != null && ranked.passes();
    }
}
