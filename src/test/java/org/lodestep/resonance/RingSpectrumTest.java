package org.lodestep.resonance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.Random;

import org.junit.jupiter.api.Test;

/**
 * The ring-down's decay, log decrement and spectrum against a linear single-degree-of-freedom oscillator integrated
 * here: x'' + 2ζω_n·x' + ω_n²·x = 0 struck at rest (x = 0, x' = ω_n: a tap), classical fourth-order Runge–Kutta
 * (references §23), with f_n = 300 Hz and ζ = 0.05, sampled at 20 kHz, settled value 0.4, Gaussian noise.
 */
class RingSpectrumTest {
    private static final double FS = 20_000;
    private static final double FN = 300;
    private static final double ZETA = 0.05;
    private static final double NOISE = 1e-3;

    /** The integrated oscillator, 0.12 s after a 5 ms flat pre-trigger, without noise or offset. */
    private static double[] oscillator() {
        double w = 2 * Math.PI * FN;
        int pre = (int) (0.005 * FS);
        double[] x = new double[pre + (int) (0.12 * FS)];
        double h = 1 / FS;
        double p = 0;
        double v = w;
        for (int i = 0; i < x.length; i++) {
            x[i] = i < pre ? 0 : p;
            if (i < pre) {
                continue;
            }
            // RK4 on (p, v)' = (v, -2ζω·v - ω²·p)
            double k1p = v;
            double k1v = -2 * ZETA * w * v - w * w * p;
            double k2p = v + h / 2 * k1v;
            double k2v = -2 * ZETA * w * (v + h / 2 * k1v) - w * w * (p + h / 2 * k1p);
            double k3p = v + h / 2 * k2v;
            double k3v = -2 * ZETA * w * (v + h / 2 * k2v) - w * w * (p + h / 2 * k2p);
            double k4p = v + h * k3v;
            double k4v = -2 * ZETA * w * (v + h * k3v) - w * w * (p + h * k3p);
            p += h / 6 * (k1p + 2 * k2p + 2 * k3p + k4p);
            v += h / 6 * (k1v + 2 * k2v + 2 * k3v + k4v);
        }
        return x;
    }

    private static double[] measured(double noise) {
        double[] x = oscillator();
        Random rnd = new Random(27);
        for (int i = 0; i < x.length; i++) {
            x[i] = 0.4 + x[i] + noise * rnd.nextGaussian();
        }
        return x;
    }

    @Test
    void logDecrementOfTwoSuccessivePeaksOfTheIntegratedOscillatorIsTheTextbookOne() {
        // W. T. Thomson and M. D. Dahleh, Theory of Vibration with Applications, 5th ed., ch. 2 (references §27),
        // and Rao (references §16): δ = ln(x_n/x_(n+1)) = 2πζ/√(1 − ζ²) = 0.314553 for ζ = 0.05.
        double[] x = oscillator();
        double first = 0;
        double second = 0;
        int pre = (int) (0.005 * FS);
        int period = (int) Math.round(FS / (FN * Math.sqrt(1 - ZETA * ZETA)));
        for (int i = pre; i < pre + period / 2; i++) {
            first = Math.max(first, x[i]);
        }
        for (int i = pre + period / 2; i < pre + period + period / 2; i++) {
            second = Math.max(second, x[i]);
        }
        double delta = DampedOscillation.logDecrement(first, second, 1);
        assertEquals(0.314553, delta, 2e-3);
        assertEquals(ZETA, DampedOscillation.dampingRatio(delta), 5e-4);
        assertEquals(0.314553, DampedOscillation.logDecrement(ZETA), 1e-6);
        // references §16: x0 = 10, x1 = 7.5 → δ = 0.287682, ζ = 0.0457381, and back
        assertEquals(0.287682, DampedOscillation.logDecrement(0.0457381), 1e-6);
    }

    @Test
    void theFitStatesTheTextbookLogDecrement() {
        // δ = 2πζ/√(1 − ζ²) = 0.314553 (Thomson and Dahleh, references §27); nearly noiseless, so no cycle near the
        // noise biases the small-signal extrapolation
        RingDownResult r = RingDownFit.fit(measured(1e-7), FS, 0);
        assertEquals(0.314553, r.logDecrement(), 0.314553 * 0.01);
        assertEquals(DampedOscillation.logDecrement(r.dampingRatio()), r.logDecrement(), 1e-12);
    }

    @Test
    void theDecayStartsAtTheLargestExcursionAndEndsWhereTheEnvelopeReachesTheNoise() {
        RingDownResult r = RingDownFit.fit(measured(NOISE), FS, 0);
        assertEquals(NOISE, r.noiseRms(), NOISE * 0.2);
        // struck at 5 ms, the tap's first and largest swing peaks a quarter of a damped period later (less the
        // phase the damping takes: arctan(√(1 − ζ²)/ζ)/ω_d, Rao, references §16)
        double wd = 2 * Math.PI * FN * Math.sqrt(1 - ZETA * ZETA);
        double firstPeak = 0.005 + Math.atan(Math.sqrt(1 - ZETA * ZETA) / ZETA) / wd;
        assertEquals(firstPeak, r.ringStartTimeS(), 1.5 / FS);
        // the true envelope e^(-ζω_n t)·ω_n/ω_d of the tap at the decay's end: 3 × the noise RMS
        double t = r.decayEndTimeS() - 0.005;
        double envelope = Math.exp(-ZETA * 2 * Math.PI * FN * t) * 2 * Math.PI * FN / wd;
        assertEquals(RingDownResult.NOISE_MULTIPLE * NOISE, envelope, RingDownResult.NOISE_MULTIPLE * NOISE * 0.3);
    }

    @Test
    void theDecaysSpectrumPeaksAtTheDampedNaturalFrequency() {
        // f_d = f_n·√(1 − ζ²) = 299.625 Hz (references §16)
        double[] x = measured(NOISE);
        RingDownResult r = RingDownFit.fit(x, FS, 0);
        int from = (int) Math.round(r.ringStartTimeS() * FS);
        int to = (int) Math.ceil(r.decayEndTimeS() * FS);
        RingSpectrum s = RingSpectrum.of(Arrays.copyOfRange(x, from, to), r.offset(), FS, 4 * FN);
        assertEquals(299.625, s.peakHz(), 1.0);
        double[] f = s.frequencyHz();
        assertTrue(f[f.length - 1] <= 4 * FN && f[f.length - 1] > 4 * FN - 5, "kept up to 4 f_n: " + f[f.length - 1]);
        double max = Arrays.stream(s.levelDb()).max().orElseThrow();
        assertEquals(0, max, 1e-9);
        // a Lorentzian line: at f_d ± 3σ/2π the level is about 10·log10(1/(1 + 9)) = −10 dB below the peak
        double sigmaHz = ZETA * FN;
        int k = (int) Math.round((299.625 + 3 * sigmaHz) / (f[1] - f[0]));
        assertEquals(-10, s.levelDb()[k], 1.5);
    }
}
