package org.lodestep.resonance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

class RecommendationsTest {

    @Test
    void avoidRangeIsWidenedAndConvertedAndTheCrossingAccelerationFollows() {
        ResonanceBand low = new ResonanceBand(100, 120, 110, 1, 0, 8, 110, BandClass.LOW_SPEED_RESONANCE, 1);
        ResonanceBand mid = new ResonanceBand(700, 760, 730, 1, 0, 6, 35, BandClass.MID_BAND_INSTABILITY, 0);
        AvoidList a = Recommendations.avoidList(List.of(low, mid), new RateUnits(8, 50, 40), 110, 0.03, 5, 0.05);
        AvoidRange r = a.ranges().get(0);
        // Widened 5 % each side: 95 ... 126 full steps/s; ×8 pulses; /200 × 60 rpm; /200 × 40 mm.
        assertEquals(95, r.fromFullStepsPerS(), 1e-9);
        assertEquals(126, r.toFullStepsPerS(), 1e-9);
        assertEquals(1008, r.toPulsesPerS(), 1e-9);
        assertEquals(28.5, r.fromRpm(), 1e-9);
        assertEquals(25.2, r.toMmPerS(), 1e-9);
        // Common practice (no published source): cross 31 full steps/s within 5 periods of 110 Hz → 682 full steps/s².
        assertEquals(31 * 110 / 5.0, r.minAccelerationFullStepsPerS2(), 1e-9);
        assertTrue(r.microsteppingHelps());
        assertFalse(a.ranges().get(1).microsteppingHelps());
        assertTrue(a.notes().get(0).startsWith("Lightly damped"), a.notes().toString());
        assertEquals("lodestep-avoid-list", a.format());
    }
}
