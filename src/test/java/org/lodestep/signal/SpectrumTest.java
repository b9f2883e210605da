package org.lodestep.signal;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;

import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.transform.DftNormalization;
import org.apache.commons.math3.transform.FastFourierTransformer;
import org.apache.commons.math3.transform.TransformType;
import org.junit.jupiter.api.Test;

class SpectrumTest {

    private static double[] tone(int n, double fs, double freqHz, double amplitude, double phaseRad) {
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = amplitude * Math.cos(2 * Math.PI * freqHz * i / fs + phaseRad);
        }
        return x;
    }

    @Test
    void densityOfSixteenPointExampleMatchesHandComputedBins() {
        // references §18(a) (computed from the Welch 1967 / SciPy welch density definition):
        // x = 1 + 2cos(2π·3n/16) + 0.5cos(πn), f_s = 16 Hz, rectangular, no detrend → P0 = 1, P3 = 2, P8 = 0.25.
        double[] x = new double[16];
        for (int n = 0; n < 16; n++) {
            x[n] = 1 + 2 * Math.cos(2 * Math.PI * 3 * n / 16) + 0.5 * Math.cos(Math.PI * n);
        }
        Spectrum p = Spectrum.of(x, 16, Window.RECTANGULAR, Detrend.NONE, SpectrumScaling.DENSITY);
        assertEquals(1.0, p.value(0), 1e-12);
        assertEquals(2.0, p.value(3), 1e-12);
        assertEquals(0.25, p.value(8), 1e-12);
        assertEquals(0.0, p.value(5), 1e-12);
        // Parseval: Σ P·Δf = mean(x²) = 3.25; with the mean removed, var(x) = 2.25 (item 18(a)).
        assertEquals(3.25, p.integral(), 1e-12);
        Spectrum d = Spectrum.of(x, 16, Window.RECTANGULAR, Detrend.MEAN, SpectrumScaling.DENSITY);
        assertEquals(2.25, d.integral(), 1e-12);
    }

    @Test
    void binCentredToneHasItsAmplitudeWithRectangularAndHann() {
        // Welch, IEEE Trans. Audio Electroacoust. 15(2), 1967, references §18(c); Harris (1978): amplitude of a
        // bin-centred sine = 2|X_k|/Σw.
        double[] x = tone(1000, 1000, 50, 1.0, 0.3);
        assertEquals(1.0, Spectrum.of(x, 1000, Window.RECTANGULAR, Detrend.NONE, SpectrumScaling.AMPLITUDE)
                .value(50), 1e-9);
        assertEquals(1.0, Spectrum.of(x, 1000, Window.HANN, Detrend.NONE, SpectrumScaling.AMPLITUDE)
                .value(50), 1e-9);
    }

    @Test
    void halfBinOffsetToneShowsTheScallopingLossOfEachWindow() {
        // Welch, IEEE Trans. Audio Electroacoust. 15(2), 1967, references §18(c): at 50.5 Hz, N = 1000, Hann reads
        // 0.8488 (abs 1e-3), rectangular 0.640 (5e-3);
        // Harris (1978) Table 1 scalloping loss 1.42 dB (Hann), 3.92 dB (rectangular).
        double[] x = tone(1000, 1000, 50.5, 1.0, 0.0);
        Spectrum hann = Spectrum.of(x, 1000, Window.HANN, Detrend.NONE, SpectrumScaling.AMPLITUDE);
        Spectrum rect = Spectrum.of(x, 1000, Window.RECTANGULAR, Detrend.NONE, SpectrumScaling.AMPLITUDE);
        assertEquals(0.8488, Math.max(hann.value(50), hann.value(51)), 1e-3);
        assertEquals(0.640, Math.max(rect.value(50), rect.value(51)), 5e-3);
    }

    @Test
    void flatTopReadsAHalfBinOffsetToneWithinItsScallopingLoss() {
        // Harris (1978) / references §17: flat-top scalloping loss about 0.01 dB.
        double[] x = tone(4096, 4096, 300.5, 1.0, 1.0);
        Spectrum p = Spectrum.of(x, 4096, Window.FLAT_TOP, Detrend.NONE, SpectrumScaling.AMPLITUDE);
        assertEquals(1.0, Math.max(p.value(300), p.value(301)), 0.003);
    }

    @Test
    void magnitudesAgreeWithCommonsMathFft() {
        // Commons Math 3.6.1 FastFourierTransformer (standard normalisation) as the reference DFT.
        Random r = new Random(7);
        int n = 1024;
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = r.nextGaussian();
        }
        Complex[] ref = new FastFourierTransformer(DftNormalization.STANDARD).transform(x, TransformType.FORWARD);
        double[] mag2 = new double[n / 2 + 1];
        new RealFft(n).magnitudeSquared(x.clone(), mag2);
        for (int k = 0; k <= n / 2; k++) {
            double a = ref[k].abs();
            assertEquals(a * a, mag2[k], 1e-9 * n);
        }
    }

    @Test
    void oddLengthMagnitudesAgreeWithDirectDft() {
        // Direct DFT sum as reference (definition, e.g. Oppenheim & Schafer, Discrete-Time Signal Processing, 3rd ed.,
        // eq. 8.67, from memory); Commons Math only transforms powers of two.
        int n = 15;
        double[] x = new double[n];
        Random r = new Random(3);
        for (int i = 0; i < n; i++) {
            x[i] = r.nextDouble() - 0.5;
        }
        double[] mag2 = new double[n / 2 + 1];
        new RealFft(n).magnitudeSquared(x.clone(), mag2);
        for (int k = 0; k <= n / 2; k++) {
            double re = 0;
            double im = 0;
            for (int i = 0; i < n; i++) {
                re += x[i] * Math.cos(2 * Math.PI * k * i / n);
                im -= x[i] * Math.sin(2 * Math.PI * k * i / n);
            }
            assertEquals(re * re + im * im, mag2[k], 1e-12);
        }
    }
}
