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

    @Test
    void windowThatSelectsNoSamplesIsASettingError() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> ResonanceRingdown.fit(
                RINGDOWN_CSV, new ResonanceRingdown.Settings(null, 50.0, 60.0), Progress.NONE));
        assertTrue(e.getMessage().contains("selects no samples"), e.getMessage());
    }
}
