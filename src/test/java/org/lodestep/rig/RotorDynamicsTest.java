package org.lodestep.rig;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class RotorDynamicsTest {

    /** Mean period of a signal from its rising zero crossings (linear interpolation), s. */
    static double meanPeriodS(double[] x, double rateHz, int from) {
        double first = -1;
        double last = -1;
        int n = 0;
        for (int i = Math.max(1, from); i < x.length; i++) {
            if (x[i - 1] < 0 && x[i] >= 0) {
                double t = (i - 1 + (-x[i - 1]) / (x[i] - x[i - 1])) / rateHz;
                if (first < 0) {
                    first = t;
                } else {
                    n++;
                }
                last = t;
            }
        }
        return (last - first) / n;
    }

    @Test
    void naturalFrequencyFormulaMatchesPublishedCheckValues() {
        // references §11 (Acarnley, Stepping Motors, 4th ed., ch. 4; from memory there):
        // T_h = 0.4 N·m, J = 5.4e-6 kg·m², N_r = 50 -> f_n = 306.294 Hz; N_r = 100 -> 433.165 Hz; J doubled -> 216.582 Hz
        assertEquals(306.294, new RotorDynamics(5.4e-6, 0, 0.4, 0, 50, 1).naturalFrequencyHz(), 306.294 * 1e-4);
        assertEquals(433.165, new RotorDynamics(5.4e-6, 0, 0.4, 0, 100, 1).naturalFrequencyHz(), 433.165 * 1e-4);
        assertEquals(216.582, new RotorDynamics(1.08e-5, 0, 0.4, 0, 50, 1).naturalFrequencyHz(), 216.582 * 1e-4);
    }

    @Test
    void undampedRingDownAfterOneSmallMicrostepOscillatesAtTheNaturalFrequency() {
        // item 11 values again: the integrated motion must ring at f_n = 306.294 Hz. A 1/64 microstep keeps the
        // swing to 1.4 electrical degrees, where sin(x) ~ x and the small-oscillation formula holds to ~1e-4.
        RotorDynamics d = new RotorDynamics(5.4e-6, 0, 0.4, 0, 50, 64);
        double rate = 100_000;
        RotorDynamics.Trace t = d.run(s -> s >= 0.001 ? 1.0 / 64 : 0, 0.05, rate, 1000);
        double f = 1 / meanPeriodS(t.speedRadPerS(), rate, 200);
        assertEquals(306.294, f, 306.294 * 2e-3);
    }

    @Test
    void oraclesNaturalFrequencyAgreesWithTheEnginesFormulaAndItsOwnIntegratedMotion() {
        // The virtual rig is an independent oracle (package-info): its closed form and the engine's
        // motor.NaturalFrequency both state f_n = (1/2π)·√(N_r·T_h/J) (P. P. Acarnley, Stepping Motors: A Guide to
        // Theory and Practice, 4th ed., IEE 2002, ch. 4); they must agree to rounding, and the rig's integrated
        // undamped motion after a 1/64 microstep (swing ~1.4 electrical degrees, sin x ≈ x) must ring at it.
        double[][] cases = {{5.4e-6, 0.4, 50}, {1.08e-5, 0.4, 50}, {5.4e-6, 0.4, 100}, {3.0e-5, 0.3, 50},
            {2.2e-4, 1.9, 50}};
        for (double[] c : cases) {
            RotorDynamics d = new RotorDynamics(c[0], 0, c[1], 0, (int) c[2], 64);
            double engine = org.lodestep.motor.NaturalFrequency.naturalHz(c[1], (int) c[2], c[0]);
            assertEquals(engine, d.naturalFrequencyHz(), engine * 1e-12, java.util.Arrays.toString(c));
            double rate = Math.max(100_000, engine * 300);
            RotorDynamics.Trace t = d.run(s -> s >= 0.001 ? 1.0 / 64 : 0, 0.001 + 15 / engine, rate, 1000);
            double f = 1 / meanPeriodS(t.speedRadPerS(), rate, (int) (0.0012 * rate));
            assertEquals(engine, f, engine * 2e-3, java.util.Arrays.toString(c));
        }
    }

    @Test
    void rotorSettlesOnTheCommandedFullStepPositionWithDamping() {
        // one full step of a 50-tooth rotor is 1.8 degrees (item 1, Jones tutorial / Acarnley ch. 1)
        RotorDynamics d = new RotorDynamics(5.4e-6, 2e-3, 0.4, 0.02, 50, 1);
        RotorDynamics.Trace t = d.run(s -> s >= 0.001 ? 1.0 : 0, 0.2, 20_000, 1000);
        double moved = t.angleRad()[t.angleRad().length - 1] - t.angleRad()[0];
        assertEquals(Math.toRadians(1.8), moved, Math.toRadians(1.8) * 1e-3);
    }

    @Test
    void fullStepSweepVibratesMostNearTheNaturalFrequency() throws Exception {
        // item 12 (Acarnley section 4.3): open-loop full stepping resonates when the step rate is near f_n.
        // Scenario gantry-axis is built for f_n = 100.0 Hz (item 11 formula, see scenarios.toml).
        Scenario s = Scenarios.get("gantry-axis");
        RotorDynamics d = new RotorDynamics(s.totalInertiaKgM2(), s.dampingNmsPerRad(), s.holdingTorqueNm(),
                s.detentTorqueNm(), s.rotorTeeth(), 1);
        assertEquals(100.0, d.naturalFrequencyHz(), 0.01);
        double seconds = 12;
        double rate = 5000;
        double from = 60;
        double to = 180;
        RotorDynamics.Trace t = d.run(x -> from * x + 0.5 * (to - from) / seconds * x * x, seconds, rate, to);
        // RMS acceleration in 0.25 s windows, against the step rate at the window's centre
        int w = (int) (0.25 * rate);
        double best = 0;
        double bestRate = 0;
        for (int i = 0; i + w <= t.accelRadPerS2().length; i += w) {
            double sum = 0;
            for (int j = i; j < i + w; j++) {
                sum += t.accelRadPerS2()[j] * t.accelRadPerS2()[j];
            }
            double rms = Math.sqrt(sum / w);
            double centre = (i + w / 2.0) / rate;
            if (rms > best) {
                best = rms;
                bestRate = from + (to - from) * centre / seconds;
            }
        }
        assertTrue(bestRate > 85 && bestRate < 115, "strongest vibration at " + bestRate + " full steps/s");
    }
}
