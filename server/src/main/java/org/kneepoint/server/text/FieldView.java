package org.kneepoint.server.text;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.kneepoint.fitter.field.FieldVector;

/**
 * B at one point as JSON ({@code at: [x, y, z]} in metres, {@code b: [bx, by, bz]} in tesla; origin
 * at the magnet's centre, magnetization along +z) and as a table.
 */
public final class FieldView {

    private FieldView() {
    }

    /** The JSON object of one point. */
    public static Map<String, Object> json(double[] at, FieldVector b) {
        Map<String, Object> json = new LinkedHashMap<>();
        json.put("at", List.of(at[0], at[1], at[2]));
        json.put("b", List.of(b.x(), b.y(), b.z()));
        return json;
    }

    /** A readable table of one point. */
    public static String table(String magnet, double[] at, FieldVector b, boolean inside) {
        StringBuilder out = new StringBuilder(magnet).append('\n');
        out.append(String.format("  %-8s x = %s, y = %s, z = %s (%s the magnet; origin at its centre, M along +z)%n", "point",
                EngineeringUnits.millimetres(at[0]), EngineeringUnits.millimetres(at[1]), EngineeringUnits.millimetres(at[2]),
                inside ? "inside" : "outside"));
        out.append(String.format("  %-8s Bx = %s, By = %s, Bz = %s, |B| = %s%n", "B", EngineeringUnits.tesla(b.x()),
                EngineeringUnits.tesla(b.y()), EngineeringUnits.tesla(b.z()), EngineeringUnits.tesla(b.magnitude())));
        return out.toString();
    }
}
