package org.lodestep.motor;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

class BackEmfTraceTest {
    private static final double FS = 20_000;
    /** Two coils per phase; the second of each recorded end to start, so its start is its second lead. */
    private static final List<SyntheticMotor.Coil> EIGHT_LEAD = List.of(
            new SyntheticMotor.Coil("1", "2", true, false), new SyntheticMotor.Coil("5", "6", true, true),
            new SyntheticMotor.Coil("3", "4", false, false), new SyntheticMotor.Coil("7", "8", false, true));

    @Test
    void steadyTurnShowsThreeCyclesWithPhaseBRisingAQuarterCycleAfterA() {
        // references §14 (Acarnley, Stepping Motors, 4th ed.): 300 rpm with 50 rotor teeth is 250 Hz electrical,
        // a 4.000 ms period, and B's zero crossing 1.000 ms (90° electrical) after A's.
        double[] theta = steadyTurn();
        List<EmfChannel> ch = SyntheticMotor.backEmf(EIGHT_LEAD, theta, FS, 50, 0.05, 0.005, 3);
        BackEmfResult r = new BackEmfAnalyzer(FS).analyze(ch, null, null, 1);
        BackEmfTrace t = BackEmfTrace.of(ch, FS, r);

        assertEquals(4.000, t.periodMs(), 0.01);
        assertEquals(1.000, t.bRisingMs(), 0.02);
        assertEquals(90.0, t.electricalDeg(t.bRisingMs()), 1.5);
        // the lag the trace states is the analysis's own, measured over the whole capture
        assertEquals(r.quadratureLagDeg(), t.lagDeg(), 0);
        double[] ms = t.timeMs();
        assertEquals(BackEmfTrace.CYCLES * 4.0, ms[ms.length - 1] - ms[0], 0.2 * 4.0 + 0.1);
        assertEquals(4, t.waves().size());
        assertEquals(List.of("A", "A", "B", "B"), t.waves().stream().map(BackEmfTrace.Wave::phase).toList());
    }

    @Test
    void coilsOfOnePhaseAreDrawnStartLeadPositiveSoTheyCoincide() {
        List<EmfChannel> ch = SyntheticMotor.backEmf(EIGHT_LEAD, steadyTurn(), FS, 50, 0.05, 0.0, 4);
        BackEmfTrace t = BackEmfTrace.of(ch, FS, new BackEmfAnalyzer(FS).analyze(ch, null, null, 1));
        double[] a1 = t.waves().get(0).voltageV();
        double[] a2 = t.waves().get(1).voltageV();
        double peak = 0;
        double worst = 0;
        for (int i = 0; i < a1.length; i++) {
            peak = Math.max(peak, Math.abs(a1[i]));
            worst = Math.max(worst, Math.abs(a1[i] - a2[i]));
        }
        // recorded in opposite senses, drawn start lead positive: the same wave
        assertTrue(worst < 1e-9 * peak, "coils of phase A differ by " + worst + " V of " + peak + " V");
        assertEquals(new OrientedLeads("6", "5"), t.waves().get(1).coil());
    }

    @Test
    void handTurnIsDrawnWhereTheShaftTurnedFastest() {
        // 3 revolutions in 2 s, speed from 0 up to 3 rev/s and back (SyntheticMotor.handTurnAngleRad); Ke 0.05 V·s/rad
        // per coil gives a peak EMF of Ke·ω = 0.05·2π·3 = 0.942 V at the fastest.
        double[] theta = SyntheticMotor.handTurnAngleRad(40_000, FS, 3.0);
        List<EmfChannel> ch = SyntheticMotor.backEmf(EIGHT_LEAD, theta, FS, 50, 0.05, 0.005, 5);
        BackEmfTrace t = BackEmfTrace.of(ch, FS, new BackEmfAnalyzer(FS).analyze(ch, 3.0, null, 1));
        double peak = 0;
        for (double v : t.waves().get(0).voltageV()) {
            peak = Math.max(peak, Math.abs(v));
        }
        assertEquals(0.942, peak, 0.942 * 0.05);
        // 3 rev/s × 50 teeth = 150 Hz electrical at the fastest: 6.67 ms per cycle
        assertEquals(6.67, t.periodMs(), 0.15);
    }

    /** 0.1 s at rest, 0.5 s at 5 rev/s (300 rpm), 0.1 s at rest: mechanical angle, rad. */
    private static double[] steadyTurn() {
        int rest = (int) (0.1 * FS);
        int turn = (int) (0.5 * FS);
        double[] theta = new double[2 * rest + turn];
        for (int i = 0; i < theta.length; i++) {
            theta[i] = 2 * Math.PI * 5.0 * Math.max(0, Math.min(turn, i - rest)) / FS;
        }
        return theta;
    }
}
