package org.lodestep.qa;

import java.util.ArrayList;
import java.util.List;

/**
 * Individuals and moving-range (I-MR) control chart limits for a series in production order.
 *
 * <p>Source: D. C. Montgomery, <i>Introduction to Statistical Quality Control</i>, 7th ed., Wiley 2013, section 6.4
 * (control charts for individual measurements) and Appendix VI (factors for control charts); ISO 7870-2. Moving
 * range MR_i = |x_i − x_(i−1)| (span 2), σ̂ = MR̄/d2, X chart x̄ ± 3·MR̄/d2, MR chart UCL = D4·MR̄, LCL = 0. The
 * factors for n = 2 are computed exactly (d2 = 2/√π, d3 = √(2 − 4/π), D4 = 1 + 3·d3/d2) rather than taken from the
 * rounded table (1.128, 3.267); the difference is below 0.05 %.
 *
 * <p>The limits are computed on the series' {@link ValueScale}: on ln x for a log scale (centre and X limits
 * transformed back, moving ranges left on ln x), and on the linear scale a lower X limit below zero is clipped at
 * zero for a series that cannot go negative. A series without variation (see {@link #noVariation}) has no limits.
 */
public final class IndividualsChart {

    /** d2 for subgroups of 2: 2/√π = 1.128379. */
    static final double D2 = 2.0 / Math.sqrt(Math.PI);
    /** d3 for subgroups of 2: √(2 − 4/π) = 0.852502. */
    static final double D3_FACTOR = Math.sqrt(2.0 - 4.0 / Math.PI);
    /** D4 for subgroups of 2: 1 + 3·d3/d2 = 3.266532. */
    static final double D4 = 1.0 + 3.0 * D3_FACTOR / D2;

    /**
     * Relative spread below which a series counts as constant: a part in 10⁹ of its value, far below what any bench
     * instrument resolves (a 6½-digit meter resolves about a part in 10⁶ of its range), so a smaller spread can only be
     * floating-point rounding of one value (1.8 and 1.8000000000000003).
     */
    static final double RESOLUTION = 1e-9;

    /**
     * The chart of a series.
     *
     * @param centre       mean of the individuals
     * @param movingRangeMean MR̄
     * @param sigmaWithin  MR̄/d2
     * @param upperX       X-chart upper control limit
     * @param lowerX       X-chart lower control limit
     * @param upperMr      MR-chart upper control limit (its lower limit is 0)
     * @param outsideX     indexes of individuals outside the X limits
     * @param outsideMr    indexes i of moving ranges |x_i − x_(i−1)| above the MR limit
     * @param scale        the scale the limits were computed on; on LOG, centre and X limits are in the values' unit
     *                     (the centre is the geometric mean) and MR̄, σ and the MR limit are on ln x
     * @param computedLowerX the X chart's lower limit as computed, before clipping (in the values' unit)
     * @param clippedAtZero true when the computed lower limit was below zero and {@code lowerX} is its clip at zero
     */
    public record Limits(double centre, double movingRangeMean, double sigmaWithin, double upperX, double lowerX,
                         double upperMr, List<Integer> outsideX, List<Integer> outsideMr, ValueScale scale,
                         double computedLowerX, boolean clippedAtZero) {
        public Limits {
            outsideX = List.copyOf(outsideX);
            outsideMr = List.copyOf(outsideMr);
        }
    }

    private IndividualsChart() {
    }

    /** The moving range of span 2 ending at point {@code i} (1 or more): MR_i = |x_i − x_(i−1)|. */
    static double movingRange(double[] x, int i) {
        return Math.abs(x[i] - x[i - 1]);
    }

    /** Every moving range of {@code x}: element i−1 is MR_i, so there is one fewer than there are points. */
    static double[] movingRanges(double[] x) {
        double[] mr = new double[Math.max(0, x.length - 1)];
        for (int i = 1; i < x.length; i++) {
            mr[i - 1] = movingRange(x, i);
        }
        return mr;
    }

    /** Limits for {@code x} in production order on the linear scale; see {@link #of(double[], ValueScale)}. */
    static Limits of(double[] x) {
        return of(x, ValueScale.LINEAR);
    }

    /**
     * True when the series does not vary: every value equal, or a spread below {@link #RESOLUTION} of the largest
     * magnitude. Such a series has no control limits (σ̂ would be zero or rounding noise).
     */
    static boolean noVariation(double[] x) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (double v : x) {
            lo = Math.min(lo, v);
            hi = Math.max(hi, v);
        }
        return x.length > 0 && hi - lo <= RESOLUTION * Math.max(Math.abs(lo), Math.abs(hi));
    }

    /**
     * Limits for {@code x} in production order on {@code scale}; needs at least two values that vary (else every
     * limit is NaN and the centre is the mean).
     */
    static Limits of(double[] x, ValueScale scale) {
        int n = x.length;
        if (n < 2 || noVariation(x)) {
            double mean = 0;
            for (double v : x) {
                mean += v / n;
            }
            return new Limits(n == 0 ? Double.NaN : n == 1 ? x[0] : mean, n < 2 ? Double.NaN : 0, n < 2 ? Double.NaN : 0,
                    Double.NaN, Double.NaN, Double.NaN, List.of(), List.of(), scale, Double.NaN, false);
        }
        double[] y = scale.transform(x);
        double sum = 0;
        double mrSum = 0;
        boolean nonNegative = true;
        for (int i = 0; i < n; i++) {
            sum += y[i];
            nonNegative &= x[i] >= 0;
            if (i > 0) {
                mrSum += movingRange(y, i);
            }
        }
        double centre = sum / n;
        double mrBar = mrSum / (n - 1);
        double sigma = mrBar / D2;
        double ucl = centre + 3 * sigma;
        double lcl = centre - 3 * sigma;
        double uclMr = D4 * mrBar;
        List<Integer> outX = new ArrayList<>();
        List<Integer> outMr = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            if (y[i] > ucl || y[i] < lcl) {
                outX.add(i);
            }
            if (i > 0 && movingRange(y, i) > uclMr) {
                outMr.add(i);
            }
        }
        double lclComputed = scale.back(lcl);
        boolean clip = scale == ValueScale.LINEAR && nonNegative && lcl < 0;
        return new Limits(scale.back(centre), mrBar, sigma, scale.back(ucl), clip ? 0 : lclComputed, uclMr, outX, outMr,
                scale, lclComputed, clip);
    }
}
