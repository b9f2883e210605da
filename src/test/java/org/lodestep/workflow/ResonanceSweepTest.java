package org.lodestep.workflow;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.lodestep.resonance.BandClass;
import org.lodestep.resonance.ResonanceBand;
import org.lodestep.sample.InputFormatException;
import org.lodestep.sample.SweepShape;

/** The sweep use case without any front end, on the sample captures of the invented HV-420 belt axis. */
class ResonanceSweepTest {
    static final Path SAMPLES = Path.of("sample-captures", "resonance");
    static final Path SWEEP_CSV = SAMPLES.resolve("belt-axis-sweep.csv");
    static final Path PHONE_WAV = SAMPLES.resolve("belt-axis-phone.wav");
    /** Natural frequency of the sample generator's small-angle model, Hz (resonance.SampleCaptureGenerator). */
    static final double MODEL_NATURAL_HZ = 120;

    /** Records what the workflow reports, to check it reports without printing. */
    static final class Recorder implements Progress {
        final List<String> steps = new ArrayList<>();
        long lastDone = -1;

        @Override
        public void step(String step) {
            steps.add(step);
        }

        @Override
        public void advanced(long done, long total) {
            assertTrue(done > lastDone, "progress only moves forward");
            lastDone = done;
        }
    }

    @Test
    void lawFromTheFilesMetadataFindsTheResonanceAtTheNaturalFrequency() throws Exception {
        Recorder progress = new Recorder();
        ResonanceSweep.Settings s = ResonanceSweep.Settings.defaults();
        s = new ResonanceSweep.Settings(null, null, null, null, null, null, 16, 50, 40, Double.NaN, Double.NaN,
                s.bands(), null, s.window(), s.crossingPeriods(), s.margin());
        ResonanceSweep.Result r = ResonanceSweep.analyse(SWEEP_CSV, s, progress);
        assertEquals("accel", r.channel());
        assertEquals("linear sweep 30 to 400 full steps/s over 16 s", r.rateLaw());
        assertEquals(3000.0, r.sampleRateHz());
        assertEquals("law", r.sweep().rateSource());
        ResonanceBand strongest = r.sweep().strongestBand();
        assertNotNull(strongest);
        // Low-speed resonance at a full-step rate equal to f_n (P. P. Acarnley, Stepping Motors, 4th ed., IEE 2002,
        // section 4.3): the band must reach within 8 % of the model's 120 Hz.
        assertTrue(strongest.startFullStepsPerS() <= MODEL_NATURAL_HZ * 1.08
                && strongest.endFullStepsPerS() >= MODEL_NATURAL_HZ * 0.92, strongest.toString());
        assertEquals(BandClass.LOW_SPEED_RESONANCE, strongest.bandClass());
        assertEquals(MODEL_NATURAL_HZ, r.sweep().naturalFrequencyHz(), MODEL_NATURAL_HZ * 0.08);
        // 16 pulses per full step, 200 full steps/rev at 50 teeth (Acarnley ch. 1: 4·N_r full steps per rev), 40 mm
        assertEquals(16, r.units().microsteps());
        assertEquals(200, r.units().fullStepsPerRev());
        assertEquals(r.avoid().microsteps(), 16);
        assertTrue(progress.lastDone > 0 && !progress.steps.isEmpty(), "progress is reported");
    }

    @Test
    void spectrogramColumnsCarryTheLawsRateForTheReport() throws Exception {
        ResonanceSweep.Result r = ResonanceSweep.analyse(SWEEP_CSV, ResonanceSweep.Settings.defaults(),
                Progress.NONE);
        double[] rates = r.spectrogramColumnRatesFullStepsPerS();
        assertNotNull(rates);
        assertEquals(r.sweep().spectrogram().columnCount(), rates.length);
        // linear law r(t) = 30 + 370·t/16 (the file's metadata), at each column's centre time
        for (int c = 0; c < rates.length; c++) {
            double t = r.sweep().spectrogram().columnTimeS(c);
            assertEquals(30 + 370 * t / 16, rates[c], 1e-9);
        }
    }

    @Test
    void pulseChannelGivesTheRateWithoutALawAndTheMapStaysOverTime() throws Exception {
        ResonanceSweep.Settings d = ResonanceSweep.Settings.defaults();
        ResonanceSweep.Settings s = new ResonanceSweep.Settings(null, "step", null, null, null, null, null, 50,
                Double.NaN, Double.NaN, Double.NaN, d.bands(), null, d.window(), 5, 0.05);
        ResonanceSweep.Result r = ResonanceSweep.analyse(SWEEP_CSV, s, Progress.NONE);
        assertEquals("pulses", r.sweep().rateSource());
        assertEquals("accel", r.channel());
        assertTrue(r.sweep().bands().size() >= 1);
        assertNull(r.spectrogramColumnRatesFullStepsPerS());
    }

    @Test
    void recordingWithoutALawIsAnInputErrorAndTheGivenLawFindsTheSameResonance() throws Exception {
        InputFormatException e = assertThrows(InputFormatException.class,
                () -> ResonanceSweep.analyse(PHONE_WAV, ResonanceSweep.Settings.defaults(), Progress.NONE));
        assertTrue(e.getMessage().contains("belt-axis-phone.wav: has no sweep law"), e.getMessage());
        ResonanceSweep.Result r = ResonanceSweep.analyse(PHONE_WAV,
                ResonanceSweep.Settings.defaults().withLaw(SweepShape.LOG, 40, 600, 24.0), Progress.NONE);
        boolean found = false;
        for (ResonanceBand b : r.sweep().bands()) {
            // Acarnley 2002, section 4.3, as above: a band within 8 % of f_n
            found |= b.startFullStepsPerS() <= MODEL_NATURAL_HZ * 1.08 && b.endFullStepsPerS() >= MODEL_NATURAL_HZ * 0.92;
        }
        assertTrue(found, r.sweep().bands().toString());
        assertTrue(r.rateLaw().startsWith("log sweep 40 to 600"), r.rateLaw());
    }

    @Test
    void unknownChannelNamesTheChannelsThatExistAndImpossibleSettingsAreRefused() {
        ResonanceSweep.Settings d = ResonanceSweep.Settings.defaults();
        ResonanceSweep.Settings vib = new ResonanceSweep.Settings("vib", null, null, null, null, null, null, 50,
                Double.NaN, Double.NaN, Double.NaN, d.bands(), null, d.window(), 5, 0.05);
        InputFormatException e = assertThrows(InputFormatException.class,
                () -> ResonanceSweep.analyse(SWEEP_CSV, vib, Progress.NONE));
        assertTrue(e.getMessage().contains("expected one of accel, step"), e.getMessage());
        // a log sweep cannot start at 0 full steps/s (r(t) = r0·(r1/r0)^(t/T) needs r0 > 0)
        assertThrows(IllegalArgumentException.class, () -> ResonanceSweep.analyse(PHONE_WAV,
                d.withLaw(SweepShape.LOG, 0, 600, 24.0), Progress.NONE));
    }
}
