package org.lodestep.qa;

import org.lodestep.wiring.InsulationReading;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

class InspectionTest {

    private static CheckResult check(Inspection.Judgement j, String parameter, String label) {
        return j.checks().stream().filter(c -> c.parameter().equals(parameter) && c.label().equals(label))
                .findFirst().orElseThrow();
    }

    @Test
    void goodMotorPassesEveryCheck() {
        Inspection.Judgement j = Inspection.judge(Fixtures.spec(), Fixtures.motor(2.03, 2.05, 20.0, null));
        assertEquals(Verdict.PASS, j.verdict());
        assertTrue(j.checks().stream().allMatch(c -> c.verdict() == Verdict.PASS));
    }

    // references §3, k = 235 (IEC 60034-1): 1.500 ohm measured at 25 °C -> 1.47115 ohm at 20 °C (rel 1e-5).
    @Test
    void resistanceIsReferredToSpecTemperatureBeforeJudging() {
        Inspection.Judgement j = Inspection.judge(Fixtures.spec(), Fixtures.motor(1.5, 1.5, 25.0, null));
        CheckResult a = check(j, Parameters.PHASE_RESISTANCE, "A");
        assertEquals(1.5, a.measured());
        assertEquals(1.47115, a.judged(), 1.47115 * 1e-5);
        assertEquals(Verdict.FAIL, a.verdict());
    }

    // 2.18 ohm read on a warm motor (45 °C) is 1.99 ohm at 20 °C: inside 1.8..2.2 only after correction.
    @Test
    void warmMotorPassesOnlyAfterCorrection() {
        Inspection.Judgement j = Inspection.judge(Fixtures.spec(), Fixtures.motor(2.25, 2.25, 45.0, null));
        assertEquals(Verdict.PASS, check(j, Parameters.PHASE_RESISTANCE, "A").verdict());
        Inspection.Judgement uncorrected = Inspection.judge(Fixtures.spec(), Fixtures.motor(2.25, 2.25, Double.NaN, null));
        CheckResult a = check(uncorrected, Parameters.PHASE_RESISTANCE, "A");
        assertEquals(Verdict.FAIL, a.verdict());
        assertTrue(a.note().contains("no winding temperature"), a.note());
    }

    // common practice, from the circuit topology, references §4: coils 1.20 and 1.26 ohm -> imbalance 4.878 % (abs
    // 1e-3).
    @Test
    void phaseImbalanceUsesRangeOverMean() {
        assertEquals(4.878, Inspection.imbalancePct(List.of(1.20, 1.26)), 1e-3);
        Inspection.Judgement j = Inspection.judge(Fixtures.spec(), Fixtures.motor(1.90, 2.10, 20.0, null));
        CheckResult c = check(j, Parameters.PHASE_IMBALANCE, "");
        assertEquals(10.0, c.judged(), 1e-9);
        assertEquals(Verdict.FAIL, c.verdict());
        assertEquals(Verdict.FAIL, j.verdict());
    }

    @Test
    void missingMeasurementLeavesMotorIncomplete() {
        Measurements m = new Measurements(List.of(2.0, 2.0), 20.0, List.of(), List.of(), Double.NaN, Double.NaN,
                List.of());
        Inspection.Judgement j = Inspection.judge(Fixtures.spec(), m);
        assertEquals(Verdict.INCOMPLETE, j.verdict());
        assertEquals(Verdict.INCOMPLETE, check(j, Parameters.PHASE_INDUCTANCE, "").verdict());
        assertEquals(Verdict.INCOMPLETE, check(j, Parameters.INSULATION_RESISTANCE, "").verdict());
    }

    @Test
    void failureOutranksIncomplete() {
        Measurements m = new Measurements(List.of(2.5, 2.5), 20.0, List.of(), List.of(), Double.NaN, Double.NaN,
                List.of());
        assertEquals(Verdict.FAIL, Inspection.judge(Fixtures.spec(), m).verdict());
    }

    // references §9 (common practice): 150 Mohm raw at 25 °C passes the 100 Mohm minimum although its
    // 40 °C trending value is 53.0 Mohm.
    @Test
    void insulationJudgedOnRawReadingAndWrongVoltageIsIncomplete() {
        Measurements m = new Measurements(List.of(2.0, 2.0), 25.0, List.of(3.2e-3, 3.2e-3),
                List.of(new InsulationReading("A-frame", 150e6, 500), new InsulationReading("B-frame", 900e6, 250)),
                Double.NaN, 1.8, List.of());
        Inspection.Judgement j = Inspection.judge(Fixtures.spec(), m);
        CheckResult a = check(j, Parameters.INSULATION_RESISTANCE, "A-frame");
        assertEquals(Verdict.PASS, a.verdict());
        assertTrue(a.note().contains("53.03 M\u03A9 at 40 °C"), a.note());
        CheckResult b = check(j, Parameters.INSULATION_RESISTANCE, "B-frame");
        assertEquals(Verdict.INCOMPLETE, b.verdict());
        assertTrue(b.note().contains("repeat at 500 V"), b.note());
    }

    @Test
    void singlePhaseFoundFailsAsOpenWinding() {
        Measurements m = new Measurements(List.of(2.0), 20.0, List.of(3.2e-3), List.of(), Double.NaN, 1.8, List.of());
        Inspection.Judgement j = Inspection.judge(Fixtures.spec(), m);
        CheckResult b = check(j, Parameters.PHASE_RESISTANCE, "B");
        assertEquals(Verdict.FAIL, b.verdict());
        assertTrue(b.note().contains("open winding"), b.note());
        assertEquals(Verdict.FAIL, j.verdict());
    }

    @Test
    void insulationAboveTesterRangePasses() {
        Measurements m = new Measurements(List.of(2.0, 2.0), 25.0, List.of(3.2e-3, 3.2e-3),
                List.of(new InsulationReading("A-frame", Double.POSITIVE_INFINITY, 500)), Double.NaN, 1.8, List.of());
        CheckResult a = check(Inspection.judge(Fixtures.spec(), m), Parameters.INSULATION_RESISTANCE, "A-frame");
        assertEquals(Verdict.PASS, a.verdict());
        assertEquals("above the tester's range", a.note());
    }
}
