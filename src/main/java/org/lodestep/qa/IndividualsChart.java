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
 */
public final class IndividualsChart {

    /** d2 for subgroups of 2: 2/√π = 1.128379. */
    static final double D2 = 2.0 / Math.sqrt(Math.PI);
    /** d3 for subgroups of 2: √(2 − 4/π) = 0.852502. */
    static final double D3_FACTOR = Math.sqrt(2.0 - 4.0 / Math.PI);
    /** D4 for subgroups of 2: 1 + 3·d3/d2 = 3.266532. */
    static final double D4 = 1.0 + 3.0 * D3_FACTOR / D2;

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
     */
    public record Limits(double centre, double movingRangeMean, double sigmaWithin, double upperX, double lowerX,
                         double upperMr, List<Integer> outsideX, List<Integer> outsideMr) {
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

    /** Limits for {@code x} in production order; needs at least two values (else every figure is NaN). */
    static Limits of(double[] x) {
        int n = x.length;
        if (n < 2) {
            return new Limits(n == 1 ? x[0] : Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN,
                    List.of(), List.of());
        }
        double sum = 0;
        double mrSum = 0;
        for (int i = 0; i < n; i++) {
            sum += x[i];
            if (i > 0) {
                mrSum += movingRange(x, i);
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
        // No variation at all (a discrete value such as a step angle): the limits collapse onto the centre and no point
        // is out of control, whatever the last bit of rounding in the mean says.
        for (int i = 0; mrBar > 0 && i < n; i++) {
            if (x[i] > ucl || x[i] < lcl) {
                outX.add(i);
            }
            if (i > 0 && movingRange(x, i) > uclMr) {
                outMr.add(i);
            }
        }
        return new Limits(centre, mrBar, sigma, ucl, lcl, uclMr, outX, outMr);
    }
}
