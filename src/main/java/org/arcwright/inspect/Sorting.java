package org.arcwright.inspect;

import java.util.Arrays;

/** Sorting of point indices by a primitive key, without boxing (a million points sort in place). */
final class Sorting {
    private Sorting() {}

    /** Indices {@code 0..n-1} ordered by ascending {@code key}; already ordered input costs one scan. */
    static int[] order(double[] key, int n) {
        int[] idx = new int[n];
        for (int i = 0; i < n; i++) idx[i] = i;
        boolean sorted = true;
        for (int i = 1; i < n && sorted; i++) if (key[i] < key[i - 1]) sorted = false;
        if (sorted) return idx;
        double[] k = Arrays.copyOf(key, n);
        sort(k, idx, 0, n - 1);
        return idx;
    }

    private static void sort(double[] k, int[] idx, int lo, int hi) {
        while (hi - lo > 16) {
            int mid = (lo + hi) >>> 1;
            double p = median(k[lo], k[mid], k[hi]);
            int i = lo, j = hi;
            while (i <= j) {
                while (k[i] < p) i++;
                while (k[j] > p) j--;
                if (i <= j) {
                    swap(k, idx, i, j);
                    i++;
                    j--;
                }
            }
            if (j - lo < hi - i) {
                sort(k, idx, lo, j);
                lo = i;
            } else {
                sort(k, idx, i, hi);
                hi = j;
            }
        }
        for (int i = lo + 1; i <= hi; i++) {
            for (int j = i; j > lo && k[j] < k[j - 1]; j--) swap(k, idx, j, j - 1);
        }
    }

    private static double median(double a, double b, double c) {
        return Math.max(Math.min(a, b), Math.min(Math.max(a, b), c));
    }

    private static void swap(double[] k, int[] idx, int i, int j) {
        double t = k[i]; k[i] = k[j]; k[j] = t;
        int u = idx[i]; idx[i] = idx[j]; idx[j] = u;
    }
}
