package org.kneepoint.fitter.elements;

import java.util.ArrayList;
import java.util.List;

/**
 * The few elements that fare worst, in one pass: largest loss first, then smallest margin to the knee (an element
 * without a knee margin last among equal losses), then the lower index.
 */
final class WorstElements {

    private WorstElements() {
    }

    static List<WorstElement> of(ElementField positions, double[] loss, double[] hParallel, double[] margin, int count) {
        int[] kept = new int[Math.min(count, loss.length)];
        int size = 0;
        for (int i = 0; i < loss.length; i++) {
            if (size < kept.length) {
                kept[size++] = i;
            } else if (worse(i, kept[size - 1], loss, margin)) {
                kept[size - 1] = i;
            } else {
                continue;
            }
            for (int k = size - 1; k > 0 && worse(kept[k], kept[k - 1], loss, margin); k--) {
                int swap = kept[k];
                kept[k] = kept[k - 1];
                kept[k - 1] = swap;
            }
        }
        List<WorstElement> worst = new ArrayList<>(size);
        for (int k = 0; k < size; k++) {
            int i = kept[k];
            worst.add(new WorstElement(i, positions.position(i, 0), positions.position(i, 1), positions.position(i, 2), hParallel[i],
                    Double.isNaN(margin[i]) ? null : margin[i], loss[i]));
        }
        return worst;
    }

    /** Whether element {@code a} fares worse than {@code b} (a later index never does at equal loss and margin). */
    private static boolean worse(int a, int b, double[] loss, double[] margin) {
        if (loss[a] != loss[b]) {
            return loss[a] > loss[b];
        }
        boolean aKnown = !Double.isNaN(margin[a]);
        boolean bKnown = !Double.isNaN(margin[b]);
        if (aKnown != bKnown) {
            return aKnown;
        }
        if (aKnown && margin[a] != margin[b]) {
            return margin[a] < margin[b];
        }
        return a < b;
    }
}
