package org.lodestep.motor;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.lodestep.wiring.Severity;

class BackEmfAnalyzerTest {
    private static final double FS = 10_000;

    // Coils of an 8-lead motor with shuffled labels: 1-2 is phase A (start 1), 5-6 phase A with start 6, 3-4 phase B
    // with start 4, 7-8 phase B (start 7). "Start" follows the sign convention of item 14 for a forward turn.
    private static final List<SyntheticMotor.Coil> EIGHT_LEAD = List.of(
            new SyntheticMotor.Coil("1", "2", true, false),
            new SyntheticMotor.Coil("3", "4", false, true),
            new SyntheticMotor.Coil("5", "6", true, true),
            new SyntheticMotor.Coil("7", "8", false, false));

    private static EmfCoil coil(BackEmfResult r, String first) {
        return r.coils().stream().filter(c -> c.measured().first().equals(first)).findFirst().orElseThrow();
    }

    @Test
    void pairsAndOrientsEightLeadCoilsUnderVaryingSpeed() {
        // 3 revolutions in 2 s, speed from 0 to 3 rev/s and back; Nr = 50 (item 1), Ke = 0.05 V·s/rad per coil.
        double[] theta = SyntheticMotor.handTurnAngleRad(20_000, FS, 3.0);
        List<EmfChannel> ch = SyntheticMotor.backEmf(EIGHT_LEAD, theta, FS, 50, 0.05, 0.01, 11);
        BackEmfResult r = new BackEmfAnalyzer(FS).analyze(ch, 3.0, null, 1);

        assertEquals("A", coil(r, "1").phase());
        assertEquals("A", coil(r, "5").phase());
        assertEquals("B", coil(r, "3").phase());
        assertEquals("B", coil(r, "7").phase());
        assertEquals(new OrientedLeads("1", "2"), coil(r, "1").oriented());
        assertEquals(new OrientedLeads("6", "5"), coil(r, "5").oriented());
        assertEquals(new OrientedLeads("4", "3"), coil(r, "3").oriented());
        assertEquals(new OrientedLeads("7", "8"), coil(r, "7").oriented());
        // item 14: the phases are 90° electrical apart
        assertEquals(90.0, r.quadratureLagDeg(), 2.0);
        // item 14: f_e = Nr x rev/s -> 150 cycles in 3 revolutions -> 50 teeth (item 1: 1.8°)
        // Near standstill at both ends the EMF sinks into the 10 mV noise; that travel is estimated from the EMF
        // amplitude, and the count must lie within the bound it states (and the bound must stay below one tooth).
        assertEquals(150.0, r.electricalCycles(), r.toothCount().cyclesUncertainty());
        assertTrue(r.toothCount().cyclesUncertainty() < 3.0, r.toothCount().toString());
        assertEquals(50, r.rotorTeeth());
        assertEquals(0, r.directionReversals());
        // peak speed 2 x mean (1.5 rev/s) = 3 rev/s -> 150 Hz electrical; the slowest blocks are near standstill
        assertEquals(150.0, r.maxElectricalFrequencyHz(), 5.0);
        assertTrue(r.minElectricalFrequencyHz() < 30.0);
        for (EmfCoil c : r.coils()) {
            assertEquals(0.05, c.keVsPerRad(), 0.05 * 0.02, c.toString());
        }
    }

    @Test
    void oneGlitchSampleOnAChannelIsBridgedAndNamedAndItsKeIsTheCleanOnes() {
        // the same hand turn (Ke = 0.05 V·s/rad per coil); one sample of coil 1-2 reads 9.5 V mid-turn
        double[] theta = SyntheticMotor.handTurnAngleRad(20_000, FS, 3.0);
        List<EmfChannel> clean = SyntheticMotor.backEmf(EIGHT_LEAD, theta, FS, 50, 0.05, 0.01, 11);
        BackEmfResult before = new BackEmfAnalyzer(FS).analyze(clean, 3.0, null, 1);
        List<EmfChannel> ch = new java.util.ArrayList<>(clean);
        double[] v = ch.get(0).voltageV();
        v[10_000] = 9.5;
        ch.set(0, new EmfChannel(ch.get(0).pair(), v));
        BackEmfResult r = new BackEmfAnalyzer(FS).analyze(ch, 3.0, null, 1);
        assertEquals(coil(before, "1").keVsPerRad(), coil(r, "1").keVsPerRad(), 1e-4);
        assertEquals(1, r.findings().stream().filter(f -> f.code() == MotorFindingCode.GLITCH_BRIDGED).count());
        assertEquals(0, before.findings().stream().filter(f -> f.code() == MotorFindingCode.GLITCH_BRIDGED).count());
    }

    @Test
    void reverseTurnSwapsTheStartOfPhaseB() {
        double[] theta = SyntheticMotor.handTurnAngleRad(20_000, FS, 3.0);
        for (int i = 0; i < theta.length; i++) {
            theta[i] = -theta[i];
        }
        List<EmfChannel> ch = SyntheticMotor.backEmf(EIGHT_LEAD, theta, FS, 50, 0.05, 0.01, 12);
        BackEmfResult r = new BackEmfAnalyzer(FS).analyze(ch, 3.0, null, 1);
        // Turned the other way, B leads A; orienting B to lag A again means taking its other end as start.
        assertEquals(new OrientedLeads("3", "4"), coil(r, "3").oriented());
        assertEquals(new OrientedLeads("8", "7"), coil(r, "7").oriented());
        assertEquals(new OrientedLeads("1", "2"), coil(r, "1").oriented());
        assertEquals(50, r.rotorTeeth());
    }

    @Test
    void keepsPairingWhenShaftIsTurnedBackPartWay() {
        // 2 turns forward, then 1 turn back (each a start-stop hand turn): the pairing and the orientation follow the
        // main direction, and the reversal is reported.
        double[] fwd = SyntheticMotor.handTurnAngleRad(10_000, FS, 2.0);
        double[] back = SyntheticMotor.handTurnAngleRad(5_000, FS, 1.0);
        double[] theta = new double[15_000];
        for (int i = 0; i < 10_000; i++) {
            theta[i] = fwd[i];
        }
        for (int i = 0; i < 5_000; i++) {
            theta[10_000 + i] = fwd[9_999] - back[i];
        }
        BackEmfResult r = new BackEmfAnalyzer(FS).analyze(SyntheticMotor.backEmf(EIGHT_LEAD, theta, FS, 50, 0.05,
                0.005, 16), null, null, 1);
        assertEquals(new OrientedLeads("6", "5"), coil(r, "5").oriented());
        assertEquals(new OrientedLeads("4", "3"), coil(r, "3").oriented());
        assertEquals(new OrientedLeads("7", "8"), coil(r, "7").oriented());
        assertEquals(1, r.directionReversals());
        assertTrue(r.findings().stream().anyMatch(f -> f.code().code().equals("direction_reversed")));
        // item 14: net travel 1 turn = 50 electrical cycles (the angle from both phases follows the direction)
        assertEquals(50.0, r.electricalCycles(), 1.0);
    }

    @Test
    void countsHundredTeethFromIndexChannel() {
        // item 1: a 0.9° motor has 100 rotor teeth; revolutions counted from one index pulse per turn
        int n = 20_000;
        double[] theta = SyntheticMotor.handTurnAngleRad(n, FS, 4.0);
        List<EmfChannel> ch = SyntheticMotor.backEmf(EIGHT_LEAD.subList(0, 2), theta, FS, 100, 0.05, 0.01, 13);
        double[] index = new double[n];
        for (int i = 0; i < n; i++) {
            double turn = theta[i] / (2 * Math.PI);
            index[i] = turn - Math.floor(turn) < 0.02 ? 5.0 : 0.0;
        }
        BackEmfResult r = new BackEmfAnalyzer(FS).analyze(ch, null, index, 1);
        assertEquals(RevolutionSource.INDEX_CHANNEL, r.revolutionSource());
        assertEquals(100, r.rotorTeeth());
    }

    @Test
    void leavesTeethUnknownWithoutRevolutions() {
        double[] theta = SyntheticMotor.handTurnAngleRad(10_000, FS, 2.0);
        List<EmfChannel> ch = SyntheticMotor.backEmf(EIGHT_LEAD.subList(0, 2), theta, FS, 50, 0.05, 0.0, 14);
        BackEmfResult r = new BackEmfAnalyzer(FS).analyze(ch, null, null, 1);
        assertNull(r.rotorTeeth());
        assertNull(coil(r, "1").keVsPerRad());
        // electrical Ke = mechanical Ke / Nr
        assertEquals(0.05 / 50, coil(r, "1").keVsPerElectricalRad(), 0.05 / 50 * 0.02);
    }

    @Test
    void reportsDeadChannelAsError() {
        double[] theta = SyntheticMotor.handTurnAngleRad(10_000, FS, 2.0);
        List<EmfChannel> ch = new java.util.ArrayList<>(
                SyntheticMotor.backEmf(EIGHT_LEAD.subList(0, 2), theta, FS, 50, 0.05, 0.001, 15));
        ch.add(new EmfChannel(new OrientedLeads("5", "6"), new double[10_000]));
        BackEmfResult r = new BackEmfAnalyzer(FS).analyze(ch, 2.0, null, 1);
        assertTrue(r.findings().stream().anyMatch(f -> f.severity() == Severity.ERROR && f.code().code().equals("no_emf")));
        assertEquals(2, r.coils().size());
    }

    @Test
    void rejectsChannelsOfDifferentLength() {
        List<EmfChannel> ch = List.of(new EmfChannel(new OrientedLeads("1", "2"), new double[300]),
                new EmfChannel(new OrientedLeads("3", "4"), new double[301]));
        assertThrows(IllegalArgumentException.class, () -> new BackEmfAnalyzer(FS).analyze(ch, null, null, 1));
    }

    @Test
    void readsLeadPairFromChannelName() {
        assertEquals(new OrientedLeads("1", "2"), OrientedLeads.fromChannelName("emf_1_2_v"));
        assertEquals(new OrientedLeads("A", "b7"), OrientedLeads.fromChannelName("emf_A_b7"));
        assertNull(OrientedLeads.fromChannelName("current_a"));
    }
}
