package org.lodestep.resonance;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class DampedOscillationTest {

    @Test
    void logDecrementAndDampingRatioMatchTheWorkedExample() {
        // Rao, Mechanical Vibrations, 5th ed., ch. 2 / references §16: x0 = 10, x1 = 7.5 → δ = 0.287682,
        // ζ = 0.0457381, Q = 10.9318 (rel 1e-5).
        double d = DampedOscillation.logDecrement(10, 7.5, 1);
        assertEquals(0.287682, d, 0.287682 * 1e-5);
        assertEquals(0.0457381, DampedOscillation.dampingRatio(d), 0.0457381 * 1e-5);
        assertEquals(10.9318, DampedOscillation.qualityFactor(DampedOscillation.dampingRatio(d)), 10.9318 * 1e-5);
    }

    @Test
    void naturalFrequencyFollowsFromDampedFrequencyAndDamping() {
        // Rao, Mechanical Vibrations, 5th ed., ch. 2, references §16: x0 = 1.0, x5 = 0.25 → δ = 0.277259, ζ =
        // 0.0440842; f_d = 250 Hz → f_n = 250.243 Hz.
        double d = DampedOscillation.logDecrement(1.0, 0.25, 5);
        assertEquals(0.277259, d, 0.277259 * 1e-5);
        double z = DampedOscillation.dampingRatio(d);
        assertEquals(0.0440842, z, 0.0440842 * 1e-5);
        assertEquals(250.243, DampedOscillation.naturalHz(250, z), 250.243 * 1e-5);
    }

    @Test
    void dampingRatioFromDecayRateAgreesWithTheSyntheticCase() {
        // Rao, Mechanical Vibrations, 5th ed., ch. 2, references §16: f_n = 300 Hz, ζ = 0.05 → σ = 94.2478 1/s, f_d =
        // 299.625 Hz.
        double wd = 2 * Math.PI * 299.625;
        assertEquals(0.05, DampedOscillation.dampingRatio(94.2478, wd), 0.05 * 1e-5);
    }
}
