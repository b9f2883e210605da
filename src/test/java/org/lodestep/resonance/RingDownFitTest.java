package org.lodestep.resonance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;

import org.junit.jupiter.api.Test;

class RingDownFitTest {

    @Test
    void fitsAnAnalyticDampedSinusoid() {
        // references §16 (Rao, Mechanical Vibrations, 5th ed., ch. 2): x = e^(-ζω_n t)·cos(ω_d t),
        // f_n = 300 Hz, ζ = 0.05 → f_d = 299.625 Hz; a fit should return f_n and ζ within rel 5e-3.
        double fs = 20_000;
        double wn = 2 * Math.PI * 300;
        double zeta = 0.05;
        double wd = wn * Math.sqrt(1 - zeta * zeta);
        double[] x = new double[2000];
        for (int i = 0; i < x.length; i++) {
            double t = i / fs;
            x[i] = Math.exp(-zeta * wn * t) * Math.cos(wd * t);
        }
        RingDownResult r = RingDownFit.fit(x, fs, 0);
        assertEquals(300, r.naturalFrequencyHz(), 300 * 5e-3);
        assertEquals(299.625, r.dampedFrequencyHz(), 299.625 * 5e-3);
        assertEquals(0.05, r.dampingRatio(), 0.05 * 5e-3);
        assertEquals(94.2478, r.decayRatePerS(), 94.2478 * 5e-3);
        assertTrue(r.rSquared() > 0.9999, "R² " + r.rSquared());
    }

    @Test
    void fitsANoisyRingDownWithPreTriggerAndOffset() {
        // Same analytic case (item 16), delayed 20 ms after a flat pre-trigger, offset 3.0, noise 1 % of the peak.
        double fs = 10_000;
        double wn = 2 * Math.PI * 180;
        double zeta = 0.08;
        double wd = wn * Math.sqrt(1 - zeta * zeta);
        Random rnd = new Random(2);
        double[] x = new double[3000];
        for (int i = 0; i < x.length; i++) {
            double t = i / fs - 0.02;
            x[i] = 3.0 + 0.01 * rnd.nextGaussian() + (t < 0 ? 0 : -Math.exp(-zeta * wn * t) * Math.sin(wd * t + 1.2));
        }
        RingDownResult r = RingDownFit.fit(x, fs, 1.0);
        assertEquals(180, r.naturalFrequencyHz(), 180 * 1e-2);
        assertEquals(0.08, r.dampingRatio(), 0.08 * 3e-2);
        assertEquals(3.0, r.offset(), 0.01);
        assertTrue(r.startTimeS() > 1.02 && r.startTimeS() < 1.03, "start " + r.startTimeS());
    }

    @Test
    void fittedCurveAndEnvelopeReproduceTheAnalyticSignal() {
        // The noisy case's model without noise: x = 3.0 - e^(-ζω_n t)·sin(ω_d t + 1.2) for t >= 20 ms (S. S. Rao,
        // Mechanical Vibrations, 5th ed., Prentice Hall 2011, ch. 2, free vibration with viscous damping). The result's
        // own evaluators must give the signal back from the fitted start on, and bound it by its decay envelope.
        double fs = 10_000;
        double wn = 2 * Math.PI * 180;
        double zeta = 0.08;
        double wd = wn * Math.sqrt(1 - zeta * zeta);
        double[] x = new double[3000];
        for (int i = 0; i < x.length; i++) {
            double t = i / fs - 0.02;
            x[i] = 3.0 + (t < 0 ? 0 : -Math.exp(-zeta * wn * t) * Math.sin(wd * t + 1.2));
        }
        RingDownResult r = RingDownFit.fit(x, fs, 1.0);
        assertTrue(Double.isNaN(r.fittedAt(r.startTimeS() - 1e-3)), "no curve before the fitted stretch");
        int first = (int) Math.ceil((r.startTimeS() - 1.0) * fs);
        for (int i = first; i < first + 500; i++) {
            double t = 1.0 + i / fs;
            assertEquals(x[i], r.fittedAt(t), 1e-3, "t = " + t);
            assertTrue(x[i] <= r.upperEnvelopeAt(t) + 1e-3 && x[i] >= r.lowerEnvelopeAt(t) - 1e-3, "t = " + t);
        }
        // At the start the envelope is the fitted amplitude about the settled value.
        assertEquals(r.offset() + r.amplitude(), r.upperEnvelopeAt(r.startTimeS()), 1e-12);
        // f_n/k, highest first (Acarnley 2002, section 4.3)
        assertEquals(r.naturalFrequencyHz() / 3, r.riskyRatesFullStepsPerS(3).get(2), 1e-12);
    }

    @Test
    void agreesWithThePredictedNaturalFrequencyOfASimulatedSingleStep() {
        // The simulator's small-angle f_n is (1/2π)·√(N_r·T_h/J) (Acarnley 2002, ch. 4; references §11):
        // a single full step is a large swing, so the sinusoidal torque curve softens it; agreement within 8 %.
        RotorSimulator sim = new RotorSimulator(0.4, 50, 5.4e-6 * 4, 0.1, 1, 0.02, 1e-5);
        double[] theta = sim.singleStep(20_000, 2000);
        RingDownResult r = RingDownFit.fit(theta, 20_000, 0);
        assertEquals(sim.naturalHz(), r.naturalFrequencyHz(), sim.naturalHz() * 0.08);
        assertEquals(0.1, r.dampingRatio(), 0.03);
    }

    @Test
    void flatSignalIsNotARingDown() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> RingDownFit.fit(new double[500], 1000, 0));
        assertEquals("the signal is flat: no ring-down to fit", e.getMessage());
    }

    @Test
    void singleBumpHasTooFewCrossings() {
        double[] x = new double[500];
        for (int i = 0; i < 100; i++) {
            x[i] = Math.sin(Math.PI * i / 100);
        }
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> RingDownFit.fit(x, 1000, 0));
        assertTrue(e.getMessage().contains("zero crossings"), e.getMessage());
    }

    @Test
    void refusesNoiseWithoutARing() {
        // Gaussian noise crosses zero often, but its largest swing stays within about 5 σ (normal tail, references
        // §28): no decaying oscillation is there to fit.
        java.util.Random rnd = new java.util.Random(8);
        double[] x = new double[5000];
        for (int i = 0; i < x.length; i++) {
            x[i] = rnd.nextGaussian();
        }
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> RingDownFit.fit(x, 1000, 0));
        assertTrue(e.getMessage().startsWith("no decaying oscillation found"), e.getMessage());
    }
}
