package org.kneepoint.fitter.curve;

/**
 * Orders curve points by H without boxing: a stable merge sort of an index array, O(n log n),
 * with shortcuts for data that are already ascending or descending (the common case).
 */
final class PointOrder {

    private PointOrder() {
    }

    /** Indices that put {@code key} in ascending order, equal keys keeping their original order. */
    static int[] ascending(double[] key) {
        int n = key.length;
        int[] index = new int[n];
        if (isAscending(key)) {
            for (int i = 0; i < n; i++) {
                index[i] = i;
            }
            return index;
        }
        if (isStrictlyDescending(key)) {
            for (int i = 0; i < n; i++) {
                index[i] = n - 1 - i;
            }
            return index;
        }
        for (int i = 0; i < n; i++) {
            index[i] = i;
        }
        mergeSort(index, new int[n], key, 0, n);
        return index;
    }

    private static boolean isAscending(double[] key) {
        for (int i = 1; i < key.length; i++) {
            if (key[i] < key[i - 1]) {
                return false;
            }
        }
        return true;
    }

    private static boolean isStrictlyDescending(double[] key) {
        for (int i = 1; i < key.length; i++) {
            if (key[i] >= key[i - 1]) {
                return false;
            }
        }
        return true;
    }

    private static void mergeSort(int[] index, int[] scratch, double[] key, int from, int to) {
        if (to - from < 2) {
            return;
        }
        int middle = (from + to) >>> 1;
        mergeSort(index, scratch, key, from, middle);
        mergeSort(index, scratch, key, middle, to);
        if (key[index[middle - 1]] <= key[index[middle]]) {
            return;
        }
        System.arraycopy(index, from, scratch, from, to - from);
        int left = from;
        int right = middle;
        for (int out = from; out < to; out++) {
            if (right >= to || left < middle && key[scratch[left]] <= key[scratch[right]]) {
                index[out] = scratch[left++];
            } else {
                index[out] = scratch[right++];
            }
        }
    }
}
