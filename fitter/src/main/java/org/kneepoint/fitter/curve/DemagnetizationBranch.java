package org.kneepoint.fitter.curve;

import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import java.util.OptionalDouble;
import org.kneepoint.fitter.error.BadInputException;

/**
 * The descending J(H) branch of a curve, ready for evaluation: points sorted by H, repeated
 * readings averaged, noise that breaks the non-decreasing order of J(H) taken out by
 * {@link IsotonicRegression}, then a {@link MonotoneCubicInterpolant} through the result. For a
 * loop, the branch is the longest run of non-increasing H in measurement order.
 *
 * <p>Evaluation never leaves the measured H range; level crossings that the data do not reach
 * are empty.
 */
public final class DemagnetizationBranch {

    private final double[] h;
    private final double[] measuredJ;
    private final double[] monotoneJ;
    private final MonotoneCubicInterpolant interpolant;

    private DemagnetizationBranch(double[] h, double[] measuredJ, double[] weights) {
        this.h = h;
        this.measuredJ = measuredJ;
        this.monotoneJ = IsotonicRegression.fit(measuredJ, weights);
        this.interpolant = new MonotoneCubicInterpolant(h, monotoneJ);
    }

    /** Prepares the branch of a curve; refuses fewer than three distinct H values and conflicting duplicates. */
    public static DemagnetizationBranch of(DemagnetizationCurve curve) {
        double[] allH = curve.h();
        double[] allJ = curve.j();
        int first = 0;
        int end = allH.length;
        if (curve.kind() == CurveKind.LOOP) {
            int[] run = DescendingRun.longest(allH);
            first = run[0];
            end = run[1];
        }
        double[] h = java.util.Arrays.copyOfRange(allH, first, end);
        double[] j = java.util.Arrays.copyOfRange(allJ, first, end);
        return merged(h, j, first, DuplicatePoints.largestMagnitude(allJ));
    }

    private static DemagnetizationBranch merged(double[] h, double[] j, int offset, double scale) {
        int[] order = PointOrder.ascending(h);
        double[] mergedH = new double[h.length];
        double[] mergedJ = new double[h.length];
        double[] weights = new double[h.length];
        int count = 0;
        for (int i = 0; i < order.length; ) {
            int start = i;
            double sum = 0;
            while (i < order.length && h[order[i]] == h[order[start]]) {
                if (DuplicatePoints.conflict(j[order[i]], j[order[start]], scale)) {
                    throw new BadInputException(String.format(
                            "points %d and %d have the same H = %.6g A/m but J = %.6g T and %.6g T (conflicting duplicates)",
                            offset + order[start] + 1, offset + order[i] + 1, h[order[start]], j[order[start]], j[order[i]]));
                }
                sum += j[order[i]];
                i++;
            }
            mergedH[count] = h[order[start]];
            mergedJ[count] = sum / (i - start);
            weights[count] = i - start;
            count++;
        }
        if (count < 3) {
            throw new BadInputException("a curve needs at least 3 points with distinct H, got " + count);
        }
        return new DemagnetizationBranch(java.util.Arrays.copyOf(mergedH, count),
                java.util.Arrays.copyOf(mergedJ, count), java.util.Arrays.copyOf(weights, count));
    }

    public int size() {
        return h.length;
    }

    public double lowestH() {
        return h[0];
    }

    public double highestH() {
        return h[h.length - 1];
    }

    /** J at {@code field}, within the measured range, from the monotone interpolant. */
    public double j(double field) {
        return interpolant.value(field);
    }

    /** B = μ0·H + J at {@code field}. */
    public double b(double field) {
        return MU0 * field + interpolant.value(field);
    }

    /** Lowest J on the branch after the monotone adjustment (at the lowest H). */
    public double lowestJ() {
        return monotoneJ[0];
    }

    /** Lowest B on the branch (at the lowest H). */
    public double lowestB() {
        return MU0 * h[0] + monotoneJ[0];
    }

    /** The H where J first falls to {@code level} coming down from high H, or empty if the data never get there. */
    public OptionalDouble fieldAtJ(double level) {
        return crossing(level, false);
    }

    /** The H where B falls to {@code level}, or empty if the data never get there. */
    public OptionalDouble fieldAtB(double level) {
        return crossing(level, true);
    }

    private OptionalDouble crossing(double level, boolean flux) {
        int last = h.length - 1;
        if (nodeValue(0, flux) > level || nodeValue(last, flux) < level) {
            return OptionalDouble.empty();
        }
        int low = 0;
        int high = last;
        while (high - low > 1) {
            int middle = (low + high) >>> 1;
            if (nodeValue(middle, flux) <= level) {
                low = middle;
            } else {
                high = middle;
            }
        }
        if (nodeValue(high, flux) <= level) {
            return OptionalDouble.of(h[high]);
        }
        double left = h[low];
        double right = h[high];
        for (int iteration = 0; iteration < 200 && right - left > 1e-13 * Math.max(Math.abs(left), Math.abs(right)); iteration++) {
            double middle = 0.5 * (left + right);
            double value = flux ? b(middle) : j(middle);
            if (value <= level) {
                left = middle;
            } else {
                right = middle;
            }
        }
        return OptionalDouble.of(0.5 * (left + right));
    }

    private double nodeValue(int k, boolean flux) {
        return flux ? MU0 * h[k] + monotoneJ[k] : monotoneJ[k];
    }

    /** The merged measured points (H, J) with H in {@code [from, to]}, ascending in H, for fits. */
    public double[][] measuredBetween(double from, double to) {
        int[] range = nodesBetween(from, to);
        return new double[][] {
            java.util.Arrays.copyOfRange(h, range[0], range[1]), java.util.Arrays.copyOfRange(measuredJ, range[0], range[1])};
    }

    /** J of the monotone adjustment (the interpolant's value) at the same points as {@link #measuredBetween}. */
    public double[] monotoneBetween(double from, double to) {
        int[] range = nodesBetween(from, to);
        return java.util.Arrays.copyOfRange(monotoneJ, range[0], range[1]);
    }

    private int[] nodesBetween(double from, double to) {
        int start = 0;
        while (start < h.length && h[start] < from) {
            start++;
        }
        int end = start;
        while (end < h.length && h[end] <= to) {
            end++;
        }
        return new int[] {start, end};
    }
}
