package org.kneepoint.server.http;

import io.javalin.http.Context;
import org.kneepoint.fitter.shape.BlockShape;
import org.kneepoint.fitter.shape.CylinderShape;
import org.kneepoint.fitter.shape.MagnetShape;
import org.kneepoint.fitter.shape.RingShape;
import org.kneepoint.fitter.shape.SpheroidShape;
import org.kneepoint.server.app.design.PermeanceDocument;

/**
 * {@code GET /api/permeance/{shape}}: demagnetizing factors Nm, Nf, N0 and the permeance
 * coefficient of each, as {@code kneepoint permeance SHAPE --json} prints them.
 */
final class PermeanceApi {

    void cylinder(Context context) {
        Query query = new Query(context);
        double diameter = query.length("diameter");
        double length = query.length("length");
        Double inner = query.optionalLength("innerDiameter");
        answer(context, query, inner == null ? new CylinderShape(diameter, length) : new RingShape(diameter, inner, length));
    }

    void block(Context context) {
        Query query = new Query(context);
        double width = query.length("width");
        double depth = query.length("depth");
        double thickness = query.length("thickness");
        answer(context, query, new BlockShape(width, depth, thickness));
    }

    void spheroid(Context context) {
        Query query = new Query(context);
        double diameter = query.length("diameter");
        double length = query.length("length");
        answer(context, query, new SpheroidShape(diameter, length));
    }

    private static void answer(Context context, Query query, MagnetShape shape) {
        LibraryApi.json(context, PermeanceDocument.of(PermeanceDocument.seen(shape, query.flag("onSteel"), "onSteel").demagnetizingFactors()));
    }
}
