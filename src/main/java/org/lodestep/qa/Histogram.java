package org.lodestep.qa;

import java.util.ArrayList;
import java.util.List;

/**
 * Equal-width histogram with Sturges' bin count, k = ⌈log2 n⌉ + 1 (H. A. Sturges, "The choice of a class
 * interval", J. American Statistical Association 21 (153), 1926, pp. 65-66), spanning the data and any given limits
 * so a reader sees where the lot sits between them.
 */
public final class Histogram {

    /** One bin, [lower, upper) except the last, which includes its upper edge. */
    public record Bin(double lower, double upper, int count) {
    }

    private Histogram() {
    }

    /**
     * @param x      the values
     * @param lsl    lower limit to include in the span, or NaN
     * @param usl    upper limit to include in the span, or NaN
     */
    public static List<Bin> of(double[] x, double lsl, double usl) {
        if (x.length == 0) {
            return List.of();
        }
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (double v : x) {
            lo = Math.min(lo, v);
            hi = Math.max(hi, v);
        }
        if (!Double.isNaN(lsl)) {
            lo = Math.min(lo, lsl);
        }
        if (!Double.isNaN(usl)) {
            hi = Math.max(hi, usl);
        }
        int k = (int) Math.ceil(Math.log(x.length) / Math.log(2)) + 1;
        if (hi <= lo) {
            return List.of(new Bin(lo, hi, x.length));
        }
        double w = (hi - lo) / k;
        int[] counts = new int[k];
        for (double v : x) {
            int i = (int) Math.floor((v - lo) / w);
            counts[Math.min(Math.max(i, 0), k - 1)]++;
        }
        List<Bin> bins = new ArrayList<>();
        for (int i = 0; i < k; i++) {
            bins.add(new Bin(lo + i * w, i == k - 1 ? hi : lo + (i + 1) * w, counts[i]));
        }
        return bins;
    }
}
