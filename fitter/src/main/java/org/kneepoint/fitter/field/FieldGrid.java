package org.kneepoint.fitter.field;

import org.kneepoint.fitter.error.BadInputException;

/**
 * A rectangular grid of points in the plane y = {@code y} (for the usual x–z map through the axis,
 * y = 0): {@code columns} points evenly from xMin to xMax, {@code rows} points from zMin to zMax.
 *
 * @param xMin    first x, m
 * @param xMax    last x, m, greater than xMin
 * @param columns points along x, 2 to 10 000
 * @param zMin    first z, m
 * @param zMax    last z, m, greater than zMin
 * @param rows    points along z, 2 to 10 000
 * @param y       the plane's y, m
 */
public record FieldGrid(double xMin, double xMax, int columns, double zMin, double zMax, int rows, double y) {

    private static final int MAX_POINTS_PER_SIDE = 10_000;

    public FieldGrid {
        span("x", xMin, xMax);
        span("z", zMin, zMax);
        count("columns", columns);
        count("rows", rows);
        if (!Double.isFinite(y)) {
            throw new BadInputException("grid plane y must be a finite coordinate in metres, got " + y);
        }
    }

    /** x of column i. */
    public double x(int column) {
        return xMin + (xMax - xMin) * column / (columns - 1);
    }

    /** z of row j. */
    public double z(int row) {
        return zMin + (zMax - zMin) * row / (rows - 1);
    }

    /** Number of points. */
    public int size() {
        return columns * rows;
    }

    private static void span(String axis, double min, double max) {
        if (!Double.isFinite(min) || !Double.isFinite(max) || !(max > min)) {
            throw new BadInputException("grid " + axis + " range must be finite with max greater than min, got " + min + " to " + max);
        }
    }

    private static void count(String name, int value) {
        if (value < 2 || value > MAX_POINTS_PER_SIDE) {
            throw new BadInputException("grid " + name + " must be between 2 and " + MAX_POINTS_PER_SIDE + ", got " + value);
        }
    }
}
