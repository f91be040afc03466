package org.kneepoint.server.app.elements;

import java.util.Locale;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.importer.input.Excerpt;

/** The plane an element map is projected onto: its horizontal and vertical axis (0 = x, 1 = y, 2 = z). */
public enum MapPlane {
    XY(0, 1), XZ(0, 2), YZ(1, 2);

    private static final String AXES = "xyz";

    private final int horizontal;
    private final int vertical;

    MapPlane(int horizontal, int vertical) {
        this.horizontal = horizontal;
        this.vertical = vertical;
    }

    /** The axis drawn across, 0 to 2. */
    public int horizontal() {
        return horizontal;
    }

    /** The axis drawn upwards, 0 to 2. */
    public int vertical() {
        return vertical;
    }

    /** The axis left out, 0 to 2. */
    public int across() {
        return 3 - horizontal - vertical;
    }

    /** The name of an axis: x, y or z. */
    public static String axis(int axis) {
        return String.valueOf(AXES.charAt(axis));
    }

    /** The plane's name: xy, xz or yz. */
    public String label() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** The plane named {@code text} (xy, xz or yz; null or blank: xy); anything else is bad input at {@code where}. */
    public static MapPlane named(String text, String where) {
        if (text == null || text.isBlank()) {
            return XY;
        }
        for (MapPlane plane : values()) {
            if (plane.label().equals(text.strip())) {
                return plane;
            }
        }
        throw new BadInputException(InputLocation.of(where), "expected one of xy, xz, yz, got '" + Excerpt.of(text.strip()) + "'");
    }
}
