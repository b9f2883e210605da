package org.lodestep.workflow;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.lodestep.resonance.Prediction;

class ResonancePredictTest {

    @Test
    void forwardAndInverseMatchTheTextbookFormula() {
        // f_n = (1/2π)·√(N_r·T_h/J) (P. P. Acarnley, Stepping Motors, 4th ed., IEE 2002, ch. 4; values from memory):
        // 0.4 N·m, 5.4e-6 kg·m², N_r 50 → 306.294 Hz; sub-multiple f_n/2 = 153.15 full steps/s (section 4.3).
        Prediction p = ResonancePredict.run(new ResonancePredict.Settings(0.4, 5.4e-6, 0, 50, Double.NaN, 1,
                Double.NaN, Double.NaN, Double.NaN)).prediction();
        assertEquals(306.294, p.naturalFrequencyHz(), 306.294 * 1e-4);
        assertEquals(153.15, p.riskyRates().get(1).fullStepsPerS(), 153.15 * 1e-4);
        // backwards: 216.582 Hz with 0.4 N·m and N_r 50 → J = 1.08e-5 kg·m², load 5.4e-6 beside the 5.4e-6 rotor
        Prediction inv = ResonancePredict.run(new ResonancePredict.Settings(0.4, 5.4e-6, 0, 50, 216.582, 1,
                Double.NaN, Double.NaN, Double.NaN)).prediction();
        assertEquals(1.08e-5, inv.totalInertiaKgm2(), 1.08e-5 * 1e-4);
        assertEquals(5.4e-6, inv.loadInertiaKgm2(), 5.4e-6 * 2e-4);
    }

    @Test
    void missingInertiaOrHalfTheElectricalDataIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> ResonancePredict.run(new ResonancePredict.Settings(0.4,
                Double.NaN, 0, 50, Double.NaN, 1, Double.NaN, Double.NaN, Double.NaN)));
        assertThrows(IllegalArgumentException.class, () -> ResonancePredict.run(new ResonancePredict.Settings(0.4,
                5.4e-6, 0, 50, Double.NaN, 1, Double.NaN, 1.5, Double.NaN)));
    }
}
