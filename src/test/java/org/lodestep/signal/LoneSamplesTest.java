package org.lodestep.signal;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Random;

import org.junit.jupiter.api.Test;

/**
 * The glitch screen against signals built from the model: sampled sinusoids, damped rings and steps, with Gaussian
 * noise, must give no lone sample at any sample rate above the Nyquist rate (a peak stands over its neighbours by
 * 2A·sin²(θ/2), never more than the largest step 2A·sin(θ/2): references §33), and every glitch put into them must
 * be found where it is.
 */
class LoneSamplesTest {

    @Test
    void sampledOscillationsWithNoiseHaveNoLoneSamplesAtAnyRateAboveNyquist() {
        Random rnd = new Random(7);
        for (double samplesPerPeriod : new double[] {2.2, 3, 4, 6, 8, 12, 40, 200, 2000}) {
            for (double zeta : new double[] {0, 0.02, 0.2}) {
                double[] x = ring(8000, samplesPerPeriod, zeta, 1e-3, rnd);
                assertEquals(List.of(), LoneSamples.find(x), samplesPerPeriod + " samples a period, zeta " + zeta);
            }
        }
    }

    @Test
    void aStepAndItsRingingHaveNoLoneSamples() {
        // a position step in one sample, then a damped overshoot about the new rest (S. S. Rao, Mechanical
        // Vibrations, 5th ed., ch. 2): the step is one big move, not a lone sample
        Random rnd = new Random(11);
        double[] x = new double[4000];
        for (int i = 0; i < x.length; i++) {
            double t = i - 1000;
            x[i] = (t < 0 ? 0 : 1.8 - 1.8 * Math.exp(-0.01 * t) * Math.cos(2 * Math.PI * t / 25)) + 1e-3
                    * rnd.nextGaussian();
        }
        assertEquals(List.of(), LoneSamples.find(x));
    }

    @Test
    void everyGlitchPutIntoARingIsFoundWhereItIsAndBridgedByItsNeighbours() {
        Random rnd = new Random(3);
        for (int trial = 0; trial < 200; trial++) {
            double samplesPerPeriod = 5 + rnd.nextDouble() * 100;
            double[] x = ring(5000, samplesPerPeriod, 0.05, 2e-3, rnd);
            int at = 1 + rnd.nextInt(x.length - 2);
            double clean = x[at];
            double glitch = (rnd.nextBoolean() ? 1 : -1) * (2 + 10 * rnd.nextDouble());
            x[at] = glitch;
            List<LoneSamples.LoneSample> found = LoneSamples.find(x);
            assertEquals(1, found.size(), "trial " + trial + ": " + found);
            assertEquals(at, found.get(0).index());
            assertEquals(glitch, found.get(0).readValue());
            double[] y = LoneSamples.bridged(x, found);
            assertEquals((x[at - 1] + x[at + 1]) / 2, y[at]);
            // the neighbours' mean misses a unit sinusoid by at most 2·sin²(θ/2) (references §33), plus the noise
            double theta = 2 * Math.PI / samplesPerPeriod;
            assertEquals(clean, y[at], 2 * Math.pow(Math.sin(theta / 2), 2) + 0.01, "the bridge is the signal's");
            y[at] = x[at];
            assertArrayEquals(x, y, "only the glitch is touched");
        }
    }

    @Test
    void aQuietQuantisedStretchFlickeringBetweenCodesHasNoGlitchButABigJumpIs() {
        // a 12-bit converter over 2 A (0.49 mA a code) reading a current at rest: single codes flicker up and down
        double lsb = 2.0 / 4096;
        double[] x = new double[2000];
        Random rnd = new Random(5);
        for (int i = 0; i < x.length; i++) {
            x[i] = (100 + (rnd.nextInt(20) == 0 ? (rnd.nextBoolean() ? 1 : -1) : 0)) * lsb;
        }
        assertEquals(List.of(), LoneSamples.find(x));
        x[1000] = 140 * lsb;
        x[999] = 100 * lsb;
        x[1001] = 100 * lsb;
        assertEquals(List.of(1000), LoneSamples.find(x).stream().map(LoneSamples.LoneSample::index).toList());
    }

    @Test
    void twoGlitchesApartAreBothFoundAndTheEndsAreNeverLone() {
        double[] x = ring(3000, 30, 0.01, 0, new Random(1));
        x[0] = 40;
        x[x.length - 1] = -40;
        x[700] = 9;
        x[1900] = -9;
        List<LoneSamples.LoneSample> found = LoneSamples.find(x);
        assertEquals(List.of(700, 1900), found.stream().map(LoneSamples.LoneSample::index).toList());
    }

    /** A·e^(-ζωt)·cos(ω_d t) sampled at {@code samplesPerPeriod} a period, with Gaussian noise of deviation σ. */
    private static double[] ring(int n, double samplesPerPeriod, double zeta, double sigma, Random rnd) {
        double[] x = new double[n];
        double theta = 2 * Math.PI / samplesPerPeriod;
        for (int i = 0; i < n; i++) {
            x[i] = Math.exp(-zeta * theta * i / 50) * Math.cos(theta * i + 0.3) + sigma * rnd.nextGaussian();
        }
        return x;
    }
}
