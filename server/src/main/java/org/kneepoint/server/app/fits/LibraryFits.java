package org.kneepoint.server.app.fits;

import java.util.List;
import org.kneepoint.db.LibraryReader;
import org.kneepoint.fitter.curve.CurveKind;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.error.NotFoundException;
import org.kneepoint.fitter.model.curieweiss.CurieWeissFitter;
import org.kneepoint.fitter.model.knee.KneeFitter;
import org.kneepoint.server.app.grades.GradeCurves;
import org.kneepoint.server.app.grades.SusceptibilityData;

/**
 * The fits that run at once on what the library stores, storing nothing ({@code GET /api/fit/...}): the knee model
 * per stored curve of a grade, a grade's temperature model, the Curie–Weiss law of a material.
 */
public final class LibraryFits {

    private LibraryFits() {
    }

    /** The knee fit of each normal or intrinsic curve of the grade, or only of the one at {@code temperatureK} (±0.01 K). */
    public static List<KneeFitDocument> knee(LibraryReader reader, String grade, Double temperatureK) {
        List<KneeFitDocument> documents = GradeCurves.stored(reader, grade).stream().map(stored -> stored.curve())
                .filter(curve -> curve.kind() != CurveKind.LOOP)
                .filter(curve -> temperatureK == null || Math.abs(curve.temperatureK() - temperatureK) <= 0.01)
                .map(LibraryFits::kneeFit).toList();
        if (documents.isEmpty()) {
            throw new NotFoundException("grade '" + grade + "' has no normal or intrinsic curve" + (temperatureK == null ? "" : " at that temperature"));
        }
        return documents;
    }

    /** The grade's temperature model from its stored curves. */
    public static TemperatureFitDocument temperature(LibraryReader reader, String grade) {
        return TemperatureFitDocument.of(GradeCurves.temperatureModel(grade, GradeCurves.stored(reader, grade)));
    }

    /** The Curie–Weiss law fitted to the material's stored susceptibility (not saved). */
    public static CurieWeissFitDocument curieWeiss(LibraryReader reader, String material) {
        if (reader.susceptibility(material).isEmpty()) {
            throw new NotFoundException("no susceptibility of a material named '" + material + "' in the library");
        }
        SusceptibilityData data = SusceptibilityData.fromLibrary(reader, material);
        return CurieWeissFitDocument.of(data, new CurieWeissFitter().fit(data.temperatureK(), data.chiVolume()), false);
    }

    private static KneeFitDocument kneeFit(DemagnetizationCurve curve) {
        return KneeFitDocument.of(KneeFitter.fit(curve));
    }
}
