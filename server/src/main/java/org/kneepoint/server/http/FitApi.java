package org.kneepoint.server.http;

import io.javalin.http.Context;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.curve.CurveKind;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.error.NotFoundException;
import org.kneepoint.fitter.model.curieweiss.CurieWeissFitter;
import org.kneepoint.fitter.model.knee.KneeFitter;
import org.kneepoint.server.library.GradeCurves;
import org.kneepoint.server.library.SusceptibilityData;
import org.kneepoint.server.text.CurieWeissFitView;
import org.kneepoint.server.text.KneeFitView;
import org.kneepoint.server.text.TemperatureFitView;

/**
 * The fit routes that run at once — knee, temperature and Curie–Weiss fits of what the library
 * stores — answering what {@code kneepoint fit ... --json} prints; they store nothing. The slower
 * Jiles–Atherton fit runs as a background job.
 */
final class FitApi {

    private final Library library;

    FitApi(Library library) {
        this.library = library;
    }

    void knee(Context context) {
        Query query = new Query(context);
        String grade = query.required("grade", "DEMO NdFeB 42/100");
        Double temperature = query.optionalTemperatureK("temperature");
        List<Map<String, Object>> documents = new ArrayList<>();
        for (DemagnetizationCurve curve : curves(grade)) {
            if (temperature == null || Math.abs(curve.temperatureK() - temperature) <= 0.01) {
                documents.add(KneeFitView.json(KneeFitter.fit(curve)));
            }
        }
        if (documents.isEmpty()) {
            throw new NotFoundException("grade '" + grade + "' has no normal or intrinsic curve" + (temperature == null ? "" : " at that temperature"));
        }
        LibraryApi.json(context, documents.size() == 1 ? documents.get(0) : documents);
    }

    void temperature(Context context) {
        String grade = new Query(context).required("grade", "DEMO NdFeB 42/100");
        LibraryApi.json(context, TemperatureFitView.json(GradeCurves.temperatureModel(grade, GradeCurves.stored(library.reader(), grade))));
    }

    void curieWeiss(Context context) {
        String material = new Query(context).required("material", "DEMO copper-like metal");
        if (library.reader().susceptibility(material).isEmpty()) {
            throw new NotFoundException("no susceptibility of a material named '" + material + "' in the library");
        }
        SusceptibilityData data = SusceptibilityData.fromLibrary(library.reader(), material);
        Map<String, Object> document = CurieWeissFitView.json(new CurieWeissFitter().fit(data.temperatureK(), data.chiVolume()));
        document.put("source", data.source());
        document.put("material", data.material());
        document.put("form", data.form().name().toLowerCase());
        document.put("saved", false);
        LibraryApi.json(context, document);
    }

    private List<DemagnetizationCurve> curves(String grade) {
        return GradeCurves.stored(library.reader(), grade).stream().map(stored -> stored.curve())
                .filter(curve -> curve.kind() != CurveKind.LOOP).toList();
    }
}
