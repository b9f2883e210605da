package org.lodestep.qa;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** The margin of a value to its limits: plain arithmetic on the limits (no outside source needed). */
class LimitTest {
    // the sample spec kv-4218-m.toml: phase resistance 1.90 ohm +- 10 % -> 1.71 .. 2.09 ohm
    static final Limit PHASE = Limit.percent("phase_resistance", "ohm", 1.90, 10);
    static final Limit INSULATION = new Limit("insulation_resistance", "ohm", Double.NaN, 100e6, Double.NaN);

    @Test
    void aValueAboveTheUpperLimitHasANegativeMarginToIt() {
        assertEquals(2.09, PHASE.nearest(2.31), 1e-12);
        assertEquals(-0.22, PHASE.margin(2.31), 1e-12);
        assertEquals(-0.22 / 2.09, PHASE.marginFraction(2.31), 1e-12);
    }

    @Test
    void aValueInsideIsMeasuredAgainstTheNearerLimit() {
        assertEquals(1.71, PHASE.nearest(1.80), 1e-12);
        assertEquals(0.09, PHASE.margin(1.80), 1e-12);
        assertEquals(2.09, PHASE.nearest(2.00), 1e-12);
        assertEquals(0.09, PHASE.margin(2.00), 1e-12);
    }

    @Test
    void aLowerLimitOnlyJudgesEverythingAgainstIt() {
        assertEquals(100e6, INSULATION.nearest(40e6));
        assertEquals(-60e6, INSULATION.margin(40e6), 1e-6);
        assertEquals(-0.6, INSULATION.marginFraction(40e6), 1e-12);
        assertEquals(Double.POSITIVE_INFINITY, INSULATION.margin(Double.POSITIVE_INFINITY));
        assertTrue(Double.isNaN(INSULATION.margin(Double.NaN)));
    }
}
