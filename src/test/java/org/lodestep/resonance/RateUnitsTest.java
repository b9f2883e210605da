package org.lodestep.resonance;

import org.lodestep.motor.StepGeometry;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class RateUnitsTest {

    @Test
    void convertsFullStepsToPulsesRpmAndAxisSpeed() {
        // references §1 (Jones, Stepping Motors tutorial; Acarnley ch. 1-2): N_r = 50 → 200 steps/rev;
        // 1/16 microstepping → 3200 pulses/rev.
        RateUnits u = new RateUnits(16, 50, 40.0);
        assertEquals(200, u.fullStepsPerRev());
        RateUnits.Rate r = u.of(200);
        assertEquals(3200, r.pulsesPerS(), 1e-9);
        assertEquals(60, r.rpm(), 1e-9);
        // 1 rev/s on a 40 mm-per-rev belt pulley is 40 mm/s (definition).
        assertEquals(40, r.mmPerS(), 1e-9);
        // Item 14: the full-step rate is 4 × the electrical frequency; 1000 steps/s ↔ 250 Hz.
        assertEquals(250, StepGeometry.electricalHz(1000), 1e-12);
        // Item 1: N_r = 100 → 400 steps/rev.
        assertEquals(400, new RateUnits(1, 100, Double.NaN).fullStepsPerRev());
    }

    @Test
    void axisSpeedIsUnknownWithoutTravel() {
        assertTrue(Double.isNaN(RateUnits.defaults().mmPerS(100)));
    }

    @Test
    void rejectsZeroMicrosteps() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new RateUnits(0, 50, Double.NaN));
        assertEquals("microsteps must be at least 1 pulse per full step, got 0", e.getMessage());
    }
}
