package org.lodestep.motor;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class RlStepTest {
    // references §10: V = 2.0 V, R = 2.0 ohm, L = 4.0 mH (Alexander and Sadiku, Fundamentals of Electric
    // Circuits, first-order circuits chapter; "RL circuit" encyclopaedia article).
    private static final double V = 2.0;
    private static final double R = 2.0;
    private static final double L = 4.0e-3;

    @Test
    void timeConstantIsInductanceOverResistance() {
        // item 10: tau = 2.000 ms
        assertEquals(2.000e-3, RlStep.timeConstantS(L, R), 1e-12);
        assertEquals(L, RlStep.inductanceH(2.0e-3, R), 1e-15);
    }

    @Test
    void currentAtOneAndTwoTimeConstantsMatchesPublishedFractions() {
        // item 10: i(tau) = 0.632121 A, i(2 tau) = 0.864665 A (rel 1e-6)
        assertEquals(0.632121, RlStep.currentA(V, R, L, 2.0e-3), 0.632121 * 1e-6);
        assertEquals(0.864665, RlStep.currentA(V, R, L, 4.0e-3), 0.864665 * 1e-6);
        assertEquals(0.0, RlStep.currentA(V, R, L, -1e-3), 0.0);
    }

    @Test
    void timeToHalfAndTenToNinetyRiseMatchPublishedValues() {
        // item 10: t50 = tau ln 2 = 1.386294 ms; 10-90 % rise = tau ln 9 = 4.394449 ms (rel 1e-6)
        assertEquals(1.386294e-3, RlStep.timeToReachS(V, R, L, 0.0, 0.5), 1.386294e-3 * 1e-6);
        assertEquals(4.394449e-3, RlStep.timeToReachS(V, R, L, 0.1, 0.9), 4.394449e-3 * 1e-6);
    }

    @Test
    void finalCurrentIsNeverReached() {
        assertEquals(Double.POSITIVE_INFINITY, RlStep.timeToReachS(V, R, L, 0.0, 1.0));
    }
}
