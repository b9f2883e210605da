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
}
