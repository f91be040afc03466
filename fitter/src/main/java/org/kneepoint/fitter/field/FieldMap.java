package org.kneepoint.fitter.field;

/**
 * B on every point of a {@link FieldGrid}, for field maps and field-line pictures. Filled in one pass
 * into a single array (three doubles per point, row by row in z, column by column in x) with no
 * allocation per point; read through the accessors, which never expose the array.
 */
public final class FieldMap {

    private final FieldGrid grid;
    private final double[] values;

    private FieldMap(FieldGrid grid, double[] values) {
        this.grid = grid;
        this.values = values;
    }

    /** Evaluates the field on every grid point. */
    public static FieldMap of(MagnetField field, FieldGrid grid) {
        double[] values = new double[3 * grid.size()];
        int offset = 0;
        for (int row = 0; row < grid.rows(); row++) {
            double z = grid.z(row);
            for (int column = 0; column < grid.columns(); column++) {
                field.fluxDensityInto(grid.x(column), grid.y(), z, values, offset);
                offset += 3;
            }
        }
        return new FieldMap(grid, values);
    }

    /** The grid. */
    public FieldGrid grid() {
        return grid;
    }

    /** Bx in tesla at (column, row). */
    public double bx(int column, int row) {
        return values[index(column, row)];
    }

    /** By in tesla at (column, row). */
    public double by(int column, int row) {
        return values[index(column, row) + 1];
    }

    /** Bz in tesla at (column, row). */
    public double bz(int column, int row) {
        return values[index(column, row) + 2];
    }

    /** B at (column, row). */
    public FieldVector fluxDensity(int column, int row) {
        int i = index(column, row);
        return new FieldVector(values[i], values[i + 1], values[i + 2]);
    }

    private int index(int column, int row) {
        if (column < 0 || column >= grid.columns() || row < 0 || row >= grid.rows()) {
            throw new IndexOutOfBoundsException("grid point (" + column + ", " + row + ") outside " + grid.columns() + " × " + grid.rows());
        }
        return 3 * (row * grid.columns() + column);
    }
}
