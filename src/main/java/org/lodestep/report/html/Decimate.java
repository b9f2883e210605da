package org.lodestep.report.html;

import java.util.Arrays;

/**
 * Thins a long trace for drawing: per horizontal bucket it keeps the first, lowest, highest and last point, so the
 * drawn line keeps every peak and its envelope while the SVG stays small. Used only when a series has far more
 * points than the chart has pixels across.
 */
final class Decimate {
    private Decimate() {
    }

    /**
     * Returns {x, y} thinned to at most about {@code 4 * buckets} points, or the input unchanged when it is short,
     * or when x is not non-decreasing (a trace that doubles back cannot be bucketed by x).
     */
    static double[][] minMax(double[] x, double[] y, int buckets) {
        int n = x.length;
        if (n <= 4 * buckets || buckets < 1) {
            return new double[][] {x, y};
        }
        for (int i = 1; i < n; i++) {
            if (!(x[i] >= x[i - 1])) {
                return new double[][] {x, y};
            }
        }
        double x0 = x[0];
        double span = x[n - 1] - x0;
        if (!(span > 0)) {
            return new double[][] {x, y};
        }
        double[] ox = new double[4 * buckets + 4];
        double[] oy = new double[ox.length];
        int out = 0;
        int i = 0;
        while (i < n) {
            int b = (int) Math.min(buckets - 1, Math.floor((x[i] - x0) / span * buckets));
            int start = i;
            int lo = i;
            int hi = i;
            while (i < n && (int) Math.min(buckets - 1, Math.floor((x[i] - x0) / span * buckets)) == b) {
                if (y[i] < y[lo]) {
                    lo = i;
                }
                if (y[i] > y[hi]) {
                    hi = i;
                }
                i++;
            }
            int end = i - 1;
            int[] keep = {start, Math.min(lo, hi), Math.max(lo, hi), end};
            int last = -1;
            for (int k : keep) {
                if (k != last) {
                    if (out == ox.length) {
                        ox = Arrays.copyOf(ox, ox.length * 2);
                        oy = Arrays.copyOf(oy, oy.length * 2);
                    }
                    ox[out] = x[k];
                    oy[out] = y[k];
                    out++;
                    last = k;
                }
            }
        }
        return new double[][] {Arrays.copyOf(ox, out), Arrays.copyOf(oy, out)};
    }
}
