package org.lodestep.resonance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class StepPulseRateTest {

    @Test
    void countsRisingEdgesOnceDespiteRingingAndDividesByMicrosteps() {
        // 1600 pulses/s at 8 microsteps is 200 full steps/s (definition of the microstep setting).
        double fs = 100_000;
        double[] x = new double[(int) fs];
        for (int i = 0; i < x.length; i++) {
            double phase = i / fs * 1600;
            double frac = phase - Math.floor(phase);
            // Ringing on the rising edge: a dip to 2.4 V just after the edge must not count twice.
            x[i] = frac < 0.5 ? (frac < 0.02 ? 2.4 + 2.6 * (i % 2) : 5.0) : 0.0;
        }
        StepPulseRate r = new StepPulseRate(fs, 8, 2.0, 3.0);
        r.feed(x, 0, x.length);
        assertEquals(200, r.rateFullStepsPerS(0.1, 0.3), 0.5);
        assertEquals(200, r.rateFullStepsPerS(0.5, 0.9), 0.5);
        assertTrue(Double.isNaN(r.rateFullStepsPerS(0.95, 0.9505)));
    }
}
