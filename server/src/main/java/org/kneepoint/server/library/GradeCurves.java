package org.kneepoint.server.library;

import java.util.List;
import java.util.Locale;
import org.kneepoint.db.LibraryReader;
import org.kneepoint.fitter.curve.CurveKind;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.NotFoundException;
import org.kneepoint.fitter.error.NumericalFailureException;
import org.kneepoint.fitter.library.LibraryCurve;
import org.kneepoint.fitter.model.knee.ModeledCurves;
import org.kneepoint.fitter.model.knee.TemperatureFit;
import org.kneepoint.fitter.model.knee.TemperatureModelFitter;

/**
 * A grade's curves at a temperature: the stored ones when the library has curves at that
 * temperature (within 0.01 K), otherwise the temperature model's curve, built from the grade's
 * stored normal and intrinsic curves (interpolated inside the measured range, extrapolated and
 * flagged outside it).
 */
public final class GradeCurves {

    static final double SAME_TEMPERATURE_K = 0.01;

    private GradeCurves() {
    }

    public static List<GradeCurve> at(LibraryReader library, String grade, double temperatureK) {
        List<LibraryCurve> curves = stored(library, grade);
        List<GradeCurve> matching = curves.stream()
                .filter(curve -> Math.abs(curve.curve().temperatureK() - temperatureK) <= SAME_TEMPERATURE_K)
                .map(curve -> new GradeCurve(grade, curve.curve(), curve.source(), false, false)).toList();
        if (!matching.isEmpty()) {
            return matching;
        }
        TemperatureFit fit = temperatureModel(grade, curves);
        DemagnetizationCurve modeled = ModeledCurves.sample(fit.model().at(temperatureK), temperatureK, ModeledCurves.DEFAULT_POINTS);
        return List.of(new GradeCurve(grade, modeled, String.format(Locale.ROOT,
                "temperature model of %d stored curves (%s)", fit.fits().size(), grade), true, fit.model().isExtrapolated(temperatureK)));
    }

    /** The grade's stored curves; an unknown grade is not found. */
    public static List<LibraryCurve> stored(LibraryReader library, String grade) {
        if (library.grade(grade).isEmpty()) {
            throw new NotFoundException("no grade named '" + grade + "' in the library; 'kneepoint grades' lists them");
        }
        return library.curves(grade);
    }

    /** The temperature model from the grade's normal and intrinsic curves. */
    public static TemperatureFit temperatureModel(String grade, List<LibraryCurve> curves) {
        List<DemagnetizationCurve> usable = curves.stream().map(LibraryCurve::curve)
                .filter(curve -> curve.kind() != CurveKind.LOOP).toList();
        try {
            return TemperatureModelFitter.fit(usable);
        } catch (BadInputException e) {
            throw new BadInputException("grade '" + grade + "': no temperature model (" + e.getMessage() + ")");
        } catch (NumericalFailureException e) {
            throw new NumericalFailureException("grade '" + grade + "': no temperature model (" + e.getMessage() + ")");
        }
    }
}
