package org.lodestep.motor;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class BackEmfCurrentLimitTest {
    @Test
    void withoutBackEmfItIsTheReversalLimit() {
        // Alexander & Sadiku, first-order circuits: t = tau·ln((V+RI)/(V-RI)) = 2 ms·ln(26/22) -> f = 2/t
        double expected = 2 / (2e-3 * Math.log(26.0 / 22.0));
        assertEquals(expected, BackEmfCurrentLimit.rateFullStepsPerS(24, 2, 4e-3, 1, 0, 200), expected * 1e-6);
    }

    @Test
    void satisfiesTheReversalEquationWithTheEmfAtThatRate() {
        // the rate returned makes 2/f equal the reversal time with V - E, E = Ke·2π·f/200 (the model, solved here)
        double ke = 0.1;
        double f = BackEmfCurrentLimit.rateFullStepsPerS(24, 2, 4e-3, 1, ke, 200);
        double e = ke * 2 * Math.PI * f / 200;
        double t = 2e-3 * Math.log((24 - e + 2) / (24 - e - 2));
        assertEquals(2 / f, t, t * 1e-6);
        assertTrue(f < BackEmfCurrentLimit.rateFullStepsPerS(24, 2, 4e-3, 1, 0, 200));
    }

    @Test
    void neverExceedsTheRateWhereTheEmfAloneUsesUpTheSupply() {
        // An 8-lead motor in parallel at 33.6 V (issue figures): low inductance, Ke 0.26 V·s/rad per phase; the EMF
        // ceiling is (V - R·I)·200/(2π·Ke)
        double ke = 0.26;
        double f = BackEmfCurrentLimit.rateFullStepsPerS(33.6, 0.6, 0.8e-3, 2.8, ke, 200);
        assertTrue(f <= (33.6 - 0.6 * 2.8) * 200 / (2 * Math.PI * ke) + 1e-9, String.valueOf(f));
        assertTrue(f < DriveLimits.fullCurrentRateFullStepsPerS(33.6, 0.6, 0.8e-3, 2.8));
    }

    @Test
    void noCurrentWhenTheSupplyCannotDriveTheResistance() {
        assertEquals(0.0, BackEmfCurrentLimit.rateFullStepsPerS(1.5, 2, 4e-3, 1, 0.1, 200));
    }
}
