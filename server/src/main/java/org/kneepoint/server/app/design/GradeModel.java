package org.kneepoint.server.app.design;

import java.util.List;
import java.util.function.DoublePredicate;
import org.kneepoint.db.LibraryReader;
import org.kneepoint.fitter.library.LibraryCurve;
import org.kneepoint.fitter.loadline.BoundedTemperatureModel;
import org.kneepoint.fitter.loadline.DesignCheckResult;
import org.kneepoint.fitter.loadline.MagnetFamily;
import org.kneepoint.fitter.loadline.RememberedLosses;
import org.kneepoint.fitter.loadline.TemperatureModel;
import org.kneepoint.fitter.temperature.CurveAtTemperature;
import org.kneepoint.server.app.grades.GradeCurves;
import org.kneepoint.server.app.wording.Temperatures;

/**
 * The temperature model a design check works on: a grade's from the library, its measured curves at their own
 * temperatures and blended between them ({@link GradeCurves#measured}, {@link CurveAtTemperature}), on the range of its
 * fitted temperature model cut below the family's Curie temperature and where the model's curve ends
 * ({@link BoundedTemperatureModel}); or one typed in ({@link TypedGrade}). The command line, the HTTP routes and the
 * selection build it the same way.
 *
 * @param model        the grade's intrinsic curve at any temperature
 * @param description  where the model comes from, for the table's heading
 * @param extrapolated whether a temperature lies outside the measured ones (never, for a typed-in grade)
 */
public record GradeModel(TemperatureModel model, String description, DoublePredicate extrapolated) {

    /** A grade typed in: its linear temperature law (or that law at T0 alone, without α and β), never extrapolated. */
    public static GradeModel typed(TemperatureModel law) {
        return new GradeModel(law, "grade typed in (knee model, linear temperature law)", temperature -> false);
    }

    /** The temperature model of a stored grade; an unknown grade is not found, one without a model is bad input. */
    public static GradeModel stored(LibraryReader reader, String grade) {
        return of(grade, GradeCurves.family(reader, grade), GradeCurves.stored(reader, grade));
    }

    /** The model of a grade from its stored {@code curves}, bounded below the Curie temperature of {@code family} (null: none). */
    public static GradeModel of(String grade, MagnetFamily family, List<LibraryCurve> curves) {
        CurveAtTemperature measured = GradeCurves.measured(grade, curves);
        BoundedTemperatureModel model = measured.bounded(family);
        List<Double> temperatures = measured.measuredTemperatures();
        String description = grade + " (" + temperatures.size() + " curves measured at " + Temperatures.celsius(temperatures.get(0))
                + " to " + Temperatures.celsius(temperatures.get(temperatures.size() - 1)) + ", used as measured at those"
                + " temperatures and blended between them)";
        return new GradeModel(model, description, model::isExtrapolated);
    }

    /**
     * This model keeping the losses it computes ({@link RememberedLosses}), for a model kept and asked again
     * ({@link GradeModelCache}): the same answers, most of a working-temperature search answered from memory.
     */
    public GradeModel rememberingLosses() {
        return new GradeModel(new RememberedLosses(model), description, extrapolated);
    }

    /** Whether any part of the check (T, T0, either working temperature) rests on an extrapolated curve. */
    public boolean extrapolated(DesignCheckResult result) {
        return result.extrapolated();
    }
}
