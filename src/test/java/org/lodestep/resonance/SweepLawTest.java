package org.lodestep.resonance;

import org.lodestep.sample.SweepShape;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class SweepLawTest {

    @Test
    void linearAndLogLawsPassThroughTheirEndsAndMiddles() {
        // Definitions: linear midpoint is the arithmetic mean, logarithmic midpoint the geometric mean.
        SweepLaw lin = new SweepLaw(SweepShape.LINEAR, 100, 900, 10);
        SweepLaw log = new SweepLaw(SweepShape.LOG, 100, 900, 10);
        assertEquals(500, lin.rateFullStepsPerSAt(5), 1e-9);
        assertEquals(300, log.rateFullStepsPerSAt(5), 1e-9);
        assertEquals(900, log.rateFullStepsPerSAt(10), 1e-9);
        assertEquals(80, lin.accelerationFullStepsPerS2At(3), 1e-12);
        assertTrue(Double.isNaN(lin.rateFullStepsPerSAt(10.5)));
    }

    @Test
    void rejectsASweepThatDoesNotMove() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new SweepLaw(SweepShape.LINEAR, 100, 100, 10));
        assertTrue(e.getMessage().contains("dwell"), e.getMessage());
    }

    @Test
    void stepCountsForABlockAreThoseOfEachSampleBitForBit() {
        // The block form only hoists the sweep's constants: every value must be the per-sample one, NaN outside.
        double rateHz = 51_200;
        for (SweepLaw law : new SweepLaw[] {new SweepLaw(SweepShape.LINEAR, 20, 2000, 3.0),
                new SweepLaw(SweepShape.LOG, 40, 600, 3.0)}) {
            for (long first : new long[] {-5, 0, 1234, 153_590}) {
                double[] out = new double[1000];
                law.fullStepsAt(first, rateHz, out, out.length);
                for (int i = 0; i < out.length; i++) {
                    double expected = law.fullStepsAt((first + i) / rateHz);
                    assertEquals(Double.doubleToRawLongBits(expected), Double.doubleToRawLongBits(out[i]),
                            law + " sample " + (first + i));
                }
            }
        }
    }
}
