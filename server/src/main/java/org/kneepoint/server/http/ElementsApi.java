package org.kneepoint.server.http;

import io.javalin.http.Context;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.elements.TransverseRule;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.server.app.design.GradeModelCache;
import org.kneepoint.server.app.elements.Direction;
import org.kneepoint.server.app.elements.ElementCheckRequest;
import org.kneepoint.server.app.elements.ElementChecks;
import org.kneepoint.server.app.serving.ServerSettings;

/**
 * {@code POST /api/check/elements}: the uploaded element-field files (one per load case, in the order of the parts)
 * judged element by element on the grade the query names or types in, answering what {@code kneepoint check-elements}
 * prints with {@code --json} (docs/element-fields.md).
 */
final class ElementsApi {

    private final Library library;
    private final GradeModelCache models;

    ElementsApi(Library library, GradeModelCache models) {
        this.library = library;
        this.models = models;
    }

    void check(Context context) {
        Query query = new Query(context);
        try (Uploads uploads = Uploads.of(context)) {
            ElementCheckRequest request = new ElementCheckRequest(DesignRequests.grade(query),
                    ElementChecks.read(uploads.files(), ServerSettings.MAX_UPLOAD_BYTES), query.optionalTemperatureK("temperature"),
                    direction(query.text("direction")), DesignRequests.percent(query, "lossLimit", 1.0) / 100.0,
                    TransverseRule.named(query.choice("transverse", "along", "along", "astroid")));
            LibraryApi.json(context, ElementChecks.check(request, name -> models.stored(library.reader(), name)).document());
        }
    }

    private static Direction direction(String text) {
        try {
            return text == null ? null : Direction.parse(text);
        } catch (IllegalArgumentException e) {
            throw new BadInputException(InputLocation.of("query parameter 'direction'"), e.getMessage());
        }
    }
}
