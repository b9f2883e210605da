package org.lodestep.workflow;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;

import org.junit.jupiter.api.Test;

class ResonanceRingdownTest {
    static final Path RINGDOWN_CSV = Path.of("sample-captures", "resonance", "belt-axis-ringdown.csv");

    @Test
    void sampleRingDownGivesTheModelsNaturalFrequencyAndDamping() throws Exception {
        ResonanceRingdown.Result r = ResonanceRingdown.fit(RINGDOWN_CSV, ResonanceRingdown.Settings.DEFAULT,
                Progress.NONE);
        // The generator's small-angle f_n is 120 Hz (P. P. Acarnley, Stepping Motors, 4th ed., IEE 2002, ch. 4); a
        // full step is a large swing that softens the sinusoidal torque curve, so agreement within 8 %; ζ = 0.08.
        assertEquals(120, r.fit().naturalFrequencyHz(), 120 * 0.08);
        assertEquals(0.08, r.fit().dampingRatio(), 0.02);
        assertTrue(r.fit().rSquared() > 0.95);
        assertEquals(r.timeS().length, r.values().length);
        // the analysed window runs on the capture's clock, one sample period apart
        double[] t = r.timeS();
        assertEquals(t[1] - t[0], t[t.length - 1] - t[t.length - 2], 1e-9);
    }

    /**
     * A damped oscillation from the model x = e^(-ζω_n t)·cos(ω_d t) (S. S. Rao, Mechanical Vibrations, 5th ed.,
     * ch. 2), f_n = 80 Hz, ζ = 0.05, with noise: one bad sample in the ring, five times the first swing, would be
     * the ring's largest excursion; bridged, the fit gives what the clean record gives.
     */
    @Test
    void oneBadSampleInTheRingIsBridgedAndTheFitStaysOnTheModel() throws Exception {
        double fs = 10_000;
        double fn = 80;
        double zeta = 0.05;
        double wd = 2 * Math.PI * fn * Math.sqrt(1 - zeta * zeta);
        java.util.Random rnd = new java.util.Random(3);
        double[] x = new double[5000];
        for (int i = 0; i < x.length; i++) {
            double t = i / fs - 0.05;
            x[i] = (t < 0 ? 0 : Math.exp(-zeta * 2 * Math.PI * fn * t) * Math.cos(wd * t)) + 0.002 * rnd.nextGaussian();
        }
        x[1200] = 5.0;
        org.lodestep.sample.SampledSignal sig = new org.lodestep.sample.SampledSignal("glitchy ring",
                java.util.List.of(new org.lodestep.sample.Channel("accel", "g")), fs, 0, java.util.Map.of(),
                new double[][] {x});
        ResonanceRingdown.Result r = ResonanceRingdown.fit(sig, ResonanceRingdown.Settings.DEFAULT, Progress.NONE);
        assertEquals(1, r.bridged().size());
        assertEquals(0.12, r.timeS()[r.bridged().get(0).index()], 1e-9);
        assertEquals(5.0, r.bridged().get(0).readValue());
        assertEquals(fn, r.fit().naturalFrequencyHz(), 0.5);
        assertEquals(zeta, r.fit().dampingRatio(), 0.002);
        assertTrue(r.fit().rSquared() > 0.99, "R² " + r.fit().rSquared());
        assertTrue(r.fit().ringStartTimeS() < 0.06, "the ring starts at its own first swing, not at the glitch");
    }

    @Test
    void windowThatSelectsNoSamplesIsASettingError() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> ResonanceRingdown.fit(
                RINGDOWN_CSV, new ResonanceRingdown.Settings(null, 50.0, 60.0), Progress.NONE));
        assertTrue(e.getMessage().contains("selects no samples"), e.getMessage());
    }
}
