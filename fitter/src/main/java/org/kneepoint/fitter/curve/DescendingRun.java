package org.kneepoint.fitter.curve;

/** Finds the descending branch of a loop: the longest run of non-increasing H in measurement order. */
final class DescendingRun {

    private DescendingRun() {
    }

    /** {@code {first, end}}: the run is {@code h[first..end)}. */
    static int[] longest(double[] h) {
        int bestStart = 0;
        int bestEnd = Math.min(1, h.length);
        int start = 0;
        for (int i = 1; i <= h.length; i++) {
            if (i == h.length || h[i] > h[i - 1]) {
                if (i - start > bestEnd - bestStart) {
                    bestStart = start;
                    bestEnd = i;
                }
                start = i;
            }
        }
        return new int[] {bestStart, bestEnd};
    }
}
