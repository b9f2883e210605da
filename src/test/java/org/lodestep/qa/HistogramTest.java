package org.lodestep.qa;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;

import org.junit.jupiter.api.Test;

class HistogramTest {

    // Sturges (1926), J. Am. Stat. Assoc. 21(153): k = ceil(log2 n) + 1; n = 10 -> 5 bins, n = 100 -> 8 bins.
    @Test
    void binCountFollowsSturges() {
        assertEquals(5, Histogram.of(IndividualsChartTest.X, Double.NaN, Double.NaN).size());
        double[] hundred = new double[100];
        for (int i = 0; i < 100; i++) {
            hundred[i] = i;
        }
        assertEquals(8, Histogram.of(hundred, Double.NaN, Double.NaN).size());
    }

    @Test
    void everyValueLandsInOneBinAndLimitsWidenTheSpan() {
        List<Histogram.Bin> bins = Histogram.of(IndividualsChartTest.X, 1.80, 2.20);
        assertEquals(10, bins.stream().mapToInt(Histogram.Bin::count).sum());
        assertEquals(1.80, bins.get(0).lower(), 1e-12);
        assertEquals(2.20, bins.get(bins.size() - 1).upper(), 1e-12);
        // n = 4 -> 3 bins of width 1 over [1, 4]: [1,2) [2,3) [3,4]; the maximum on the last edge counts in the last.
        List<Histogram.Bin> tight = Histogram.of(new double[] {1, 2, 3, 4}, Double.NaN, Double.NaN);
        assertEquals(List.of(1, 1, 2), tight.stream().map(Histogram.Bin::count).toList());
    }

    @Test
    void constantDataGiveOneBin() {
        List<Histogram.Bin> bins = Histogram.of(new double[] {1.8, 1.8, 1.8}, Double.NaN, Double.NaN);
        assertEquals(1, bins.size());
        assertEquals(3, bins.get(0).count());
    }

    @Test
    void countsEveryValueOnceAndSeparatesOutOfSpec() {
        double[] v = {1.74, 1.95, 2.0, 2.02, 2.05, 2.24, 2.27};
        List<Histogram.Bin> bins = Histogram.of(v, 1.80, 2.20);
        assertEquals(4, bins.stream().mapToInt(Histogram.Bin::insideSpec).sum());
        assertEquals(3, bins.stream().mapToInt(Histogram.Bin::outsideSpec).sum());
        // the values outside sit in the outer bins: 1.74 in the first, 2.24 and 2.27 in the last
        assertEquals(1, bins.get(0).outsideSpec());
        assertEquals(2, bins.get(bins.size() - 1).outsideSpec());
    }

    @Test
    void valuesExactlyAtTheLimitsCountAsInside() {
        List<Histogram.Bin> bins = Histogram.of(new double[] {1.80, 2.00, 2.20}, 1.80, 2.20);
        assertEquals(0, bins.stream().mapToInt(Histogram.Bin::outsideSpec).sum());
        assertEquals(3, bins.stream().mapToInt(Histogram.Bin::count).sum());
    }
}
