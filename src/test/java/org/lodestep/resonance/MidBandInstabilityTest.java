package org.lodestep.resonance;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class MidBandInstabilityTest {

    @Test
    void centreIsWhereTheElectricalAngularFrequencyEqualsROverL() {
        // Acarnley (2002), section 5.5 / references §13: R = 2.0 Ω, L = 4.0 mH → 500 rad/s → 79.5775 Hz
        // → 318.310 full steps/s (rel 1e-5).
        assertEquals(318.310, MidBandInstability.centreFullStepsPerS(2.0, 4.0e-3), 318.310 * 1e-5);
        // Item 13: 318.310 full steps/s on a 200-step motor is 1.59155 rev/s.
        assertEquals(1.59155 * 60, RateUnits.defaults().rpm(318.310), 1e-3);
    }
}
