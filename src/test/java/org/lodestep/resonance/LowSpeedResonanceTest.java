package org.lodestep.resonance;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;

import org.junit.jupiter.api.Test;

class LowSpeedResonanceTest {

    @Test
    void riskyRatesAreTheNaturalFrequencyAndItsSubMultiples() {
        // Acarnley (2002), section 4.3 / references §12 (from memory): f_n = 306.29 Hz → 306.29, 153.15,
        // 102.10 full steps/s (rel 1e-4).
        List<Double> r = LowSpeedResonance.riskyRatesFullStepsPerS(306.294, 3);
        assertEquals(306.294, r.get(0), 306.294 * 1e-4);
        assertEquals(153.15, r.get(1), 153.15 * 1e-4);
        assertEquals(102.10, r.get(2), 102.10 * 1e-4);
    }

    @Test
    void riskyRateConvertsToRpmForA200StepMotor() {
        // Acarnley, Stepping Motors, 4th ed., sec. 4.3, references §12: 306.29 steps/s ↔ 1.5315 rev/s ↔ 91.89 rpm
        // (200 steps/rev, item 1).
        assertEquals(91.89, RateUnits.defaults().rpm(306.294), 91.89 * 1e-4);
    }
}
