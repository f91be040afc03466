package org.kneepoint.server.http;

import io.javalin.http.Context;
import org.kneepoint.db.Library;
import org.kneepoint.server.app.design.GradeModelCache;
import org.kneepoint.server.app.design.Position;
import org.kneepoint.server.app.design.FieldDocument;

/**
 * The design routes: {@code /api/check}, {@code /api/sweep}, {@code /api/duty}, {@code /api/select} and {@code /api/field/{shape}},
 * answering what {@code kneepoint check}, {@code sweep}, {@code duty}, {@code select} and {@code field} print with {@code --json}.
 */
final class DesignApi {

    private final Library library;
    private final GradeModelCache models;

    DesignApi(Library library, GradeModelCache models) {
        this.library = library;
        this.models = models;
    }

    void check(Context context) {
        LibraryApi.json(context, DesignRequests.check(context, library.reader(), models).document());
    }

    void sweep(Context context) {
        LibraryApi.json(context, DesignRequests.sweep(context, library.reader(), models).document());
    }

    void duty(Context context) {
        LibraryApi.json(context, DesignRequests.duty(context, library.reader(), models).document());
    }

    void select(Context context) {
        LibraryApi.json(context, DesignRequests.select(context, library.reader(), models).document());
    }

    void cylinder(Context context) {
        field(context, FieldRequest.of(context, "cylinder"));
    }

    void ring(Context context) {
        field(context, FieldRequest.of(context, "ring"));
    }

    void block(Context context) {
        field(context, FieldRequest.of(context, "block"));
    }

    private static void field(Context context, FieldRequest request) {
        Position at = new Query(context).position("at");
        LibraryApi.json(context, FieldDocument.at(request.field(), at));
    }
}
