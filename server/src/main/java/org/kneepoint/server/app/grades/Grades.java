package org.kneepoint.server.app.grades;

import java.util.List;
import org.kneepoint.db.LibraryReader;
import org.kneepoint.fitter.curve.Characterization;
import org.kneepoint.fitter.curve.CurveCharacterizer;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.fitter.error.NotFoundException;

/**
 * The grade use cases that read: the grade list, one grade with its stored curves, and a grade's curves at a
 * temperature characterized (stored, or from the temperature model); for the command line, the API and the pages.
 */
public final class Grades {

    private Grades() {
    }

    /** The grades of the library, or of one family (null: all). */
    public static List<GradeRow> list(LibraryReader reader, String family) {
        return reader.grades(family).stream().map(GradeRow::of).toList();
    }

    /** One grade's details and stored curves; an unknown grade is not found. */
    public static GradeDocument detail(LibraryReader reader, String name) {
        var curves = GradeCurves.stored(reader, name);
        return GradeDocument.withCurves(reader.storedGrade(name)
                .orElseThrow(() -> new NotFoundException("no grade named '" + name + "' in the library")), curves);
    }

    /** The grade's curves at the temperature (K), each characterized. */
    public static List<CurveDocument> curvesAt(LibraryReader reader, String name, double temperatureK) {
        return characterize(GradeCurves.at(reader, name, temperatureK));
    }

    /**
     * Each curve characterized; a curve that cannot be is bad input named by its source and temperature.
     */
    public static List<CurveDocument> characterize(List<GradeCurve> curves) {
        return curves.stream().map(curve -> CurveDocument.of(curve, characterize(curve))).toList();
    }

    private static Characterization characterize(GradeCurve curve) {
        try {
            return CurveCharacterizer.characterize(curve.curve());
        } catch (BadInputException e) {
            Double temperatureK = curve.curve().temperatureK();
            String where = temperatureK == null ? curve.grade() : curve.grade() + " (curve at " + temperatureK + " K)";
            throw new BadInputException(InputLocation.of(where), e.getMessage());
        }
    }
}
