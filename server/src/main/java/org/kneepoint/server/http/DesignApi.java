package org.kneepoint.server.http;

import io.javalin.http.Context;
import org.kneepoint.db.Library;
import org.kneepoint.server.http.DesignRequests.CheckRun;
import org.kneepoint.server.http.DesignRequests.SelectionRun;
import org.kneepoint.server.library.Position;
import org.kneepoint.server.text.CheckView;
import org.kneepoint.server.text.FieldView;
import org.kneepoint.server.text.SelectionView;

/**
 * The design routes: {@code /api/check}, {@code /api/duty}, {@code /api/select} and {@code /api/field/{shape}},
 * answering what {@code kneepoint check}, {@code duty}, {@code select} and {@code field} print with {@code --json}.
 */
final class DesignApi {

    private final Library library;

    DesignApi(Library library) {
        this.library = library;
    }

    void check(Context context) {
        CheckRun run = DesignRequests.check(context, library.reader());
        LibraryApi.json(context, CheckView.json(run.result(), run.extrapolated()));
    }

    void duty(Context context) {
        DesignRequests.DutyRun run = DesignRequests.duty(context, library.reader());
        LibraryApi.json(context, org.kneepoint.server.text.DutyView.json(run.pc(), run.results(), run.extrapolated()));
    }

    void select(Context context) {
        SelectionRun run = DesignRequests.select(context, library.reader());
        LibraryApi.json(context, SelectionView.json(run.rows(), run.requirements()));
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
        LibraryApi.json(context, FieldView.json(at.toArray(), request.field().fluxDensity(at.x(), at.y(), at.z())));
    }
}
