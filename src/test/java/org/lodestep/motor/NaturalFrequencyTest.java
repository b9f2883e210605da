package org.lodestep.motor;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class NaturalFrequencyTest {

    @Test
    void predictsTheRotorNaturalFrequencyFromHoldingTorqueTeethAndInertia() {
        // Acarnley (2002), ch. 4 / references §11 (from memory): T_h = 0.4 N·m, J = 5.4e-6 kg·m², N_r = 50
        // → k = 20 N·m/rad, f_n = 306.294 Hz (rel 1e-4).
        assertEquals(20.0, NaturalFrequency.stiffnessNmPerRad(0.4, 50), 1e-12);
        assertEquals(306.294, NaturalFrequency.naturalHz(0.4, 50, 5.4e-6), 306.294 * 1e-4);
        // Item 11: J doubled → 216.582 Hz; N_r = 100 → 433.165 Hz.
        assertEquals(216.582, NaturalFrequency.naturalHz(0.4, 50, 1.08e-5), 216.582 * 1e-4);
        assertEquals(433.165, NaturalFrequency.naturalHz(0.4, 100, 5.4e-6), 433.165 * 1e-4);
    }

    @Test
    void inverseRecoversTheInertiaFromAMeasuredFrequency() {
        // Item 11 values run backwards: 306.294 Hz with T_h = 0.4 N·m, N_r = 50 → J = 5.4e-6 kg·m² (rel 1e-4).
        assertEquals(5.4e-6, NaturalFrequency.totalInertiaKgm2(306.294, 0.4, 50), 5.4e-6 * 1e-4);
    }

    @Test
    void rejectsZeroInertiaNamingTheUnit() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> NaturalFrequency.naturalHz(0.4, 50, 0));
        assertEquals("inertia must be positive and finite, got 0.0 kg·m²", e.getMessage());
    }
}
