package org.lodestep.resonance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class PredictionTest {

    @Test
    void forwardAddsLoadInertiaAndListsRiskyRatesInUserUnits() {
        // references §11 (Acarnley 2002, ch. 4): 0.4 N·m, N_r 50, J = 5.4e-6 + 5.4e-6 → 216.582 Hz.
        Prediction p = Prediction.forward(0.4, 50, 5.4e-6, 5.4e-6, new RateUnits(8, 50, 40), 2.0, 4.0e-3);
        assertEquals(216.582, p.naturalFrequencyHz(), 216.582 * 1e-4);
        assertEquals(4, p.riskyRates().size());
        assertEquals(216.582 / 2 * 8, p.riskyRates().get(1).pulsesPerS(), 1e-2);
        // references §13 (Acarnley, section 5.5): R = 2 Ω, L = 4 mH → 318.310 full steps/s.
        assertEquals(318.310, p.midBandCentreFullStepsPerS(), 318.310 * 1e-5);
    }

    @Test
    void inverseRecoversTheLoadInertiaThatTheForwardPredictionUsed() {
        // Round trip of item 11's formula: the inverse must return the load inertia the forward run was given.
        Prediction f = Prediction.forward(0.45, 50, 5.4e-6, 3.4e-5, RateUnits.defaults(), Double.NaN, Double.NaN);
        Prediction i = Prediction.inverse(f.naturalFrequencyHz(), 0.45, 50, 5.4e-6, RateUnits.defaults(),
                Double.NaN, Double.NaN);
        assertEquals(3.4e-5, i.loadInertiaKgm2(), 3.4e-5 * 1e-9);
        assertTrue(i.inferred());
        assertTrue(Double.isNaN(i.midBandCentreFullStepsPerS()));
    }

    @Test
    void rejectsNegativeLoadInertia() {
        assertThrows(IllegalArgumentException.class,
                () -> Prediction.forward(0.4, 50, 5.4e-6, -1e-6, RateUnits.defaults(), Double.NaN, Double.NaN));
    }
}
