package org.kneepoint.server.cli;

import java.util.function.DoublePredicate;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.loadline.DesignCheckResult;
import org.kneepoint.fitter.loadline.TemperatureModel;
import org.kneepoint.fitter.model.knee.TemperatureFit;
import org.kneepoint.server.library.GradeCurves;
import org.kneepoint.server.text.Temperatures;

/**
 * The temperature model a design check works on: a GRADE's from the library ({@link GradeCurves#temperatureModel}),
 * or one typed in ({@link GradeOptions}); never both.
 *
 * @param model        the grade's intrinsic curve at any temperature
 * @param description  where the model comes from, for the table's heading
 * @param extrapolated whether a temperature lies outside the measured ones (never, for a typed-in grade)
 */
record GradeModel(TemperatureModel model, String description, DoublePredicate extrapolated) {

    /** The model of {@code grade} (null: typed in) from the library {@code libraryOption} names. */
    static GradeModel of(String grade, GradeOptions typed, LibraryOption libraryOption) {
        if (grade == null) {
            return new GradeModel(typed.law(), "grade typed in (linear temperature law)", temperature -> false);
        }
        if (typed.given()) {
            throw new BadInputException("give either a GRADE of the library or the typed-in --br, --mu-rec, --hcj, --knee,"
                    + " --alpha, --beta, --reference-temperature, not both");
        }
        TemperatureFit fit;
        try (Library library = libraryOption.open()) {
            fit = GradeCurves.temperatureModel(grade, GradeCurves.stored(library.reader(), grade));
        }
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
    boolean extrapolated(DesignCheckResult result) {
        return extrapolated.test(result.temperature()) || extrapolated.test(model.referenceTemperature())
                || result.maxWorkingTemperature() != null && extrapolated.test(result.maxWorkingTemperature());
    }
}
