package org.kneepoint.fitter.curve;

/**
 * When two points at the same H are the same measurement and when they contradict each other.
 * Readings at one H that differ by less than 1 % of the largest |value| on the curve are taken as
 * repeated readings and averaged; a larger difference is a conflict and is refused. The 1 % bound
 * sits above the noise of a hysteresigraph and below any real feature of a demagnetization curve
 * (common practice, our choice).
 */
public final class DuplicatePoints {

    /** Largest difference between readings at one H, as a fraction of the curve's largest |value|. */
    public static final double TOLERANCE_FRACTION = 0.01;

    private DuplicatePoints() {
    }

    /** True when two readings at the same H contradict each other on a curve of the given scale. */
    public static boolean conflict(double first, double second, double largestMagnitude) {
        return Math.abs(first - second) > TOLERANCE_FRACTION * largestMagnitude;
    }

    /** Largest |value| of a curve, the scale for {@link #conflict}. */
    public static double largestMagnitude(double[] values) {
        double largest = 0;
        for (double value : values) {
            largest = Math.max(largest, Math.abs(value));
        }
        return largest;
    }
}
