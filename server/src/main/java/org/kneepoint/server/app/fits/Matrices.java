package org.kneepoint.server.app.fits;

import java.util.Arrays;
import java.util.List;

/** Matrices and ranges of the fit documents as lists, so that a value that is not finite is written as null. */
final class Matrices {

    private Matrices() {
    }

    /** The rows of a matrix (a correlation matrix) as lists. */
    static List<List<Double>> rows(double[][] matrix) {
        return Arrays.stream(matrix).map(row -> Arrays.stream(row).boxed().toList()).toList();
    }
}
