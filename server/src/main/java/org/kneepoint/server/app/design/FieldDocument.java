package org.kneepoint.server.app.design;

import com.fasterxml.jackson.annotation.JsonInclude;
import java.util.List;
import org.kneepoint.fitter.field.FieldSample;
import org.kneepoint.fitter.field.FieldVector;
import org.kneepoint.fitter.field.MagnetField;

/**
 * B at one point ({@code kneepoint field --json}, {@code GET /api/field/{shape}}): {@code at} = [x, y, z] in metres and
 * {@code b} = [Bx, By, Bz] in tesla, origin at the magnet's centre, magnetization along +z. At a singular point (a
 * rim, a pole-face edge or corner) {@code b} is null and {@code reason} says why; elsewhere there is no reason key.
 */
public record FieldDocument(List<Double> at, List<Double> b, @JsonInclude(JsonInclude.Include.NON_NULL) String reason) {

    /** The field of {@code field} at the point. */
    public static FieldDocument at(MagnetField field, Position at) {
        FieldSample sample = field.sample(at.x(), at.y(), at.z());
        FieldVector b = sample.fluxDensity();
        return new FieldDocument(List.of(at.x(), at.y(), at.z()), sample.isSingular() ? null : List.of(b.x(), b.y(), b.z()),
                sample.isSingular() ? sample.singularity() : null);
    }
}
