package org.kneepoint.server.http;

import io.javalin.http.Context;
import org.kneepoint.db.Library;
import org.kneepoint.server.app.OneOrMany;
import org.kneepoint.server.app.fits.LibraryFits;

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
        LibraryApi.json(context, OneOrMany.of(LibraryFits.knee(library.reader(), grade, temperature)));
    }

    void temperature(Context context) {
        String grade = new Query(context).required("grade", "DEMO NdFeB 42/100");
        LibraryApi.json(context, LibraryFits.temperature(library.reader(), grade));
    }

    void curieWeiss(Context context) {
        String material = new Query(context).required("material", "DEMO copper-like metal");
        LibraryApi.json(context, LibraryFits.curieWeiss(library.reader(), material));
    }
}
