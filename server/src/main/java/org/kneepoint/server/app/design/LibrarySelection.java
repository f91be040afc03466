package org.kneepoint.server.app.design;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.function.Supplier;
import org.kneepoint.db.LibraryReader;
import org.kneepoint.fitter.error.KneepointException;
import org.kneepoint.fitter.library.GradeSummary;
import org.kneepoint.fitter.loadline.MagnetFamily;
import org.kneepoint.fitter.loadline.TemperatureModel;
import org.kneepoint.fitter.select.GradeCandidate;
import org.kneepoint.fitter.select.GradeSelection;
import org.kneepoint.fitter.select.RankedGrade;
import org.kneepoint.fitter.select.RankingOrder;
import org.kneepoint.fitter.select.Requirements;

/**
 * Every grade of the library (or of one family) against one set of requirements (docs/design.md §2, workflow 4):
 * each grade's model from its stored curves built as a check builds it ({@link GradeModel#of}: the measured curves at
 * their temperatures, blended between them, on the model's range below the family's Curie temperature), ranked by
 * {@link GradeSelection}; a grade without a model, or one the check cannot evaluate, is kept as not
 * assessable with the reason, after the ranked grades.
 */
public final class LibrarySelection {

    private LibrarySelection() {
    }

    /**
     * Where a selection takes each grade's temperature model from, and its row for the requirements: computed now, or
     * kept ({@link GradeModelCache}).
     */
    @FunctionalInterface
    public interface Models {

        /** The grade's model; a grade without one is refused (a {@link KneepointException}). */
        TemperatureModel of(GradeSummary grade);

        /** The grades (of {@code family}, when not null) to rank, as {@link LibraryReader#grades} reads them (here, always). */
        default List<GradeSummary> grades(LibraryReader reader, String family) {
            return reader.grades(family);
        }

        /** The grade's row for {@code requirements}: {@code assess} computes it (here, always). */
        default SelectionRow row(GradeSummary grade, Requirements requirements, Supplier<SelectionRow> assess) {
            return assess.get();
        }
    }

    /** A grade's model from its stored curves, built as a check builds it ({@link GradeModel#of}). */
    public static GradeModel model(LibraryReader reader, GradeSummary grade) {
        return GradeModel.of(grade.name(), MagnetFamily.recognize(grade.family()).orElse(null), reader.curves(grade.name()));
    }

    /** The rows, each grade's model computed from its curves now. */
    public static List<SelectionRow> rank(LibraryReader reader, String family, Requirements requirements, RankingOrder order) {
        return rank(reader, family, requirements, order, grade -> model(reader, grade).model());
    }

    /** The rows: passing grades first, then failing ones, each in {@code order}; then those not assessable, by name. */
    public static List<SelectionRow> rank(LibraryReader reader, String family, Requirements requirements, RankingOrder order,
            Models models) {
        List<SelectionRow> assessed = new ArrayList<>();
        List<SelectionRow> notAssessable = new ArrayList<>();
        for (GradeSummary grade : models.grades(reader, family)) {
            SelectionRow row = models.row(grade, requirements, () -> assess(grade, requirements, models));
            (row.ranked() == null ? notAssessable : assessed).add(row);
        }
        assessed.sort(Comparator.comparing(SelectionRow::ranked, order.comparator()));
        assessed.addAll(notAssessable);
        return List.copyOf(assessed);
    }

    /** One grade against the requirements: its ranked row, or not assessable with the reason. */
    private static SelectionRow assess(GradeSummary grade, Requirements requirements, Models models) {
        try {
            TemperatureModel model = models.of(grade);
            RankedGrade row = GradeSelection.row(new GradeCandidate(grade.name(), model, grade.price()), requirements);
            return new SelectionRow(grade.name(), grade.family(), row, null, extrapolated(model, requirements, row));
        } catch (KneepointException e) {
            return new SelectionRow(grade.name(), grade.family(), null, e.getMessage(), false);
        }
    }

    private static boolean extrapolated(TemperatureModel model, Requirements requirements, RankedGrade row) {
        return model.isExtrapolated(requirements.temperature()) || model.isExtrapolated(model.referenceTemperature())
                || row.maxWorkingTemperature() != null && model.isExtrapolated(row.maxWorkingTemperature());
    }
}
