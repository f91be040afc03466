package org.kneepoint.fitter.elements;

import java.util.Arrays;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;

/**
 * One load case of a field solver's result: per element its position, the field vector (H or B, {@link GivenField}),
 * its volume and, when the solver gives them, its magnetization direction and temperature. Held column by column in
 * primitive arrays, so that a million elements cost a few arrays rather than a million objects; built once with a
 * {@link Builder} and never changed after, so the arrays are shared, not copied.
 */
public final class ElementField {

    private final String source;
    private final GivenField given;
    private final int count;
    private final int[] lines;
    private final double[][] columns;
    private final boolean directions;
    private final boolean temperatures;

    private ElementField(Builder builder) {
        this.source = builder.source;
        this.given = builder.given;
        this.count = builder.count;
        this.lines = builder.lines;
        this.columns = builder.columns;
        this.directions = builder.directions;
        this.temperatures = builder.temperatures;
    }

    /** A builder of a table read from {@code source} (a file name, for messages). */
    public static Builder builder(String source, GivenField given, boolean directions, boolean temperatures) {
        return new Builder(source, given, directions, temperatures);
    }

    /** The file or request the table came from, as messages name it. */
    public String source() {
        return source;
    }

    /** Whether the rows give H or B. */
    public GivenField given() {
        return given;
    }

    /** Number of elements. */
    public int size() {
        return count;
    }

    /** The line of the source element {@code i} came from (0 when it was not read from a file). */
    public int line(int i) {
        return lines[i];
    }

    /** Where element {@code i} came from, for messages. */
    public InputLocation location(int i) {
        return lines[i] > 0 ? InputLocation.line(source, lines[i]) : InputLocation.of(source + ", element " + (i + 1));
    }

    /** Whether every element carries its own magnetization direction. */
    public boolean hasDirections() {
        return directions;
    }

    /** Whether every element carries its own temperature. */
    public boolean hasTemperatures() {
        return temperatures;
    }

    /** Position x, y or z ({@code axis} 0, 1, 2) of element {@code i}, m. */
    public double position(int i, int axis) {
        return columns[axis][i];
    }

    /** Field component {@code axis} (0, 1, 2) of element {@code i}: A/m for H, T for B. */
    public double field(int i, int axis) {
        return columns[3 + axis][i];
    }

    /** Volume of element {@code i}, m³. */
    public double volume(int i) {
        return columns[6][i];
    }

    /** Component {@code axis} of the magnetization direction of element {@code i}, a unit vector; only with {@link #hasDirections()}. */
    public double direction(int i, int axis) {
        return columns[7 + axis][i];
    }

    /** Temperature of element {@code i}, K; only with {@link #hasTemperatures()}. */
    public double temperature(int i) {
        return columns[10][i];
    }

    /** Collects the rows of one table into growing primitive arrays. */
    public static final class Builder {
        private static final int COLUMNS = 11;
        private final String source;
        private final GivenField given;
        private final boolean directions;
        private final boolean temperatures;
        private int count;
        private int[] lines = new int[1024];
        private double[][] columns = new double[COLUMNS][1024];

        private Builder(String source, GivenField given, boolean directions, boolean temperatures) {
            if (source == null || source.isBlank() || given == null) {
                throw new IllegalArgumentException("an element table needs a source name and the field it gives");
            }
            this.source = source;
            this.given = given;
            this.directions = directions;
            this.temperatures = temperatures;
        }

        /**
         * Adds an element read from {@code line} (0 when not from a file). The direction need not be of unit length
         * (it is normalized here) and is ignored, like the temperature, when the table does not carry them.
         */
        public Builder add(int line, double x, double y, double z, double fx, double fy, double fz, double volume, double mx,
                double my, double mz, double temperature) {
            if (lines == null) {
                throw new IllegalStateException("this table is built already");
            }
            InputLocation at = line > 0 ? InputLocation.line(source, line) : InputLocation.of(source + ", element " + (count + 1));
            if (!(volume > 0.0) || !Double.isFinite(volume)) {
                throw new BadInputException(at, "an element's volume must be positive, got " + volume + " m³");
            }
            double length = Math.sqrt(mx * mx + my * my + mz * mz);
            if (directions && !(length > 0.0 && Double.isFinite(length))) {
                throw new BadInputException(at, "the magnetization direction (mx, my, mz) must not be zero");
            }
            if (temperatures && !(temperature > 0.0 && Double.isFinite(temperature))) {
                throw new BadInputException(at, "the temperature must be above absolute zero, got " + temperature + " K");
            }
            if (count == lines.length) {
                int grown = count * 2;
                lines = Arrays.copyOf(lines, grown);
                for (int c = 0; c < COLUMNS; c++) {
                    columns[c] = Arrays.copyOf(columns[c], grown);
                }
            }
            double[] row = {x, y, z, fx, fy, fz, volume, directions ? mx / length : 0, directions ? my / length : 0,
                directions ? mz / length : 0, temperature};
            for (int c = 0; c < COLUMNS; c++) {
                columns[c][count] = row[c];
            }
            lines[count++] = line;
            return this;
        }

        /** The table; a table without elements is bad input. */
        public ElementField build() {
            if (lines == null) {
                throw new IllegalStateException("this table is built already");
            }
            if (count == 0) {
                throw new BadInputException(InputLocation.of(source), "the table holds no elements");
            }
            ElementField table = new ElementField(this);
            lines = null;
            columns = null;
            return table;
        }
    }
}
