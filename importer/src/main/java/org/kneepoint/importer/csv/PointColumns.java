package org.kneepoint.importer.csv;

import java.util.Arrays;

/** Growable primitive columns of one curve while a file is read: H, value and source line per point. */
final class PointColumns {

    private double[] h = new double[256];
    private double[] values = new double[256];
    private int[] lines = new int[256];
    private int size;

    void add(double field, double value, int line) {
        if (size == h.length) {
            h = Arrays.copyOf(h, size * 2);
            values = Arrays.copyOf(values, size * 2);
            lines = Arrays.copyOf(lines, size * 2);
        }
        h[size] = field;
        values[size] = value;
        lines[size] = line;
        size++;
    }

    int size() {
        return size;
    }

    double[] h() {
        return Arrays.copyOf(h, size);
    }

    double[] values() {
        return Arrays.copyOf(values, size);
    }

    int line(int index) {
        return lines[index];
    }
}
