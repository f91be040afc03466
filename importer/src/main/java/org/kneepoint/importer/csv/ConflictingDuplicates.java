package org.kneepoint.importer.csv;

import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import java.util.HashMap;
import java.util.Map;
import org.kneepoint.fitter.curve.DuplicatePoints;
import org.kneepoint.fitter.curve.Quantity;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;

/**
 * Refuses two rows with the same H whose readings contradict each other, naming both lines; the
 * tolerance is the one the characterization uses ({@link DuplicatePoints}).
 */
final class ConflictingDuplicates {

    private ConflictingDuplicates() {
    }

    static void check(String source, PointColumns points, Quantity quantity) {
        double[] h = points.h();
        double[] values = points.values();
        double[] j = new double[h.length];
        for (int i = 0; i < h.length; i++) {
            j[i] = quantity == Quantity.J ? values[i] : values[i] - MU0 * h[i];
        }
        double scale = DuplicatePoints.largestMagnitude(j);
        Map<Double, Integer> first = new HashMap<>();
        for (int i = 0; i < h.length; i++) {
            Integer earlier = first.putIfAbsent(h[i], i);
            if (earlier != null && DuplicatePoints.conflict(j[earlier], j[i], scale)) {
                throw new BadInputException(InputLocation.line(source, points.line(i)), String.format(
                        "H = %.6g A/m again, with %s = %.6g T against %.6g T on line %d (conflicting duplicates)",
                        h[i], quantity, values[i], values[earlier], points.line(earlier)));
            }
        }
    }
}
