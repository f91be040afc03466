package org.kneepoint.server.app.design;

import org.kneepoint.fitter.units.Dimension;
import org.kneepoint.fitter.units.QuantityParser;

/**
 * A point in metres, read from "x,y,z": each coordinate may carry its own length unit, and a unit after the last
 * number applies to the coordinates that have none ("2,0,3mm" is 2 mm, 0 mm, 3 mm).
 */
public record Position(double x, double y, double z) {

    /** The point of the text; anything else is an {@link IllegalArgumentException} saying what was expected. */
    public static Position parse(String text) {
        String[] parts = text.split(",", -1);
        if (parts.length != 3) {
            throw new IllegalArgumentException("expected a point x,y,z with a length unit such as 2,0,3mm, got '" + text.strip() + "'");
        }
        String last = parts[2].strip();
        int unitStart = last.length();
        while (unitStart > 0 && !Character.isDigit(last.charAt(unitStart - 1)) && last.charAt(unitStart - 1) != '.') {
            unitStart--;
        }
        String unit = last.substring(unitStart).strip();
        if (unit.isEmpty()) {
            throw new IllegalArgumentException("expected a point x,y,z with a length unit such as 2,0,3mm, got '" + text.strip()
                    + "' (no unit)");
        }
        double[] point = new double[3];
        for (int i = 0; i < 3; i++) {
            String part = parts[i].strip();
            boolean bare = !part.isEmpty() && (Character.isDigit(part.charAt(part.length() - 1)) || part.endsWith("."));
            point[i] = QuantityParser.parse(bare ? part + unit : part, Dimension.LENGTH);
        }
        return new Position(point[0], point[1], point[2]);
    }

    /** The coordinates as an array {x, y, z}. */
    public double[] toArray() {
        return new double[] {x, y, z};
    }
}
