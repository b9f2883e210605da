package org.lodestep.resonance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.lodestep.sample.SweepShape;

/**
 * Bands from phase current under a constant-voltage drive, against sweeps integrated by {@link StepperSweepSimulator}
 * with both phase circuits L·di/dt = v − R·i − e, e from K and the rotor speed (RK4 at 1/(8·5000 Hz) = 25 µs):
 * R = 1.3 Ω, L = 2.76 mH, V = 3.25 V, K = 0.1414 V·s/rad, so T_h = √2·K·V/R = 0.5 N·m and f_n = 100.26 Hz
 * (Acarnley, Stepping Motors, 4th ed., ch. 4 and 5; from memory). The accelerometer of the same run is the reference.
 */
class CurrentBandsTest {
    static final double FS = 5000;

    static StepperSweepSimulator.Run run(int microsteps) {
        StepperSweepSimulator s = new StepperSweepSimulator();
        s.constantVoltage(2.5 * 1.3, 1.3, 2.76e-3, 0.5 / (Math.sqrt(2) * 2.5));
        s.dampingRatio(0.1);
        s.microsteps = microsteps;
        s.substeps = 8;
        s.accelNoiseG = 0.02;
        s.currentNoiseA = 0.025;
        return s.linearSweep(20, 300, 20, FS);
    }

    static SweepResult analyse(double[] x, ResponseChannel kind) {
        SweepSettings settings = kind.isCurrent() ? SweepSettings.forCurrent(FS) : SweepSettings.forSampleRate(FS);
        SweepAnalyzer a = SweepAnalyzer.programmed(settings, FS, new SweepLaw(SweepShape.LINEAR, 20, 300, 20), kind);
        a.feed(x, null, 0, x.length);
        return a.finish(BandSettings.defaults(), Double.NaN);
    }

    @Test
    void fullStepCurrentFindsTheBandTheAccelerometerFinds() {
        StepperSweepSimulator.Run r = run(1);
        ResonanceBand accel = analyse(r.accelG(), ResponseChannel.VIBRATION).strongestBand();
        SweepResult cur = analyse(r.currentA(), ResponseChannel.CURRENT_CONSTANT_VOLTAGE);
        assertTrue(accel != null && accel.contains(100.26), "accelerometer band at f_n: " + accel);
        assertTrue(cur.bands().stream().anyMatch(b -> b.contains(accel.peakFullStepsPerS())),
                "a current band holds the accelerometer's peak " + accel.peakFullStepsPerS() + ": " + cur.bands());
        assertFalse(cur.evidenceNote().isEmpty());
        // the current follows the bridge's switching pattern even while the rotor slips: no verdict from it
        assertTrue(cur.stall().evidence().startsWith("not judged"), cur.stall().evidence());
    }

    @Test
    void halfStepCurrentFindsTheBandTheAccelerometerFindsNearTheNaturalFrequency() {
        StepperSweepSimulator.Run r = run(2);
        SweepResult acc = analyse(r.accelG(), ResponseChannel.VIBRATION);
        SweepResult cur = analyse(r.currentA(), ResponseChannel.CURRENT_CONSTANT_VOLTAGE);
        ResonanceBand atFn = acc.bands().stream().filter(b -> b.contains(100.26)).findFirst().orElseThrow();
        assertTrue(cur.bands().stream().anyMatch(b -> b.startFullStepsPerS() <= atFn.endFullStepsPerS()
                && b.endFullStepsPerS() >= atFn.startFullStepsPerS()), atFn + " vs " + cur.bands());
    }

    @Test
    void aChopperCurrentReportsNoBandsAndSaysWhy() {
        StepperSweepSimulator.Run r = run(1);
        SweepResult cur = analyse(r.currentA(), ResponseChannel.CURRENT_CHOPPER);
        assertEquals(0, cur.bands().size());
        assertTrue(cur.evidenceNote().contains("chopper"), cur.evidenceNote());
        assertFalse(cur.stall().lostSynchronism());
    }
}
