package org.kneepoint.server.text;

import java.util.ArrayList;
import java.util.List;

/**
 * Numbers for JSON documents: a value that is not finite (an infinite standard error, a NaN
 * correlation of a parameter the data do not determine) is written as {@code null}, never as a
 * non-standard token.
 */
public final class JsonNumbers {

    private JsonNumbers() {
    }

    /** The value, or null when it is NaN or infinite. */
    public static Double finite(double value) {
        return Double.isFinite(value) ? value : null;
    }

    /** A matrix as nested lists, each entry through {@link #finite(double)}. */
    public static List<List<Double>> matrix(double[][] values) {
        List<List<Double>> rows = new ArrayList<>();
        for (double[] row : values) {
            List<Double> entries = new ArrayList<>();
            for (double value : row) {
                entries.add(finite(value));
            }
            rows.add(entries);
        }
        return rows;
    }
}
