package org.lodestep.signal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Random;

import org.junit.jupiter.api.Test;

class WelchTest {

    @Test
    void sineDensityIntegratesToHalfTheSquaredAmplitude() {
        // Welch, IEEE Trans. Audio Electroacoust. 15(2), 1967, references §18(b): A = 2 sine at 125 Hz, f_s = 1 kHz,
        // 8192 samples, segments 256 overlap 128,
        // periodic Hann: Σ P·Δf = A²/2 = 2.000 (rel 1e-9); power-spectrum peak 2.000 → √ = RMS 1.41421.
        double[] x = new double[8192];
        for (int i = 0; i < x.length; i++) {
            x[i] = 2.0 * Math.sin(2 * Math.PI * 125 * i / 1000.0 + 0.7);
        }
        Welch w = new Welch(SpectralSettings.hann(256), 1000);
        w.feed(x, 0, x.length);
        assertEquals(2.0, w.spectrum(SpectrumScaling.DENSITY).integral(), 2e-9);
        Spectrum s = w.spectrum(SpectrumScaling.POWER);
        assertEquals(32, s.peakBin(1));
        assertEquals(1.41421, Math.sqrt(s.value(32)), 1e-5);
        assertEquals(63, w.segmentCount());
    }

    @Test
    void whiteNoiseDensityIsFlatAtTwiceTheVarianceOverSampleRate() {
        // Welch, IEEE Trans. Audio Electroacoust. 15(2), 1967, references §18(d): σ = 0.5, f_s = 1 kHz, 65 536
        // samples, segments 1024 →
        // mean PSD 2σ²/f_s = 5.0e-4 units²/Hz and Σ P·Δf ≈ 0.25 (statistical, rel 5e-2).
        Random r = new Random(11);
        double[] x = new double[65536];
        for (int i = 0; i < x.length; i++) {
            x[i] = 0.5 * r.nextGaussian();
        }
        Welch w = new Welch(SpectralSettings.hann(1024), 1000);
        w.feed(x, 0, x.length);
        Spectrum p = w.spectrum(SpectrumScaling.DENSITY);
        assertEquals(0.25, p.integral(), 0.25 * 5e-2);
        double mean = 0;
        for (int k = 1; k < p.size() - 1; k++) {
            mean += p.value(k);
        }
        mean /= p.size() - 2;
        assertEquals(5.0e-4, mean, 5.0e-4 * 5e-2);
    }

    @Test
    void feedingInOddBlocksGivesTheSameSpectrumAsOneBlock() {
        // Streaming must not change the estimate: same segments, same average (definition, Welch 1967).
        Random r = new Random(5);
        double[] x = new double[10_000];
        for (int i = 0; i < x.length; i++) {
            x[i] = r.nextGaussian();
        }
        Welch whole = new Welch(SpectralSettings.hann(512), 2000);
        whole.feed(x, 0, x.length);
        Welch blocks = new Welch(SpectralSettings.hann(512), 2000);
        int i = 0;
        int step = 1;
        while (i < x.length) {
            int len = Math.min(step, x.length - i);
            blocks.feed(x, i, len);
            i += len;
            step = step * 3 % 997 + 1;
        }
        double[] a = whole.spectrum(SpectrumScaling.DENSITY).values();
        double[] b = blocks.spectrum(SpectrumScaling.DENSITY).values();
        for (int k = 0; k < a.length; k++) {
            assertEquals(a[k], b[k], 1e-15 * Math.max(1, a[k]));
        }
    }

    @Test
    void refusesASpectrumBeforeTheFirstWholeSegment() {
        Welch w = new Welch(SpectralSettings.hann(256), 1000);
        w.feed(new double[100], 0, 100);
        assertThrows(IllegalStateException.class, () -> w.spectrum(SpectrumScaling.DENSITY));
    }

    @Test
    void rejectsNonFiniteSamplesNamingTheIndex() {
        Welch w = new Welch(SpectralSettings.hann(16), 1000);
        double[] x = new double[16];
        x[9] = Double.NaN;
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> w.feed(x, 0, 16));
        assertEquals("sample 9 is not a finite number", e.getMessage());
    }
}
