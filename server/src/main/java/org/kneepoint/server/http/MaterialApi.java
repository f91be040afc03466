package org.kneepoint.server.http;

import io.javalin.http.Context;
import org.kneepoint.db.Library;
import org.kneepoint.server.app.fits.StoredFits;
import org.kneepoint.server.app.grades.Materials;

/**
 * The weakly magnetic materials and the stored fits: {@code /api/materials} (each material with its number of
 * susceptibility points and their temperatures), {@code /api/materials/{name}} (its points, SI) and
 * {@code /api/fits} (every stored fit, by time).
 */
final class MaterialApi {

    private final Library library;

    MaterialApi(Library library) {
        this.library = library;
    }

    void materials(Context context) {
        LibraryApi.json(context, Materials.list(library.reader()));
    }

    void material(Context context) {
        LibraryApi.json(context, Materials.detail(library.reader(), context.pathParam("name")));
    }

    void fits(Context context) {
        LibraryApi.json(context, StoredFits.list(library.reader()));
    }
}
