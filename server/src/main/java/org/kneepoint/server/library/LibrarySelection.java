package org.kneepoint.server.library;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.kneepoint.db.LibraryReader;
import org.kneepoint.fitter.error.KneepointException;
import org.kneepoint.fitter.library.GradeSummary;
import org.kneepoint.fitter.model.knee.FittedTemperatureModel;
import org.kneepoint.fitter.select.GradeCandidate;
import org.kneepoint.fitter.select.GradeSelection;
import org.kneepoint.fitter.select.RankedGrade;
import org.kneepoint.fitter.select.RankingOrder;
import org.kneepoint.fitter.select.Requirements;

/**
 * Every grade of the library (or of one family) against one set of requirements (DESIGN §2, workflow 4):
 * each grade's temperature model from its stored curves ({@link GradeCurves#temperatureModel}), ranked by
 * {@link GradeSelection}; a grade without a model, or one the check cannot evaluate, is kept as not
 * assessable with the reason, after the ranked grades.
 */
public final class LibrarySelection {

    private LibrarySelection() {
    }

    /** The rows: passing grades first, then failing ones, each in {@code order}; then those not assessable, by name. */
    public static List<SelectionRow> rank(LibraryReader reader, String family, Requirements requirements, RankingOrder order) {
        List<SelectionRow> assessed = new ArrayList<>();
        List<SelectionRow> notAssessable = new ArrayList<>();
        for (GradeSummary grade : reader.grades(family)) {
            try {
                FittedTemperatureModel model = GradeCurves.temperatureModel(grade.name(), reader.curves(grade.name())).model();
                RankedGrade row = GradeSelection.row(new GradeCandidate(grade.name(), model, grade.price()), requirements);
                assessed.add(new SelectionRow(grade.name(), grade.family(), row, null, extrapolated(model, requirements, row)));
            } catch (KneepointException e) {
                notAssessable.add(new SelectionRow(grade.name(), grade.family(), null, e.getMessage(), false));
            }
        }
        assessed.sort(Comparator.comparing(SelectionRow::ranked, order.comparator()));
        assessed.addAll(notAssessable);
        return List.copyOf(assessed);
    }

    private static boolean extrapolated(FittedTemperatureModel model, Requirements requirements, RankedGrade row) {
        return model.isExtrapolated(requirements.temperature()) || model.isExtrapolated(model.referenceTemperature())
                || row.maxWorkingTemperature() != null && model.isExtrapolated(row.maxWorkingTemperature());
    }
}
