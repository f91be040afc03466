package org.kneepoint.fitter.field;

import java.util.List;

/**
 * One traced field line in the plane of a {@link FieldGrid}: its points in order and why the tracing stopped.
 *
 * @param points the points, the seed first; x and z in metres
 * @param ending why the line ends
 */
public record FieldLine(List<Point> points, Ending ending) {

    public FieldLine {
        points = List.copyOf(points);
    }

    /** A point of the line in the grid's plane, metres. */
    public record Point(double x, double z) {
    }

    /** Why a line ends. */
    public enum Ending {
        /** it left the grid's rectangle */
        BORDER,
        /** it entered the magnet material (for a line from the north face: through the south face or the side) */
        MAGNET,
        /** it took the greatest number of steps allowed */
        STEPS,
        /** B in the plane vanished or was not finite (on an edge) */
        NO_FIELD
    }
}
