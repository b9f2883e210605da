package org.lodestep.resonance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;

import org.junit.jupiter.api.Test;

/**
 * Ring-downs after one full step from rest, integrated by {@link StepperSweepSimulator} (RK4 at 1/(16·20 kHz) =
 * 3.125 µs) with detent, measured from the tangential acceleration with 0.01 g noise.
 *
 * <p>Linearised check values: about the full-step rest θ_0 (N_r·θ_0 = kπ/2, 4N_r·θ_0 = 2πk) the winding's
 * T_h·sin(N_r·δ) gives stiffness N_r·T_h and the detent T_d·sin(4N_r·θ) adds 4·N_r·T_d, so
 * f_n = √((N_r·T_h + 4·N_r·T_d)/J)/2π and ζ = c/(2·√(k·J)) (Acarnley, Stepping Motors, 4th ed., IEE 2002, ch. 4
 * for the winding term, from memory; the detent term derived here; ζ from Rao, Mechanical Vibrations, 5th ed., ch. 2).
 * T_h = 0.5 N·m, T_d = 0.02 N·m, N_r = 50, J = 6.3e-5 kg·m² -> k = 29 N·m/rad, f_n = 107.98 Hz.
 */
class RingDownBackboneTest {

    static RingDownResult ring(double zeta) {
        StepperSweepSimulator s = new StepperSweepSimulator();
        s.detentTorqueNm = 0.02;
        s.dampingRatio(zeta);
        s.accelNoiseG = 0.01;
        StepperSweepSimulator.Run r = s.run(t -> t >= 0.01 ? 1 : 0, 1.0, 20_000);
        return RingDownFit.fit(r.accelG(), 20_000, 0);
    }

    @Test
    void smallSignalFrequencyAndDampingMatchTheLinearisedModelAtSeveralDampingRatios() {
        double fn = Math.sqrt((50 * 0.5 + 4 * 50 * 0.02) / 6.3e-5) / (2 * Math.PI);
        assertEquals(107.98, fn, 0.01);
        for (double zeta : new double[] {0.01, 0.027, 0.05, 0.1}) {
            RingDownResult r = ring(zeta);
            // issue's acceptance: f_n within 3 %, ζ within 15 % of the linearised values
            assertEquals(fn, r.naturalFrequencyHz(), 0.03 * fn, "ζ = " + zeta + ": " + r);
            assertEquals(zeta, r.dampingRatio(), 0.15 * zeta, "ζ = " + zeta + ": " + r);
            // the damped sinusoid fits the settled tail
            assertTrue(r.rSquared() >= 0.98, "tail R² " + r.rSquared() + " at ζ = " + zeta);
            // the first swing (an electrical quarter turn) rings slower than the small-signal oscillation: for the
            // pendulum-like sin restoring torque the period grows with amplitude (Nayfeh & Mook 1979, ch. 4)
            assertTrue(r.largeSwingFrequencyHz() < 0.95 * r.naturalFrequencyHz(), r.toString());
            assertTrue(r.naturalFrequencyErrorHz() >= 0 && r.naturalFrequencyErrorHz() < 0.01 * fn);
            assertTrue(r.dampedFrequencyHz() < r.naturalFrequencyHz());
        }
    }

    @Test
    void oneSinusoidOverTheWholeRingReadsLowWhichIsWhyTheBackboneIsNeeded() {
        // the symptom this measurement removes: a constant-frequency fit over the whole ring lands well below f_n
        RingDownResult r = ring(0.027);
        assertTrue(r.wholeRingFrequencyHz() < 0.95 * 107.98, "whole-ring fit " + r.wholeRingFrequencyHz());
        assertTrue(r.wholeRingRSquared() < 0.95, "whole-ring R² " + r.wholeRingRSquared());
        // the backbone rises monotonically towards f_n as the swing decays (first cycles)
        for (int i = 1; i < 5; i++) {
            assertTrue(r.backbone().get(i).frequencyHz() > r.backbone().get(i - 1).frequencyHz());
            assertTrue(r.backbone().get(i).amplitude() < r.backbone().get(i - 1).amplitude());
        }
    }
    /**
     * A linear oscillator's free decay, x = e^(−ζω_n·t)·cos(ω_d·t) with ω_d = ω_n·√(1 − ζ²) (Rao, Mechanical
     * Vibrations, 5th ed., ch. 2), plus white noise 60 dB below the first swing: peak picking near the noise floor
     * reads each late peak high (the largest of several noisy samples), which made the decrement, and so ζ, read
     * low by about 8 % at ζ = 0.05. Half-wave amplitudes fitted over every sample of the half wave average the
     * noise instead.
     */
    @Test
    void dampingOfALinearDecayIsUnbiasedByNoiseNearTheFloor() {
        double fs = 20_000;
        double fn = 100;
        for (double zeta : new double[] {0.02, 0.05, 0.1}) {
            double wn = 2 * Math.PI * fn;
            double wd = wn * Math.sqrt(1 - zeta * zeta);
            Random noise = new Random(7);
            double[] x = new double[(int) (fs * 1.0)];
            for (int i = 0; i < x.length; i++) {
                double t = i / fs;
                x[i] = Math.exp(-zeta * wn * t) * Math.cos(wd * t) + 1e-3 * noise.nextGaussian();
            }
            RingDownBackbone.Result r = RingDownBackbone.measure(x, 0, 0, 1e-3, fs, 0);
            assertEquals(zeta, r.dampingRatio(), 0.03 * zeta, "ζ = " + zeta);
            assertEquals(fn, r.smallSignalHz(), 0.005 * fn, "ζ = " + zeta);
        }
    }
}
