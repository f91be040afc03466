package org.kneepoint.server.app.elements;

import org.kneepoint.fitter.units.DecimalNumber;

/**
 * A magnetization direction read from "x,y,z": three plain numbers, not all zero (any length; only the direction
 * counts).
 */
public record Direction(double x, double y, double z) {

    /** Along +z: the convention of the field solvers and shapes (docs/design-checks.md). */
    public static final Direction ALONG_Z = new Direction(0, 0, 1);

    public Direction {
        if (!(Double.isFinite(x) && Double.isFinite(y) && Double.isFinite(z)) || x == 0 && y == 0 && z == 0) {
            throw new IllegalArgumentException("expected a direction x,y,z of three numbers, not all zero, such as 0,0,1");
        }
    }

    /** The direction of the text; anything else is an {@link IllegalArgumentException} saying what was expected. */
    public static Direction parse(String text) {
        String[] parts = text.split(",", -1);
        if (parts.length != 3) {
            throw new IllegalArgumentException("expected a direction x,y,z of three numbers such as 0,0,1, got '" + text.strip() + "'");
        }
        double[] values = new double[3];
        for (int i = 0; i < 3; i++) {
            values[i] = parts[i].strip().length() > 40 ? Double.NaN : DecimalNumber.parseOrNaN(parts[i].strip(), false);
            if (Double.isNaN(values[i])) {
                throw new IllegalArgumentException("expected a direction x,y,z of three numbers such as 0,0,1, got '" + text.strip() + "'");
            }
        }
        return new Direction(values[0], values[1], values[2]);
    }
}
