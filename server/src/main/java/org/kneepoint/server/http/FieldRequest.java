package org.kneepoint.server.http;

import io.javalin.http.Context;
import java.util.Locale;
import org.kneepoint.fitter.field.MagnetField;
import org.kneepoint.fitter.shape.BlockShape;
import org.kneepoint.fitter.shape.CylinderShape;
import org.kneepoint.fitter.shape.MagnetShape;
import org.kneepoint.fitter.shape.RingShape;
import org.kneepoint.fitter.units.Dimension;
import org.kneepoint.server.app.wording.Lengths;

/**
 * A magnet and its field read from a request: the sizes of a cylinder, ring or block and {@code br}, with the
 * parameter names of {@code GET /api/field/{shape}}; shared by those routes and the Field page.
 *
 * @param shape the magnet
 * @param field its field, magnetization along +z
 */
public record FieldRequest(MagnetShape shape, MagnetField field) {

    /** The shapes a request may name. */
    public static final String[] SHAPES = {"cylinder", "ring", "block"};

    /** The magnet named by the query parameter {@code shape}, with its sizes and br. */
    public static FieldRequest of(Context context) {
        Query query = new Query(context);
        query.required("shape", "cylinder");
        return of(context, query.choice("shape", SHAPES[0], SHAPES));
    }

    /** The magnet of the given shape (cylinder, ring or block), with its sizes and br from the query. */
    static FieldRequest of(Context context, String shape) {
        Query query = new Query(context);
        MagnetShape magnet = switch (shape) {
            case "cylinder" -> new CylinderShape(query.length("diameter"), query.length("length"));
            case "ring" -> new RingShape(query.length("diameter"), query.length("innerDiameter"), query.length("length"));
            default -> new BlockShape(query.length("width"), query.length("depth"), query.length("thickness"));
        };
        return new FieldRequest(magnet, MagnetField.of(magnet, query.quantity("br", Dimension.FLUX_DENSITY, "1.3T")));
    }

    /** The magnet in one line: its shape, sizes in millimetres and Br. */
    public String describe() {
        String sizes;
        if (shape instanceof CylinderShape cylinder) {
            sizes = "cylinder D = " + Lengths.mm(cylinder.diameter()) + ", L = " + Lengths.mm(cylinder.length());
        } else if (shape instanceof RingShape ring) {
            sizes = "ring D = " + Lengths.mm(ring.outerDiameter()) + ", Di = " + Lengths.mm(ring.innerDiameter()) + ", L = "
                    + Lengths.mm(ring.length());
        } else {
            BlockShape block = (BlockShape) shape;
            sizes = "block " + Lengths.mm(block.width()) + " × " + Lengths.mm(block.depth()) + " × " + Lengths.mm(block.thickness());
        }
        return sizes + String.format(Locale.ROOT, ", Br = %.3f T", field.remanence());
    }
}
