package org.lodestep.motor;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class DriveLimitsTest {

    @Test
    void fullCurrentRateFollowsReversalTime() {
        // Derived from Alexander and Sadiku, Fundamentals of Electric Circuits, first-order circuits, references §10
        // (first-order RL response): R = 2 ohm, L = 4 mH, V = 24 V, I = 1 A;
        // reversal -1 A -> +1 A takes tau·ln((24 + 2)/(24 - 2)) = 2 ms x 0.167054 = 0.334108 ms; two full steps per
        // reversal -> 5986.1 full steps/s. Computed by hand from the published formula.
        assertEquals(5986.1, DriveLimits.fullCurrentRateFullStepsPerS(24, 2.0, 4.0e-3, 1.0), 0.1);
    }

    @Test
    void rateApproachesVoverLIWhenResistanceIsSmall() {
        // As R -> 0 the reversal time tends to 2·L·I/V (item 10 linearised), so the rate tends to V/(L·I).
        assertEquals(24 / (4.0e-3 * 1.0), DriveLimits.fullCurrentRateFullStepsPerS(24, 1e-6, 4.0e-3, 1.0), 1e-3);
    }

    @Test
    void supplyTooLowForCurrentGivesZeroRate() {
        assertEquals(0.0, DriveLimits.fullCurrentRateFullStepsPerS(1.5, 2.0, 4.0e-3, 1.0));
    }

    @Test
    void supplyRuleAndCurrentRange() {
        // common practice (no published source): V = 32·sqrt(L/mH); 8 mH -> 90.51 V
        assertEquals(90.5097, DriveLimits.suggestedSupplyV(8.0e-3), 1e-3);
        // P = I²R: 2 W in 2.0 ohm -> 1.000 A
        assertEquals(1.0, DriveLimits.currentForLossA(2.0, 2.0), 1e-12);
    }
}
