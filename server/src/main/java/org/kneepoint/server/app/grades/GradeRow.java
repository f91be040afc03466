package org.kneepoint.server.app.grades;

import java.util.List;
import org.kneepoint.fitter.library.GradeSummary;

/**
 * One row of the grade list ({@code kneepoint grades --json}, {@code GET /api/grades}).
 *
 * @param temperaturesK the temperatures of the grade's stored curves, K
 * @param curves        how many curves the grade has
 * @param price         price per kilogram in the team's currency, or null
 */
public record GradeRow(String name, String family, String supplier, List<Double> temperaturesK, int curves, Double price) {

    public GradeRow {
        temperaturesK = List.copyOf(temperaturesK);
    }

    static GradeRow of(GradeSummary grade) {
        return new GradeRow(grade.name(), grade.family(), grade.supplier(), grade.temperaturesK(), grade.curves(), grade.price());
    }
}
