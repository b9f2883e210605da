package org.lodestep.motor;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.lodestep.report.MotorPhrasing;
import org.lodestep.wiring.Connection;

import org.lodestep.wiring.Topology;

class MotorIdentifierTest {
    private static final double FS = 10_000;
    // 8-lead motor with shuffled labels (see BackEmfAnalyzerTest): A = 1-2 (start 1) and 5-6 (start 6);
    // B = 3-4 (start 4) and 7-8 (start 7). Coils 1.20 ohm, 2.00 mH, kappa 0.95 (REFERENCE-CHECKS item 5 values).
    private static final List<SyntheticMotor.Coil> EIGHT = List.of(
            new SyntheticMotor.Coil("1", "2", true, false),
            new SyntheticMotor.Coil("3", "4", false, true),
            new SyntheticMotor.Coil("5", "6", true, true),
            new SyntheticMotor.Coil("7", "8", false, false));

    private static WindingInput eightLeadResistances() {
        List<CoilResistance> coils = new ArrayList<>();
        for (SyntheticMotor.Coil c : EIGHT) {
            coils.add(new CoilResistance(new OrientedLeads(c.lead1(), c.lead2()), 1.20));
        }
        return new WindingInput(Topology.EIGHT_LEAD, List.of("1", "2", "3", "4", "5", "6", "7", "8"), coils,
                List.of());
    }

    private static StepInput coilStep(String a, String b, double inductanceH, List<String> joined, double loopOhm) {
        double[] t = SyntheticMotor.times(3000, 10e-6);
        double[] i = SyntheticMotor.rlStep(t, 2.4, loopOhm, inductanceH, 0.2e-3, 0.002, 0, a.hashCode());
        StepResponseFit fit = new StepResponseFitter(2.4, 0.0, null).fit(t, i);
        return new StepInput(new OrientedLeads(a, b), joined, fit);
    }

    private static BackEmfResult eightLeadEmf() {
        double[] theta = SyntheticMotor.handTurnAngleRad(20_000, FS, 3.0);
        return new BackEmfAnalyzer(FS).analyze(SyntheticMotor.backEmf(EIGHT, theta, FS, 50, 0.05, 0.01, 21),
                3.0, null, 1);
    }

    private static List<StepInput> coilSteps() {
        return List.of(coilStep("1", "2", 2.0e-3, List.of(), 1.2), coilStep("3", "4", 2.0e-3, List.of(), 1.2),
                coilStep("5", "6", 2.0e-3, List.of(), 1.2), coilStep("7", "8", 2.0e-3, List.of(), 1.2));
    }

    private static List<String> leadsOf(MotorCard card, String terminal) {
        return card.wiring().terminals().stream().filter(t -> t.terminal().equals(terminal)).findFirst()
                .orElseThrow().leads();
    }

    @Test
    void wiresEightLeadMotorInSeriesWithJoints() {
        MotorCard card = MotorIdentifier.identify(new IdentifyRequest(eightLeadResistances(), coilSteps(),
                eightLeadEmf(), Connection.SERIES, 1.0, 24.0, null));
        assertEquals("8-lead", card.topology());
        assertEquals(List.of("1"), leadsOf(card, "A+"));
        assertEquals(List.of("5"), leadsOf(card, "A-"));
        assertEquals(List.of("4"), leadsOf(card, "B+"));
        assertEquals(List.of("8"), leadsOf(card, "B-"));
        assertEquals(List.of(List.of("2", "6"), List.of("3", "7")), card.wiring().joinTogether());
        assertEquals(50, card.rotorTeeth());
        // REFERENCE-CHECKS item 1: 50 teeth -> 200 full steps, 1.8°
        assertEquals(200, card.fullStepsPerRevolution());
        assertEquals(1.8, card.stepAngleDeg(), 1e-12);
        PhaseCard a = card.phases().get(0);
        // item 5: series R = 2r = 2.40 ohm; with kappa unmeasured L = 2Lc(1+1) = 8.00 mH (assumed, flagged)
        assertEquals(2.40, a.resistanceOhm(), 1e-9);
        assertEquals(8.0e-3, a.inductanceH(), 8.0e-3 * 1e-2);
        assertTrue(card.unknowns().stream().anyMatch(u -> u.what() == Unknown.What.COUPLING_ASSUMED_FULL
                && MotorPhrasing.PLAIN.unknown(u, card.connection()).contains("kappa = 1")));
        // issue 5: a full phase in series has twice the half-winding Ke
        assertEquals(0.05, card.keVsPerRad(), 0.05 * 0.02);
        assertEquals(0.10, a.keVsPerRad(), 0.10 * 0.02);
        // item 15: Kt = Ke (SI) and T = Kt·I at 1.0 A
        assertEquals(card.ktNmPerA(), card.holdingTorqueNm(), 1e-12);
        assertFalse(card.hasError(), card.findings().toString());
    }

    @Test
    void wiresEightLeadMotorInParallelStartsTogether() {
        MotorCard card = MotorIdentifier.identify(new IdentifyRequest(eightLeadResistances(), coilSteps(),
                eightLeadEmf(), Connection.PARALLEL, null, null, null));
        assertEquals(List.of("1", "6"), leadsOf(card, "A+"));
        assertEquals(List.of("2", "5"), leadsOf(card, "A-"));
        assertEquals(List.of("4", "7"), leadsOf(card, "B+"));
        assertEquals(List.of("3", "8"), leadsOf(card, "B-"));
        // item 5: parallel R = r/2 = 0.600 ohm
        assertEquals(0.600, card.phases().get(1).resistanceOhm(), 1e-9);
        assertEquals("rule-of-thumb suggestion", card.supplyBasis());
    }

    @Test
    void measuresCouplingFromSeriesResponse() {
        // item 5: Lc = 2.00 mH and 7.80 mH in series aiding -> kappa = 0.95; series loop 2.4 ohm
        List<StepInput> steps = new ArrayList<>(coilSteps());
        steps.add(coilStep("1", "5", 7.80e-3, List.of("2", "6"), 2.4));
        MotorCard card = MotorIdentifier.identify(new IdentifyRequest(eightLeadResistances(), steps,
                eightLeadEmf(), Connection.SERIES, null, null, null));
        assertEquals(0.95, card.phases().get(0).couplingFactor(), 0.01);
        assertEquals(7.80e-3, card.phases().get(0).inductanceH(), 7.80e-3 * 5e-3);
        assertNull(card.phases().get(1).couplingFactor());
    }

    @Test
    void notesStepResistanceThatDisagreesWithMatrix() {
        // loop of 1.6 ohm with the series resistance not stated: the step says 1.6 ohm, the matrix 1.20 ohm
        List<StepInput> steps = List.of(coilStep("1", "2", 2.0e-3, List.of(), 1.6));
        MotorCard card = MotorIdentifier.identify(new IdentifyRequest(eightLeadResistances(), steps, null, null,
                null, null, null));
        assertTrue(card.findings().stream().anyMatch(f -> f.code().code().equals("step_resistance")), card.findings()
                .toString());
        // the inductance still uses the loop as measured: tau·R_loop = 2.00 mH (item 10)
        assertEquals(2.0e-3, card.stepResponses().get(0).fit().inductanceH(), 2.0e-3 * 5e-3);
    }

    @Test
    void eightLeadWithoutBackEmfCannotBeWired() {
        MotorCard card = MotorIdentifier.identify(new IdentifyRequest(eightLeadResistances(), List.of(), null,
                null, null, null, null));
        assertNull(card.wiring());
        assertTrue(card.unknowns().stream().anyMatch(u -> MotorPhrasing.PLAIN.unknown(u, card.connection())
                .contains("back-EMF")));
        assertNull(card.stepAngleDeg());
    }

    @Test
    void sixLeadFromResistanceAloneWiresEndsAndInsulatesTaps() {
        // item 4: 6-lead, per phase end-tap = r, taps 2 and 5
        WindingInput w = new WindingInput(Topology.SIX_LEAD, List.of("1", "2", "3", "4", "5", "6"), List.of(
                new CoilResistance(new OrientedLeads("1", "2"), 1.2), new CoilResistance(new OrientedLeads("2", "3"), 1.2),
                new CoilResistance(new OrientedLeads("4", "5"), 1.2), new CoilResistance(new OrientedLeads("5", "6"), 1.2)),
                List.of());
        MotorCard card = MotorIdentifier.identify(new IdentifyRequest(w, List.of(), null, null, null, null, null));
        assertEquals(List.of("1"), leadsOf(card, "A+"));
        assertEquals(List.of("3"), leadsOf(card, "A-"));
        assertEquals(List.of("4"), leadsOf(card, "B+"));
        assertEquals(List.of("6"), leadsOf(card, "B-"));
        assertEquals(List.of("2", "5"), card.wiring().insulate());
        assertFalse(card.phases().get(0).polarityKnown());
        MotorCard parallel = MotorIdentifier.identify(new IdentifyRequest(w, List.of(), null, Connection.PARALLEL,
                null, null, null));
        assertNull(parallel.wiring());
        assertTrue(parallel.hasError());
    }

    @Test
    void backEmfContradictingResistancePairingIsAnError() {
        // Resistance says 1-2 and 3-4 are the two windings of a 4-lead motor, but the capture shows 1-2 and 3-4 in
        // phase (as if both were one phase): an error-severity finding.
        WindingInput w = new WindingInput(Topology.SIX_LEAD, List.of("1", "2", "3", "4", "5", "6"), List.of(
                new CoilResistance(new OrientedLeads("1", "2"), 1.2), new CoilResistance(new OrientedLeads("2", "3"), 1.2),
                new CoilResistance(new OrientedLeads("4", "5"), 1.2), new CoilResistance(new OrientedLeads("5", "6"), 1.2)),
                List.of());
        List<SyntheticMotor.Coil> coils = List.of(new SyntheticMotor.Coil("1", "2", true, false),
                new SyntheticMotor.Coil("2", "3", false, false), new SyntheticMotor.Coil("4", "5", true, false),
                new SyntheticMotor.Coil("5", "6", false, false));
        double[] theta = SyntheticMotor.handTurnAngleRad(10_000, FS, 2.0);
        BackEmfResult emf = new BackEmfAnalyzer(FS).analyze(SyntheticMotor.backEmf(coils, theta, FS, 50, 0.05,
                0.005, 5), 2.0, null, 1);
        MotorCard card = MotorIdentifier.identify(new IdentifyRequest(w, List.of(), emf, null, null, null, null));
        assertTrue(card.findings().stream().anyMatch(f -> f.code().code().equals("phase_mismatch")));
        assertTrue(card.hasError());
    }

    @Test
    void predictsNaturalFrequencyWhenInertiaGiven() {
        MotorCard card = MotorIdentifier.identify(new IdentifyRequest(eightLeadResistances(), coilSteps(),
                eightLeadEmf(), Connection.SERIES, 2.0, 24.0, 5.4e-6));
        // item 11: fn = sqrt(Nr·Th/J)/(2 pi) with Th = Kt·I (item 15)
        double expected = Math.sqrt(50 * card.holdingTorqueNm() / 5.4e-6) / (2 * Math.PI);
        assertEquals(expected, card.naturalFrequencyHz(), expected * 1e-9);
    }
}
