package org.kneepoint.server.http;

import io.javalin.http.Context;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.elements.TransverseRule;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.server.app.design.GradeModelCache;
import org.kneepoint.server.app.elements.Direction;
import org.kneepoint.server.app.elements.ElementCheckRequest;
import org.kneepoint.server.app.elements.ElementCheckRun;
import org.kneepoint.server.app.elements.ElementChecks;
import org.kneepoint.server.app.serving.ServerSettings;

/**
 * {@code POST /api/check/elements}: the uploaded element-field files (one per load case, in the order of the parts)
 * judged element by element on the grade the query names or types in, answering what {@code kneepoint check-elements}
 * prints with {@code --json} (docs/element-fields.md).
 */
public final class ElementsApi {

    private final Library library;
    private final GradeModelCache models;

    ElementsApi(Library library, GradeModelCache models) {
        this.library = library;
        this.models = models;
    }

    void check(Context context) {
        LibraryApi.json(context, run(context, new Query(context), library, models).document());
    }

    /**
     * The element check a request asks for: the uploaded files (one per load case, in order) and the other parameters
     * from the query (the API) or from the form's fields (the Check page, {@link #fromForm}).
     */
    static ElementCheckRun run(Context context, Query query, Library library, GradeModelCache models) {
        try (Uploads uploads = Uploads.of(context)) {
            ElementCheckRequest request = new ElementCheckRequest(DesignRequests.grade(query),
                    ElementChecks.read(uploads.files(), ServerSettings.MAX_UPLOAD_BYTES), query.optionalTemperatureK("temperature"),
                    direction(query), DesignRequests.percent(query, "lossLimit", 1.0) / 100.0,
                    TransverseRule.named(query.choice("transverse", "along", "along", "astroid")));
            return ElementChecks.check(request, name -> models.stored(library.reader(), name));
        }
    }

    /** The element check of a page's multipart form: the files, and the grade and the rest as form fields. */
    public static ElementCheckRun fromForm(Context context, Library library, GradeModelCache models) {
        return run(context, Query.form(context), library, models);
    }

    private static Direction direction(Query query) {
        String text = query.text("direction");
        try {
            return text == null ? null : Direction.parse(text);
        } catch (IllegalArgumentException e) {
            throw new BadInputException(query.location("direction"), e.getMessage());
        }
    }
}
