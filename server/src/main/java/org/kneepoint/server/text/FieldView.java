package org.kneepoint.server.text;

import org.kneepoint.server.app.wording.EngineeringUnits;
import org.kneepoint.fitter.field.FieldSample;
import org.kneepoint.fitter.field.FieldVector;

/** B at one point as a table; its JSON document is {@code app.design.FieldDocument}. */
public final class FieldView {

    private FieldView() {
    }

    /** A readable table of one point. */
    public static String table(String magnet, double[] at, FieldSample sample, boolean inside) {
        StringBuilder out = new StringBuilder(magnet).append('\n');
        out.append(String.format("  %-8s x = %s, y = %s, z = %s (%s the magnet; origin at its centre, M along +z)%n", "point",
                EngineeringUnits.millimetres(at[0]), EngineeringUnits.millimetres(at[1]), EngineeringUnits.millimetres(at[2]),
                inside ? "inside" : "outside"));
        if (sample.isSingular()) {
            return out.append(String.format("  %-8s not defined: %s%n", "B", sample.singularity())).toString();
        }
        FieldVector b = sample.fluxDensity();
        out.append(String.format("  %-8s Bx = %s, By = %s, Bz = %s, |B| = %s%n", "B", EngineeringUnits.tesla(b.x()),
                EngineeringUnits.tesla(b.y()), EngineeringUnits.tesla(b.z()), EngineeringUnits.tesla(b.magnitude())));
        return out.toString();
    }
}
