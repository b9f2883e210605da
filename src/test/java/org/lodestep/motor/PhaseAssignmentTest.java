package org.lodestep.motor;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.lodestep.wiring.Connection;
import org.lodestep.motor.PhaseAssignment.OrientedCoil;
import org.lodestep.wiring.Topology;

class PhaseAssignmentTest {
    private static final double FS = 10_000;

    private static BackEmfResult emf(List<SyntheticMotor.Coil> coils) {
        double[] theta = SyntheticMotor.handTurnAngleRad(10_000, FS, 1.0);
        return new BackEmfAnalyzer(FS).analyze(SyntheticMotor.backEmf(coils, theta, FS, 50, 0.05, 0.002, 3), 1.0,
                null, 1);
    }

    @Test
    void sixLeadEndToEndChannelsOrientBothHalvesThroughTheTap() {
        // REFERENCE-CHECKS item 4, 6-lead: windings 1-(2)-3 and 4-(5)-6, taps 2 and 5; channels across the ends.
        WindingInput w = new WindingInput(Topology.SIX_LEAD, List.of("1", "2", "3", "4", "5", "6"), List.of(
                new CoilResistance(new OrientedLeads("1", "2"), 1.2), new CoilResistance(new OrientedLeads("2", "3"), 1.2),
                new CoilResistance(new OrientedLeads("4", "5"), 1.2), new CoilResistance(new OrientedLeads("5", "6"), 1.2)),
                List.of());
        BackEmfResult e = emf(List.of(new SyntheticMotor.Coil("1", "3", true, false),
                new SyntheticMotor.Coil("4", "6", false, false)));
        PhaseAssignment.Result r = PhaseAssignment.assign(w, e);
        assertEquals(List.of(new OrientedCoil("1", "2"), new OrientedCoil("2", "3")), r.phaseA());
        assertEquals(List.of(new OrientedCoil("4", "5"), new OrientedCoil("5", "6")), r.phaseB());
        assertTrue(r.polarityKnown());
        assertTrue(r.findings().isEmpty(), r.findings().toString());
        MotorCard card = MotorIdentifier.identify(new IdentifyRequest(w, List.of(), e, Connection.HALF, null, null,
                null));
        // half winding: end to tap; the other end is left unconnected
        assertEquals(List.of("3", "6"), card.wiring().insulate());
        // the synthetic channel across a whole winding has Ke 0.05 V·s/rad, two coils in series: 0.025 each
        assertEquals(0.025, card.keVsPerRad(), 0.025 * 0.02);
    }

    @Test
    void fiveLeadCommonIsSharedByBothPhasesInUnipolar() {
        // item 4, 5-lead: COM = 5, coils 5-1, 5-2 (phase A, in antiphase), 5-3, 5-4 (phase B)
        List<CoilResistance> coils = new ArrayList<>();
        for (String end : List.of("1", "2", "3", "4")) {
            coils.add(new CoilResistance(new OrientedLeads("5", end), 1.2));
        }
        WindingInput w = new WindingInput(Topology.FIVE_LEAD, List.of("1", "2", "3", "4", "5"), coils, List.of());
        BackEmfResult e = emf(List.of(new SyntheticMotor.Coil("5", "1", true, false),
                new SyntheticMotor.Coil("5", "2", true, true), new SyntheticMotor.Coil("5", "3", false, false),
                new SyntheticMotor.Coil("5", "4", false, true)));
        MotorCard card = MotorIdentifier.identify(new IdentifyRequest(w, List.of(), e, null, null, null, null));
        assertEquals("unipolar", card.connection());
        List<String> commons = card.wiring().terminals().stream().filter(t -> t.terminal().endsWith("COM"))
                .flatMap(t -> t.leads().stream()).toList();
        assertEquals(List.of("5", "5"), commons);
        assertTrue(!card.hasError(), card.findings().toString());
    }

    @Test
    void backEmfAloneInfersEightLeads() {
        BackEmfResult e = emf(List.of(new SyntheticMotor.Coil("1", "2", true, false),
                new SyntheticMotor.Coil("3", "4", false, false), new SyntheticMotor.Coil("5", "6", true, false),
                new SyntheticMotor.Coil("7", "8", false, false)));
        PhaseAssignment.Result r = PhaseAssignment.assign(null, e);
        assertEquals(Topology.EIGHT_LEAD, r.topology());
        assertTrue(r.findings().stream().anyMatch(f -> f.code().code().equals("topology_assumed")));
        assertEquals(2, r.phaseA().size());
        assertEquals(2, r.phaseB().size());
    }
}
