package org.lodestep.wiring;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.Random;

import org.junit.jupiter.api.Test;

/**
 * One slipped reading on a healthy matrix is named and does not spoil the layout. Matrices come from
 * {@link SimulatedMotor} (series circuits, contact 0.05 to 0.3 Ω, ±0.5 % noise) on random layouts and labels; every
 * coil reading of each matrix is slipped in turn.
 */
class SingleSlipTest {
    private static final List<String> LABELS = List.of("1", "2", "3", "4", "5", "6", "7", "8");
    private static final Map<Integer, Topology> TOPOLOGY = Map.of(5, Topology.FIVE_LEAD, 6, Topology.SIX_LEAD, 8,
            Topology.EIGHT_LEAD);

    private static ResistanceMatrix replaced(ResistanceMatrix m, LeadPair p, double ohms) {
        ResistanceMatrix.Builder b = ResistanceMatrix.builder();
        m.leads().forEach(b::lead);
        m.readings().forEach((q, v) -> {
            double x = q.equals(p) ? ohms : v;
            if (Double.isInfinite(x)) {
                b.open(q.a(), q.b());
            } else {
                b.reading(q.a(), q.b(), x);
            }
        });
        return b.build();
    }

    private static Finding slipFinding(Identification id) {
        return id.findings().stream().filter(f -> f.code() == FindingCode.INCONSISTENT_MATRIX
                && f.message().contains("other readings predict")).findFirst().orElse(null);
    }

    @Test
    void everyDecimalSlipOnRandomHealthyMatricesIsNamed() {
        Random rnd = new Random(42);
        for (int leads : List.of(5, 6, 8)) {
            int layouts = MotorHypotheses.forLeads(leads).size();
            for (int k = 0; k < 4; k++) {
                List<String> labels = SimulatedMotor.shuffled(LABELS.subList(0, leads), rnd.nextLong());
                SimulatedMotor motor = SimulatedMotor.layout(labels, rnd.nextInt(layouts), 2 + 10 * rnd.nextDouble());
                ResistanceMatrix healthy = motor.matrix(rnd, List.of());
                for (Map.Entry<LeadPair, Double> e : healthy.readings().entrySet()) {
                    if (Double.isInfinite(e.getValue())) {
                        continue;
                    }
                    for (double factor : new double[] {10, 0.1}) {
                        ResistanceMatrix m = replaced(healthy, e.getKey(), e.getValue() * factor);
                        Identification id = LeadIdentifier.identify(m, IdentifySettings.DEFAULT);
                        String what = leads + " leads, " + e.getKey() + " x" + factor + ": " + id.findings();
                        assertEquals(TOPOLOGY.get(leads), id.topology(), what);
                        Finding f = slipFinding(id);
                        assertTrue(f != null, what);
                        assertEquals(List.of(e.getKey().a(), e.getKey().b()), f.leads(), what);
                        assertTrue(f.message().contains("decimal slip"), what);
                        assertFalse(id.hasError(), what);
                    }
                }
            }
        }
    }

    @Test
    void fiveLeadSlipOfTheIssueIsNamedWithItsPrediction() {
        // Common lead 1, coils of 4.9 Ω: ends read two coils in series, 9.8 Ω; 2-5 typed as 98.12 Ω.
        ResistanceMatrix.Builder b = ResistanceMatrix.builder();
        for (int i = 1; i <= 5; i++) {
            for (int j = i + 1; j <= 5; j++) {
                b.reading(String.valueOf(i), String.valueOf(j), i == 1 ? 4.91 : 9.81);
            }
        }
        ResistanceMatrix m = replaced(b.build(), LeadPair.of("2", "5"), 98.12);
        Identification id = LeadIdentifier.identify(m, IdentifySettings.DEFAULT);
        assertEquals(Topology.FIVE_LEAD, id.topology());
        Finding f = slipFinding(id);
        assertTrue(f.message().contains("98.1 Ω") && f.message().contains("9.8"), f.message());
        assertTrue(id.readings().stream().anyMatch(u -> u.kind().equals("suspect")));
    }

    @Test
    void leakageBetweenWindingsStaysLeakage() {
        // 47 kΩ between two windings of a 6-lead motor: no coil joins them, so only leakage explains it.
        Random rnd = new Random(3);
        SimulatedMotor motor = SimulatedMotor.layout(LABELS.subList(0, 6), 0, 3.0);
        ResistanceMatrix healthy = motor.matrix(rnd, List.of());
        LeadPair between = healthy.readings().entrySet().stream().filter(e -> Double.isInfinite(e.getValue()))
                .findFirst().orElseThrow().getKey();
        Identification id = LeadIdentifier.identify(replaced(healthy, between, 47_000), IdentifySettings.DEFAULT);
        assertTrue(id.findings().stream().anyMatch(f -> f.code() == FindingCode.PHASE_LEAKAGE), id.findings()
                .toString());
        assertEquals(null, slipFinding(id));
    }

    @Test
    void twoSlipsKeepTheMatrixAsRead() {
        Random rnd = new Random(4);
        SimulatedMotor motor = SimulatedMotor.layout(LABELS.subList(0, 5), 2, 5.0);
        ResistanceMatrix healthy = motor.matrix(rnd, List.of());
        List<LeadPair> coils = healthy.readings().keySet().stream().toList();
        ResistanceMatrix m = replaced(replaced(healthy, coils.get(0), healthy.readings().get(coils.get(0)) * 10),
                coils.get(5), healthy.readings().get(coils.get(5)) * 10);
        Identification id = LeadIdentifier.identify(m, IdentifySettings.DEFAULT);
        assertEquals(null, slipFinding(id));
    }
}
