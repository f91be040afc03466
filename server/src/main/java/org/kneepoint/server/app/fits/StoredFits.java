package org.kneepoint.server.app.fits;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.List;
import org.kneepoint.db.LibraryReader;
import org.kneepoint.fitter.library.FitRecord;
import org.kneepoint.server.app.Json;

/** The fits stored in the library, by time ({@code GET /api/fits}). */
public final class StoredFits {

    private StoredFits() {
    }

    /**
     * One stored fit: what it belongs to (a grade's curve, or a material), the model, its parameters as they were
     * saved (the model's parameter document), the residual, when and by which program version.
     *
     * @param fittedAt ISO-8601 instant
     */
    public record StoredFit(String grade, Double curveTemperatureK, String curveKind, String material, String model,
            JsonNode parameters, Double residual, String fittedAt, String programVersion) {

        static StoredFit of(FitRecord fit) {
            return new StoredFit(fit.grade(), fit.curveTemperatureK(), fit.curveKind(), fit.material(), fit.model(),
                    Json.read(fit.parametersJson()), fit.residual(), fit.fittedAt().toString(), fit.programVersion());
        }
    }

    /** Every stored fit, oldest first. */
    public static List<StoredFit> list(LibraryReader reader) {
        return reader.fits().stream().map(StoredFit::of).toList();
    }
}
