package org.lodestep.qa;

import java.util.ArrayList;
import java.util.List;

/**
 * Equal-width histogram with Sturges' bin count, k = ⌈log2 n⌉ + 1 (H. A. Sturges, "The choice of a class
 * interval", J. American Statistical Association 21 (153), 1926, pp. 65-66), spanning the data and any given limits
 * so a reader sees where the lot sits between them. The one binning rule of the QA reports: text, JSON and HTML draw
 * these bins, so every rendering of a lot shows the same histogram. A non-negative quantity with a maximum only (phase
 * imbalance) is binned from zero, its natural lower bound, rather than from its smallest value.
 */
public final class Histogram {

    /**
     * One bin, [lower, upper) except the last, which includes its upper edge.
     *
     * @param lower       lower edge
     * @param upper       upper edge
     * @param count       values in the bin
     * @param outsideSpec of them, values below the lower or above the upper limit (a value at a limit is inside)
     */
    public record Bin(double lower, double upper, int count, int outsideSpec) {
        public Bin {
            if (count < 0 || outsideSpec < 0 || outsideSpec > count) {
                throw new IllegalArgumentException("bin counts " + count + " (" + outsideSpec + " outside spec) are"
                        + " impossible");
            }
        }

        /** Values in the bin within the limits. */
        public int insideSpec() {
            return count - outsideSpec;
        }
    }

    private Histogram() {
    }

    /**
     * @param x      the values
     * @param lsl    lower limit to include in the span, or NaN
     * @param usl    upper limit to include in the span, or NaN
     */
    public static List<Bin> of(double[] x, double lsl, double usl) {
        return of(x, lsl, usl, false);
    }

    /**
     * @param x        the values
     * @param lsl      lower limit to include in the span, or NaN
     * @param usl      upper limit to include in the span, or NaN
     * @param fromZero start the span at zero (every value must then be non-negative)
     */
    static List<Bin> of(double[] x, double lsl, double usl, boolean fromZero) {
        if (x.length == 0) {
            return List.of();
        }
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (double v : x) {
            lo = Math.min(lo, v);
            hi = Math.max(hi, v);
        }
        if (fromZero) {
            if (lo < 0) {
                throw new IllegalArgumentException("a histogram from zero needs non-negative values, got " + lo);
            }
            lo = 0;
        }
        if (!Double.isNaN(lsl)) {
            lo = Math.min(lo, lsl);
        }
        if (!Double.isNaN(usl)) {
            hi = Math.max(hi, usl);
        }
        int k = (int) Math.ceil(Math.log(x.length) / Math.log(2)) + 1;
        if (hi <= lo) {
            int out = 0;
            for (double v : x) {
                out += outside(v, lsl, usl) ? 1 : 0;
            }
            return List.of(new Bin(lo, hi, x.length, out));
        }
        double w = (hi - lo) / k;
        int[] counts = new int[k];
        int[] outside = new int[k];
        for (double v : x) {
            int i = Math.min(Math.max((int) Math.floor((v - lo) / w), 0), k - 1);
            counts[i]++;
            outside[i] += outside(v, lsl, usl) ? 1 : 0;
        }
        List<Bin> bins = new ArrayList<>();
        for (int i = 0; i < k; i++) {
            bins.add(new Bin(lo + i * w, i == k - 1 ? hi : lo + (i + 1) * w, counts[i], outside[i]));
        }
        return bins;
    }

    private static boolean outside(double v, double lsl, double usl) {
        return !Double.isNaN(lsl) && v < lsl || !Double.isNaN(usl) && v > usl;
    }
}
