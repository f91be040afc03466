package org.kneepoint.server.app.grades;

import java.util.List;
import java.util.Locale;
import org.kneepoint.db.LibraryReader;
import org.kneepoint.fitter.curve.CurveKind;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.NotFoundException;
import org.kneepoint.fitter.error.NumericalFailureException;
import org.kneepoint.fitter.library.GradeInfo;
import org.kneepoint.fitter.library.LibraryCurve;
import org.kneepoint.fitter.loadline.MagnetFamily;
import org.kneepoint.fitter.model.knee.ModeledCurves;
import org.kneepoint.fitter.model.knee.TemperatureFit;
import org.kneepoint.fitter.model.knee.TemperatureModelFitter;
import org.kneepoint.fitter.temperature.CurveAtTemperature;
import org.kneepoint.fitter.temperature.TemperatureCurve;

/**
 * A grade's curves at a temperature: the stored ones when the library has curves at that
 * temperature (within 0.01 K), otherwise the grade's curve at that temperature from its measured
 * curves ({@link CurveAtTemperature}: blended between the neighbouring measured curves inside the
 * measured range, the nearest one scaled and flagged extrapolated outside it), on the range a design
 * check accepts (cut below the family's Curie temperature).
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
        CurveAtTemperature measured = measured(grade, curves);
        measured.bounded(family(library, grade)).at(temperatureK);
        TemperatureCurve atT = measured.at(temperatureK);
        DemagnetizationCurve modeled = ModeledCurves.sample(atT, atT.intrinsicCoercivity(), temperatureK, ModeledCurves.DEFAULT_POINTS);
        return List.of(new GradeCurve(grade, modeled, String.format(Locale.ROOT,
                "%s of %d stored curves (%s)%s", atT.extrapolated() ? "nearest measured curve scaled by the temperature model"
                        : "interpolation between the neighbouring measured curves", measured.measuredTemperatures().size(), grade,
                atT.beyondMeasuredField(-atT.intrinsicCoercivity()) ? "; the fitted knee model continues a curve below the field"
                        + " it was measured to" : ""),
                true, atT.extrapolated()));
    }

    /** The grade's curves at any temperature from its stored normal and intrinsic curves and the temperature model fitted to them. */
    public static CurveAtTemperature measured(String grade, List<LibraryCurve> curves) {
        TemperatureFit fit = temperatureModel(grade, curves);
        try {
            return CurveAtTemperature.of(usable(curves), fit);
        } catch (BadInputException e) {
            throw new BadInputException("grade '" + grade + "': no curve at temperature (" + e.getMessage() + ")");
        }
    }

    /** The family of a stored grade whose Curie temperature bounds its model, or null when the name is not recognized. */
    public static MagnetFamily family(LibraryReader library, String grade) {
        return library.grade(grade).map(GradeInfo::family).flatMap(MagnetFamily::recognize).orElse(null);
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
        try {
            return TemperatureModelFitter.fit(usable(curves));
        } catch (BadInputException e) {
            throw new BadInputException("grade '" + grade + "': no temperature model (" + e.getMessage() + ")");
        } catch (NumericalFailureException e) {
            throw new NumericalFailureException("grade '" + grade + "': no temperature model (" + e.getMessage() + ")");
        }
    }

    private static List<DemagnetizationCurve> usable(List<LibraryCurve> curves) {
        return curves.stream().map(LibraryCurve::curve).filter(curve -> curve.kind() != CurveKind.LOOP).toList();
    }
}
