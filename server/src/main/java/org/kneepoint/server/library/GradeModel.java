package org.kneepoint.server.library;

import java.util.function.DoublePredicate;
import org.kneepoint.db.LibraryReader;
import org.kneepoint.fitter.loadline.DesignCheckResult;
import org.kneepoint.fitter.loadline.LinearTemperatureLaw;
import org.kneepoint.fitter.loadline.TemperatureModel;
import org.kneepoint.fitter.model.knee.TemperatureFit;
import org.kneepoint.server.text.Temperatures;

/**
 * The temperature model a design check works on: a grade's from the library ({@link GradeCurves#temperatureModel}),
 * or one typed in ({@link TypedGrade}). The command line and the HTTP routes build it the same way.
 *
 * @param model        the grade's intrinsic curve at any temperature
 * @param description  where the model comes from, for the table's heading
 * @param extrapolated whether a temperature lies outside the measured ones (never, for a typed-in grade)
 */
public record GradeModel(TemperatureModel model, String description, DoublePredicate extrapolated) {

    /** A grade typed in: its linear temperature law, never extrapolated. */
    public static GradeModel typed(LinearTemperatureLaw law) {
        return new GradeModel(law, "grade typed in (linear temperature law)", temperature -> false);
    }

    /** The temperature model of a stored grade; an unknown grade is not found, one without a model is bad input. */
    public static GradeModel stored(LibraryReader reader, String grade) {
        TemperatureFit fit = GradeCurves.temperatureModel(grade, GradeCurves.stored(reader, grade));
        double lowest = fit.fits().get(0).temperatureK();
        double highest = fit.fits().get(fit.fits().size() - 1).temperatureK();
        String description = grade + " (temperature model of " + fit.fits().size() + " curves measured at "
                + Temperatures.celsius(lowest) + " to " + Temperatures.celsius(highest) + ")";
        return new GradeModel(fit.model(), description, fit.model()::isExtrapolated);
    }

    /**
     * Whether the check left the measured temperatures: at T, at the reference temperature where the
     * maximum working temperature's search starts, or at the maximum it found.
     */
    public boolean extrapolated(DesignCheckResult result) {
        return extrapolated.test(result.temperature()) || extrapolated.test(model.referenceTemperature())
                || result.maxWorkingTemperature() != null && extrapolated.test(result.maxWorkingTemperature());
    }
}
