package org.lodestep.resonance;

import org.lodestep.sample.SweepShape;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class SweepAnalyzerTest {
    static final double FS = 4000;

    /** Belt-axis-like rotor: T_h = 0.45 N·m, N_r = 50, J chosen for f_n = 120 Hz, ζ = 0.08, L/R = 0.8 ms. */
    static RotorSimulator rotor(int microsteps) {
        // Acarnley (2002), ch. 4 / references §11: J = N_r·T_h/(2π·f_n)².
        double j = 50 * 0.45 / Math.pow(2 * Math.PI * 120, 2);
        return new RotorSimulator(0.45, 50, j, 0.08, microsteps, 0.02, 0.0008);
    }

    static void feed(SweepAnalyzer a, double[][] sig, boolean withPulses) {
        int block = 1000;
        for (int i = 0; i < sig[0].length; i += block) {
            int len = Math.min(block, sig[0].length - i);
            a.feed(sig[0], withPulses ? sig[1] : null, i, len);
        }
    }

    @Test
    void strongestBandOfASimulatedSweepContainsTheNaturalFrequency() {
        SweepLaw law = new SweepLaw(SweepShape.LINEAR, 30, 400, 20);
        RotorSimulator sim = rotor(1);
        double[][] sig = sim.run(law::rateFullStepsPerSAt, FS, (int) (FS * 20));
        SweepAnalyzer a = SweepAnalyzer.programmed(SweepSettings.forSampleRate(FS), FS, law);
        feed(a, sig, false);
        SweepResult r = a.finish(BandSettings.defaults(), Double.NaN);
        ResonanceBand strongest = r.strongestBand();
        assertNotNull(strongest, "no band found");
        // Low-speed resonance at step rate = f_n (Acarnley 2002, section 4.3; references §12), within 8 %.
        double fn = sim.naturalHz();
        assertTrue(strongest.startFullStepsPerS() <= fn * 1.08 && strongest.endFullStepsPerS() >= fn * 0.92,
                "strongest band " + strongest + " vs f_n " + fn);
        assertEquals(fn, r.naturalFrequencyHz(), 0.08 * fn, "estimated f_n");
        assertEquals("estimated", r.naturalFrequencySource());
        assertEquals(BandClass.LOW_SPEED_RESONANCE, strongest.bandClass());
        assertEquals(1, strongest.subharmonic());
    }

    @Test
    void theCurveSoFarGrowsAlongTheSweepAndEndsAsTheFinishedCurve() {
        SweepLaw law = new SweepLaw(SweepShape.LINEAR, 30, 400, 20);
        double[][] sig = rotor(1).run(law::rateFullStepsPerSAt, FS, (int) (FS * 20));
        SweepAnalyzer a = SweepAnalyzer.programmed(SweepSettings.forSampleRate(FS), FS, law);
        assertTrue(a.responseSoFar().isEmpty());
        int half = sig[0].length / 2;
        a.feed(sig[0], null, 0, half);
        java.util.List<ResponsePoint> early = a.responseSoFar();
        // halfway through a linear 30 ... 400 sweep the rate is 215 full steps/s: the curve reaches no further
        double last = early.get(early.size() - 1).rateFullStepsPerS();
        assertTrue(last > 200 && last <= law.rateFullStepsPerSAt(half / FS), "curve so far ends at " + last);
        a.feed(sig[0], null, half, sig[0].length - half);
        java.util.List<ResponsePoint> all = a.responseSoFar();
        // the finished curve is the curve so far once every sample is in, point for point (finish adds the
        // detection baseline and threshold to each point)
        java.util.List<ResponsePoint> finished = a.finish(BandSettings.defaults(), Double.NaN).response();
        assertEquals(all.size(), finished.size());
        for (int i = 0; i < all.size(); i++) {
            assertEquals(all.get(i).rateFullStepsPerS(), finished.get(i).rateFullStepsPerS(), 0.0);
            assertEquals(all.get(i).levelDb(), finished.get(i).levelDb(), 0.0);
            assertEquals(all.get(i).segments(), finished.get(i).segments());
        }
        // bins behind the sweep take no more segments: the early curve, less its filling last bin, is unchanged
        assertEquals(early.subList(0, early.size() - 1), all.subList(0, early.size() - 1));
    }

    @Test
    void pulseChannelGivesTheSameBandAsTheProgrammedLaw() {
        SweepLaw law = new SweepLaw(SweepShape.LOG, 40, 400, 16);
        RotorSimulator sim = rotor(1);
        double[][] sig = sim.run(law::rateFullStepsPerSAt, FS, (int) (FS * 16));
        SweepAnalyzer a = SweepAnalyzer.fromPulses(SweepSettings.forSampleRate(FS), FS, 1);
        feed(a, sig, true);
        SweepResult r = a.finish(BandSettings.defaults(), sim.naturalHz());
        assertEquals("pulses", r.rateSource());
        assertEquals("given", r.naturalFrequencySource());
        ResonanceBand strongest = r.strongestBand();
        assertNotNull(strongest);
        assertTrue(strongest.contains(sim.naturalHz()) || Math.abs(strongest.peakFullStepsPerS() / sim.naturalHz() - 1)
                < 0.08, strongest.toString());
        // The pulse-derived rate of each point follows the law: the curve spans 40 ... 400 full steps/s.
        assertEquals(40, r.response().get(0).rateFullStepsPerS(), 4);
        assertEquals(400, r.response().get(r.response().size() - 1).rateFullStepsPerS(), 20);
    }

    @Test
    void subharmonicBandIsClassifiedAtHalfTheNaturalFrequency() {
        SweepLaw law = new SweepLaw(SweepShape.LINEAR, 30, 400, 20);
        RotorSimulator sim = rotor(1);
        double[][] sig = sim.run(law::rateFullStepsPerSAt, FS, (int) (FS * 20));
        SweepAnalyzer a = SweepAnalyzer.programmed(SweepSettings.forSampleRate(FS), FS, law);
        feed(a, sig, false);
        SweepResult r = a.finish(BandSettings.defaults(), sim.naturalHz());
        // Acarnley (2002), section 4.3 / references §12: a weaker band near f_n/2 = 60 full steps/s.
        assertTrue(r.bands().stream().anyMatch(b -> b.subharmonic() == 2), r.bands().toString());
    }

    @Test
    void longStreamKeepsItsStateBounded() {
        // Twenty minutes at 8 kS/s (9.6 million samples) of a tone that follows the rate, fed in blocks: the state is
        // one accumulator per occupied 1 % rate bin and a spectrogram capped at 400 columns, whatever the length.
        double fs = 8000;
        double duration = 1200;
        SweepLaw law = new SweepLaw(SweepShape.LOG, 50, 1500, duration);
        SweepAnalyzer a = SweepAnalyzer.programmed(SweepSettings.forSampleRate(fs), fs, law);
        double[] block = new double[8192];
        long n = (long) (fs * duration);
        double phase = 0;
        for (long done = 0; done < n; done += block.length) {
            int len = (int) Math.min(block.length, n - done);
            for (int i = 0; i < len; i++) {
                phase += 2 * Math.PI * law.rateFullStepsPerSAt((done + i) / fs) / fs;
                block[i] = Math.sin(phase);
            }
            a.feed(block, null, 0, len);
        }
        SweepResult r = a.finish(BandSettings.defaults(), Double.NaN);
        // ln(1500/50)/ln(1.01) = 342 bins at most (plus one for rounding at each end).
        assertTrue(a.rateBins().size() <= 344, "rate bins " + a.rateBins().size());
        assertTrue(r.spectrogram().columnCount() < 400, "columns " + r.spectrogram().columnCount());
        assertEquals(duration, r.durationS(), 1e-9);
        // The tone sits at 1× the rate: its tracked order amplitude is the tone's amplitude, 1.0 (within 2 %).
        assertEquals(1.0, r.response().get(r.response().size() / 2).order1Amplitude(), 0.02);
    }

    @Test
    void sweepLawThatMissesTheCaptureIsReported() {
        SweepLaw law = new SweepLaw(SweepShape.LINEAR, 30, 400, 0.01);
        SweepAnalyzer a = SweepAnalyzer.programmed(SweepSettings.forSampleRate(FS), FS, law);
        a.feed(new double[8000], null, 0, 8000);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> a.finish(BandSettings.defaults(), Double.NaN));
        assertTrue(e.getMessage().contains("does not overlap the capture"), e.getMessage());
    }

    @Test
    void captureShorterThanOneSegmentIsReported() {
        SweepLaw law = new SweepLaw(SweepShape.LINEAR, 30, 400, 10);
        SweepAnalyzer a = SweepAnalyzer.programmed(SweepSettings.forSampleRate(FS), FS, law);
        a.feed(new double[100], null, 0, 100);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> a.finish(BandSettings.defaults(), Double.NaN));
        assertTrue(e.getMessage().contains("fewer than one analysis segment"), e.getMessage());
    }

    @Test
    void flatPulseChannelIsReported() {
        SweepAnalyzer a = SweepAnalyzer.fromPulses(SweepSettings.forSampleRate(FS), FS, 1);
        double[] z = new double[8000];
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> a.feed(z, z, 0, 8000));
        assertTrue(e.getMessage().contains("flat"), e.getMessage());
    }

    @Test
    void synchronismCheckBesideTheSpectraGivesTheSameResultsAsInline() {
        // Blocks of 1000 frames run the step counts and the synchronism check on the feeding thread, blocks of 8191
        // hand them to a second thread beside the transforms: every result must be the same, for a programmed law
        // and for a pulse channel.
        SweepLaw law = new SweepLaw(SweepShape.LOG, 40, 400, 16);
        double[][] sig = rotor(1).run(law::rateFullStepsPerSAt, FS, (int) (FS * 16) - 333);
        for (boolean withPulses : new boolean[] {false, true}) {
            SweepResult[] r = new SweepResult[2];
            int[] blocks = {1000, 8191};
            for (int t = 0; t < 2; t++) {
                SweepAnalyzer a = withPulses ? SweepAnalyzer.fromPulses(SweepSettings.forSampleRate(FS), FS, 1)
                        : SweepAnalyzer.programmed(SweepSettings.forSampleRate(FS), FS, law);
                for (int i = 0; i < sig[0].length; i += blocks[t]) {
                    a.feed(sig[0], withPulses ? sig[1] : null, i, Math.min(blocks[t], sig[0].length - i));
                }
                r[t] = a.finish(BandSettings.defaults(), Double.NaN);
            }
            String what = withPulses ? "pulses" : "law";
            assertEquals(r[0].stall(), r[1].stall(), what);
            assertEquals(r[0].response(), r[1].response(), what);
            assertEquals(r[0].bands(), r[1].bands(), what);
            assertEquals(r[0].watch(), r[1].watch(), what);
            assertEquals(r[0].evidenceNote(), r[1].evidenceNote(), what);
            assertTrue(r[0].stall().lowestSynchronousShare() > 0, "the check ran: " + r[0].stall());
        }
    }
}
