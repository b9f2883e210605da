package org.lodestep.motor;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class MotorConstantsTest {
    // power balance e·i = T·ω, references §15: "Motor constants" encyclopaedia article (N·m/A = V·s) and the
    // energy-balance
    // derivation cited there; checks rel 1e-5.
    private static final double TOL = 1e-5;

    @Test
    void fiveVoltsPeakAt300RpmIsKe0Point159155() {
        double w = MotorConstants.radPerSFromRpm(300);
        assertEquals(31.4159, w, 31.4159 * TOL);
        double ke = MotorConstants.keFromPeak(5.00, w);
        assertEquals(0.159155, ke, 0.159155 * TOL);
        assertEquals(0.159155, MotorConstants.ktFromKe(ke), 0.159155 * TOL);
        assertEquals(16.6667, MotorConstants.keVPerKrpm(ke), 16.6667 * TOL);
    }

    @Test
    void peakTorqueAtTwoAmpsIs0Point318310() {
        // item 15: I = 2.0 A peak -> T = 0.318310 N·m (ideal, no detent or saturation)
        assertEquals(0.318310, MotorConstants.peakTorqueNm(0.159155, 2.0), 0.318310 * TOL);
    }

    @Test
    void rmsInsteadOfPeakWouldBeOffBySqrtTwo() {
        // item 15: mixing RMS and peak changes K by sqrt 2; the peak convention is the one implemented
        double fromRms = MotorConstants.keFromPeak(5.00 / Math.sqrt(2), MotorConstants.radPerSFromRpm(300));
        assertEquals(Math.sqrt(2), 0.159155 / fromRms, 1e-5);
    }
}
