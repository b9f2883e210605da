package org.lodestep.qa;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

class IndividualsChartTest {

    /** Montgomery, Statistical Quality Control, 7th ed., ch. 6, references §20 data set. */
    static final double[] X = {2.02, 2.05, 1.98, 2.01, 2.04, 2.00, 1.97, 2.03, 2.06, 1.99};

    // Montgomery 7th ed., Appendix VI, n = 2: d2 = 1.128, D4 = 3.267 (table, rounded); exact forms 2/sqrt(pi) and
    // 1 + 3 d3/d2 = 3.266532 (Montgomery, Statistical Quality Control, 7th ed., ch. 6, references §20).
    @Test
    void factorsForSpanTwoMatchTheTable() {
        assertEquals(1.128, IndividualsChart.D2, 5e-4);
        assertEquals(3.267, IndividualsChart.D4, 5e-4);
        assertEquals(3.266532, IndividualsChart.D4, 1e-6);
    }

    // PQ Systems "Individuals and moving range chart formulas" and JMP documentation (Montgomery, Statistical Quality
    // Control, 7th ed., ch. 6, references §20):
    // mean 2.0150, MRbar 0.043333, sigma 0.038416, UCL_X 2.13027, LCL_X 1.89973, UCL_MR 0.14157 (table constants;
    // exact constants differ in the 5th digit, hence rel 1e-3).
    @Test
    void limitsMatchPublishedWorkedExample() {
        IndividualsChart.Limits l = IndividualsChart.of(X);
        assertEquals(2.0150, l.centre(), 1e-9);
        assertEquals(0.043333, l.movingRangeMean(), 1e-6);
        assertEquals(0.038416, l.sigmaWithin(), 0.038416 * 1e-3);
        assertEquals(2.13027, l.upperX(), 2.13027 * 1e-3);
        assertEquals(1.89973, l.lowerX(), 1.89973 * 1e-3);
        assertEquals(0.14157, l.upperMr(), 0.14157 * 1e-3);
        assertTrue(l.outsideX().isEmpty());
        assertTrue(l.outsideMr().isEmpty());
    }

    // A shifted point well beyond centre + 3 sigma is flagged on the X chart, and the jumps to and from it on the
    // MR chart (limits computed from the data with the point included; common practice for a first look).
    @Test
    void pointFarOutsideIsFlagged() {
        double[] x = X.clone();
        double[] longer = new double[30];
        for (int i = 0; i < 30; i++) {
            longer[i] = x[i % 10];
        }
        longer[20] = 2.40;
        IndividualsChart.Limits l = IndividualsChart.of(longer);
        assertEquals(List.of(20), l.outsideX());
        assertEquals(List.of(20, 21), l.outsideMr());
    }

    @Test
    void seriesWithoutVariationHasNoPointOutside() {
        IndividualsChart.Limits l = IndividualsChart.of(new double[] {1.8, 1.8, 1.8, 1.8, 1.8, 1.8, 1.8, 1.8, 1.8, 1.8});
        assertEquals(0.0, l.movingRangeMean());
        assertTrue(l.outsideX().isEmpty());
        assertTrue(l.outsideMr().isEmpty());
    }
}
