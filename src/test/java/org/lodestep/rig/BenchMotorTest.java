package org.lodestep.rig;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.apache.commons.math3.stat.regression.SimpleRegression;
import org.junit.jupiter.api.Test;
import org.lodestep.motor.RlStep;

class BenchMotorTest {

    /** A 4-lead motor whose values are chosen for the published check values. */
    private static Scenario motor(double halfOhm, double halfH, double coupling, double rpm, List<Scenario.Fault> f,
                                  int leads) {
        return motor(halfOhm, halfH, coupling, rpm, f, leads, 50);
    }

    private static Scenario motor(double halfOhm, double halfH, double coupling, double rpm, List<Scenario.Fault> f,
                                  int leads, int rotorTeeth) {
        List<String> labels = new ArrayList<>();
        for (int i = 1; i <= leads; i++) {
            labels.add("L" + i);
        }
        return new Scenario("test motor", 1, "T-1", leads, rotorTeeth, false, labels, halfOhm, halfH, coupling, 0.25, 1.0,
                0.4, 0.0, 5.4e-6, 0, 1e-4, 1e9, 0.02, 0.0, rpm, f);
    }

    @Test
    void stepResponseHasTheRlTimeConstant() {
        // REFERENCE-CHECKS item 10 (RL circuit; Alexander & Sadiku, first-order circuits): V = 2.0 V,
        // R = 2.0 ohm, L = 4.0 mH -> tau = 2.000 ms, I_inf = 1.000 A, i(tau) = 0.632121 A.
        // Two uncoupled 0.95 ohm, 2 mH halves in series plus the rig's 0.1 ohm drive resistance make that loop.
        BenchMotor m = new BenchMotor(motor(0.95, 0.002, 0.0, 60, List.of(), 4));
        double rate = 50_000;
        int frames = 1000;
        double[][] d = m.stepResponse(1, 2, 2.0, rate, frames, 1e-5);
        int onset = frames / 10;
        // fit ln(1 - i/I_inf) = -t/tau over the first 3 tau
        SimpleRegression fit = new SimpleRegression(false);
        for (int i = onset + 1; i < onset + 300; i++) {
            double t = (i - onset) / rate;
            fit.addData(t, Math.log(1 - d[0][i] / 1.0));
        }
        assertEquals(2.000e-3, -1 / fit.getSlope(), 2.000e-3 * 5e-3);
        // i(tau) = 0.632121 A at 100 samples after onset (tau = 2 ms at 50 kHz)
        assertEquals(0.632121, d[0][onset + 100], 1e-3);
        double tail = 0;
        for (int i = frames - 50; i < frames; i++) {
            tail += d[0][i] / 50;
        }
        // 16 tau after onset: within 1e-6 of I_inf
        assertEquals(1.000, tail, 1e-3);
    }

    @Test
    void stepResponseAgreesWithTheEnginesRlStep() {
        // The rig's step is an independent oracle (rig/package-info.java): its noise-free current must equal
        // motor.RlStep for the same loop. Alexander & Sadiku, Fundamentals of Electric Circuits, first-order RL step:
        // i(t) = (V/R)(1 - e^(-t/tau)), tau = L/R; here V = 2.0 V, R = 0.95 + 0.95 + 0.1 ohm, L = 4.0 mH (uncoupled).
        BenchMotor m = new BenchMotor(motor(0.95, 0.002, 0.0, 60, List.of(), 4));
        double rate = 50_000;
        int frames = 1000;
        double[][] d = m.stepResponse(1, 2, 2.0, rate, frames, 0.0);
        int onset = frames / 10;
        for (int i = 0; i < frames; i += 7) {
            double t = (i - onset) / rate;
            // noise-free at a zero LSB; 1e-9 A leaves room for the rig's nodal solution of R
            assertEquals(RlStep.currentA(2.0, 2.0, 0.004, t), d[0][i], 1e-9, "sample " + i);
        }
    }

    @Test
    void seriesHalvesAddMutualInductance() {
        // coupled coils in series aiding: L = L1 + L2 + 2M, M = k sqrt(L1 L2) (REFERENCE-CHECKS item 5 source:
        // any circuit-theory text). k = 1, L1 = L2 = 0.5 mH -> 2.0 mH, four times a half (item 5 checks).
        BenchMotor m = new BenchMotor(motor(1.0, 0.0005, 1.0, 60, List.of(), 6));
        assertEquals(0.0005, m.inductanceH(1, 2), 1e-12);
        assertEquals(0.002, m.inductanceH(1, 3), 1e-12);
        // centre-tapped 6-lead: end to end is twice a half (item 4, common practice)
        assertEquals(2.0, m.trueResistanceOhm(1, 3), 1e-6);
        assertEquals(1.0, m.trueResistanceOhm(2, 3), 1e-6);
        assertTrue(m.trueResistanceOhm(1, 4) > 1e8, "phases are isolated");
    }

    @Test
    void shortedTurnsAndOpenWindingShowInResistance() {
        BenchMotor shorted = new BenchMotor(motor(2.0, 0.002, 0.96, 60,
                List.of(new Scenario.Fault("shorted-turns", "A2", 0.25, 0, null)), 6));
        assertEquals(2.0, shorted.trueResistanceOhm(1, 2), 1e-6);
        assertEquals(1.5, shorted.trueResistanceOhm(2, 3), 1e-6);
        BenchMotor open = new BenchMotor(motor(2.0, 0.002, 0.96, 60,
                List.of(new Scenario.Fault("open", "A1", 0, 0, null)), 6));
        assertTrue(Double.isInfinite(open.readResistanceOhm(1, 2)));
        BenchMotor leaky = new BenchMotor(motor(2.0, 0.002, 0.96, 60,
                List.of(new Scenario.Fault("leakage", null, 0, 47_000, null)), 6));
        // leakage joins A's centre to B's centre: A start to B start is 2 + 47000 + 2 ohm in parallel with the path
        // through the frame (1e9 ohm per phase): 47004 || 2e9 = 47002.9 ohm
        assertEquals(1 / (1 / 47_004.0 + 1 / 2e9), leaky.trueResistanceOhm(1, 4), 1e-3);
    }

    @Test
    void handTurnBackEmfHasTheElectricalFrequencyAndQuarterPeriodPhase() {
        // REFERENCE-CHECKS item 14 (Acarnley; Kenjo & Sugawara; from memory there): 300 rpm, N_r = 50 ->
        // f_e = 250 Hz, period 4.000 ms, A-B zero-crossing offset 1.000 ms.
        BenchMotor m = new BenchMotor(motor(1.0, 0.001, 0.97, 300, List.of(), 4));
        double rate = 50_000;
        double seconds = 1.0;
        double[][] e = m.handTurnEmf(List.of(new int[] {1, 2}, new int[] {3, 4}), seconds, rate, (int) (rate * seconds));
        // steady part: 0.2 s .. 0.8 s
        int from = (int) (0.25 * rate);
        int to = (int) (0.75 * rate);
        double[] a = java.util.Arrays.copyOfRange(e[0], from, to);
        double[] b = java.util.Arrays.copyOfRange(e[1], from, to);
        assertEquals(4.000e-3, RotorDynamicsTest.meanPeriodS(a, rate, 0), 4e-6);
        double lag = firstRising(b, rate, firstRising(a, rate, 0)) - firstRising(a, rate, 0);
        assertEquals(1.000e-3, lag, 3e-5);
    }

    private static double firstRising(double[] x, double rate, double afterS) {
        for (int i = Math.max(1, (int) (afterS * rate) + 1); i < x.length; i++) {
            if (x[i - 1] < 0 && x[i] >= 0) {
                return (i - 1 + (-x[i - 1]) / (x[i] - x[i - 1])) / rate;
            }
        }
        throw new AssertionError("no rising zero crossing");
    }

    @Test
    void shuffledLeadsKeepTheSameWindingsUnderNewPositions() {
        Scenario s = Scenarios.all().get("salvage-8");
        BenchMotor m = new BenchMotor(s);
        int pairs = 0;
        for (int a = 1; a <= 8; a++) {
            for (int b = a + 1; b <= 8; b++) {
                if (m.trueResistanceOhm(a, b) < 100) {
                    pairs++;
                    assertTrue(b - a != 1 || a % 2 == 0, "with a shuffle, the halves are not simply 1-2, 3-4, ...");
                }
            }
        }
        assertEquals(4, pairs);
        assertEquals(8, m.labels().size());
    }

    @Test
    void swappedLeadsMakeTheColourCodeLie() {
        // bench-4 as labelled: blk-grn is phase A; swapped-4 has grn and red exchanged (scenarios.toml)
        BenchMotor good = new BenchMotor(Scenarios.all().get("bench-4"));
        BenchMotor swapped = new BenchMotor(Scenarios.all().get("swapped-4"));
        assertEquals(List.of("blk", "grn", "red", "blu"), good.labels());
        assertEquals(List.of("blk", "red", "grn", "blu"), swapped.labels());
        // the same positions still form the windings; only the names moved
        assertEquals(1.5, swapped.trueResistanceOhm(1, 2), 1e-6);
        assertTrue(swapped.trueResistanceOhm(1, 3) > 1e8);
    }

    @Test
    void hundredToothRotorDoublesTheElectricalFrequency() {
        // REFERENCE-CHECKS item 14: N_r = 100 at 300 rpm -> f_e = 500 Hz (period 2.000 ms)
        BenchMotor m = new BenchMotor(motor(1.0, 0.001, 0.97, 300, List.of(), 4, 100));
        double rate = 50_000;
        double[][] e = m.handTurnEmf(List.of(new int[] {1, 2}), 1.0, rate, (int) rate);
        double[] a = java.util.Arrays.copyOfRange(e[0], (int) (0.25 * rate), (int) (0.75 * rate));
        assertEquals(2.000e-3, RotorDynamicsTest.meanPeriodS(a, rate, 0), 2e-6);
    }
}
