package org.lodestep.report.html;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;

import org.junit.jupiter.api.Test;

class DecimateTest {

    @Test
    void keepsEndpointsAndEveryExtremeOfALongTrace() {
        int n = 100_000;
        double[] x = new double[n];
        double[] y = new double[n];
        java.util.Random rnd = new java.util.Random(3);
        for (int i = 0; i < n; i++) {
            x[i] = i;
            y[i] = rnd.nextGaussian();
        }
        y[43_210] = 9.5; // a lone spike must survive thinning
        double[][] out = Decimate.minMax(x, y, 500);
        assertTrue(out[0].length <= 4 * 500, "kept " + out[0].length);
        assertEquals(0, out[0][0]);
        assertEquals(n - 1, out[0][out[0].length - 1]);
        assertEquals(Arrays.stream(y).max().orElseThrow(), Arrays.stream(out[1]).max().orElseThrow());
        assertEquals(Arrays.stream(y).min().orElseThrow(), Arrays.stream(out[1]).min().orElseThrow());
        for (int i = 1; i < out[0].length; i++) {
            assertTrue(out[0][i] > out[0][i - 1], "x order kept");
        }
    }

    @Test
    void leavesShortOrUnsortedTracesAlone() {
        double[] x = {0, 1, 2};
        double[] y = {1, 2, 3};
        assertSame(x, Decimate.minMax(x, y, 1)[0]);
        double[] bx = new double[100];
        double[] by = new double[100];
        for (int i = 0; i < 100; i++) {
            bx[i] = i % 2 == 0 ? i : -i;
        }
        assertSame(bx, Decimate.minMax(bx, by, 2)[0]);
    }
}
