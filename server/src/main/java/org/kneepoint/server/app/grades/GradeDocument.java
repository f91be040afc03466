package org.kneepoint.server.app.grades;

import com.fasterxml.jackson.annotation.JsonInclude;
import java.util.List;
import java.util.Locale;
import org.kneepoint.fitter.library.GradeInfo;
import org.kneepoint.fitter.library.LibraryCurve;
import org.kneepoint.fitter.library.StoredGrade;

/**
 * One grade's details ({@code kneepoint edit --json}) and, for {@code GET /api/grades/{name}} and an edit through the
 * API, its stored curves; {@code version} is the row version an edit is made from.
 *
 * @param density kg/m³, or null
 * @param curves  the stored curves, or null (left out) where only the details are answered
 */
public record GradeDocument(String name, String family, String supplier, Double density, String notes, String provenance,
        Double price, int version, @JsonInclude(JsonInclude.Include.NON_NULL) List<StoredCurve> curves) {

    /** A stored curve of the grade: its temperature (K), kind, number of points and the file it came from. */
    public record StoredCurve(Double temperatureK, String kind, int points, String source) {

        static StoredCurve of(LibraryCurve curve) {
            return new StoredCurve(curve.curve().temperatureK(), curve.curve().kind().name().toLowerCase(Locale.ROOT),
                    curve.curve().size(), curve.source());
        }
    }

    /** The details alone, without the curves. */
    public static GradeDocument details(StoredGrade stored) {
        GradeInfo info = stored.grade();
        return new GradeDocument(info.name(), info.family(), info.supplier(), info.density(), info.notes(), info.provenance(),
                info.price(), stored.version(), null);
    }

    /** The details and the stored curves. */
    public static GradeDocument withCurves(StoredGrade stored, List<LibraryCurve> curves) {
        GradeDocument details = details(stored);
        return new GradeDocument(details.name, details.family, details.supplier, details.density, details.notes, details.provenance,
                details.price, details.version, curves.stream().map(StoredCurve::of).toList());
    }
}
