package org.lodestep.wiring;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Random;
import java.util.Set;

import org.junit.jupiter.api.Test;

/**
 * Motors with one open coil keep their layout. The readings come from the coil network itself (series circuits:
 * the resistance between two leads is the sum of the coils on the one path joining them, open when none does;
 * common practice), with the probe contact (0.05 to 0.3 Ω) and ±0.5 % meter noise of {@link SimulatedMotor}, on
 * shuffled labels and coils of 0.6 to 12 Ω.
 */
class FaultyLayoutTest {
    private static final List<String> COLOURS = List.of("black", "green", "red", "blue", "white", "yellow", "orange",
            "brown");

    /** Nodes 0..leads-1 are the leads; higher nodes are internal joints. Coils are edges. */
    private record Network(int leads, int nodes, List<int[]> coils) {
    }

    private static ResistanceMatrix read(Network net, List<String> labels, double coilOhm, Random rnd) {
        ResistanceMatrix.Builder b = ResistanceMatrix.builder();
        labels.forEach(b::lead);
        for (int i = 0; i < net.leads(); i++) {
            for (int j = i + 1; j < net.leads(); j++) {
                int k = coilsBetween(net, i, j);
                if (k < 0) {
                    b.open(labels.get(i), labels.get(j));
                } else {
                    b.reading(labels.get(i), labels.get(j),
                            k * coilOhm * (1 + (rnd.nextDouble() - 0.5) * 0.01) + 0.05 + 0.25 * rnd.nextDouble());
                }
            }
        }
        return b.build();
    }

    /** Coils on the path from a to b (the networks are trees), -1 when no path. */
    private static int coilsBetween(Network net, int a, int b) {
        int[] dist = new int[net.nodes()];
        java.util.Arrays.fill(dist, -1);
        dist[a] = 0;
        ArrayDeque<Integer> q = new ArrayDeque<>(List.of(a));
        while (!q.isEmpty()) {
            int x = q.poll();
            for (int[] c : net.coils()) {
                int y = c[0] == x ? c[1] : c[1] == x ? c[0] : -1;
                if (y >= 0 && dist[y] < 0) {
                    dist[y] = dist[x] + c[2];
                    q.add(y);
                }
            }
        }
        return dist[b];
    }

    private static int[] coil(int a, int b) {
        return new int[] {a, b, 1};
    }

    private static int[] wire(int a, int b) {
        return new int[] {a, b, 0};
    }

    private static Identification identify(Network net, long seed) {
        Random rnd = new Random(seed);
        List<String> labels = SimulatedMotor.shuffled(COLOURS.subList(0, net.leads()), seed);
        double coilOhm = 0.6 + 11.4 * rnd.nextDouble();
        return LeadIdentifier.identify(read(net, labels, coilOhm, rnd), IdentifySettings.DEFAULT);
    }

    private static Set<String> openFindingLeads(Identification id) {
        return id.findings().stream().filter(f -> f.code() == FindingCode.OPEN_WINDING)
                .flatMap(f -> f.leads().stream()).collect(java.util.stream.Collectors.toSet());
    }

    private static List<String> labelsOf(Network net, long seed, int... nodes) {
        List<String> labels = SimulatedMotor.shuffled(COLOURS.subList(0, net.leads()), seed);
        List<String> out = new ArrayList<>();
        for (int n : nodes) {
            out.add(labels.get(n));
        }
        return out;
    }

    @Test
    void fourLeadWithOnePhaseOpenIsFourLead() {
        // phase 0-1 healthy, phase 2-3 open
        Network net = new Network(4, 4, List.of(coil(0, 1)));
        for (long seed = 1; seed <= 20; seed++) {
            Identification id = identify(net, seed);
            assertEquals(Topology.FOUR_LEAD, id.topology());
            assertEquals(new HashSet<>(labelsOf(net, seed, 2, 3)), openFindingLeads(id));
            assertTrue(id.hasError());
            assertTrue(id.connections().isEmpty(), id.connections().toString());
        }
    }

    @Test
    void sixLeadWithOneHalfOpenRunsHalfWindingOnTheHealthyHalves() {
        // winding 0-(tap 1)-2 healthy; winding 3-(tap 4)-5 with its half 4-5 open
        Network net = new Network(6, 6, List.of(coil(0, 1), coil(1, 2), coil(3, 4)));
        for (long seed = 1; seed <= 20; seed++) {
            Identification id = identify(net, seed);
            assertEquals(Topology.SIX_LEAD, id.topology());
            Set<String> open = openFindingLeads(id);
            assertTrue(open.containsAll(labelsOf(net, seed, 5, 3, 4)), open.toString());
            assertEquals(List.of("salvage-bipolar-half-winding"),
                    id.connections().stream().map(DriverWiring::name).toList());
            DriverWiring c = id.connections().get(0);
            // the healthy winding runs tap to one end, the broken one on its healthy half
            assertEquals(Set.of(labelsOf(net, seed, 3, 4).get(0), labelsOf(net, seed, 3, 4).get(1)),
                    Set.of(c.terminals().get("B+").get(0), c.terminals().get("B-").get(0)));
            assertEquals(labelsOf(net, seed, 1).get(0), c.terminals().get("A-").get(0));
            assertTrue(c.insulate().contains(labelsOf(net, seed, 5).get(0)));
        }
    }

    @Test
    void sixLeadWithTheTapLeadBrokenStillRunsSeries() {
        // winding 3-(internal joint 6)-5 whole, its tap lead 4 broken off the joint
        Network net = new Network(6, 7, List.of(coil(0, 1), coil(1, 2), coil(3, 6), coil(6, 5)));
        for (long seed = 1; seed <= 20; seed++) {
            Identification id = identify(net, seed);
            assertEquals(Topology.SIX_LEAD, id.topology());
            assertEquals(Set.of(labelsOf(net, seed, 4).get(0)), openFindingLeads(id));
            assertEquals(List.of("salvage-bipolar-series"), id.connections().stream().map(DriverWiring::name).toList());
        }
    }

    @Test
    void eightLeadWithOneCoilOpenRunsOneCoilPerPhase() {
        Network net = new Network(8, 8, List.of(coil(0, 1), coil(2, 3), coil(4, 5)));
        for (long seed = 1; seed <= 20; seed++) {
            Identification id = identify(net, seed);
            assertEquals(Topology.EIGHT_LEAD, id.topology());
            assertEquals(new HashSet<>(labelsOf(net, seed, 6, 7)), openFindingLeads(id));
            DriverWiring c = id.connections().get(0);
            assertEquals("salvage-bipolar-one-coil-per-phase", c.name());
            assertTrue(!c.verified());
            assertTrue(c.insulate().containsAll(labelsOf(net, seed, 6, 7)));
        }
    }

    @Test
    void fiveLeadWithOneCoilOpenIsFiveLeadAndNamesTheCoil() {
        // common lead 0 with coils to 1, 2 and 3; the coil to 4 open
        Network net = new Network(5, 5, List.of(coil(0, 1), coil(0, 2), coil(0, 3)));
        for (long seed = 1; seed <= 20; seed++) {
            Identification id = identify(net, seed);
            assertEquals(Topology.FIVE_LEAD, id.topology());
            assertEquals(new HashSet<>(labelsOf(net, seed, 0, 4)), openFindingLeads(id));
            assertTrue(id.hasError());
            assertEquals(3, id.windings().size());
            String common = labelsOf(net, seed, 0).get(0);
            assertTrue(id.windings().stream().allMatch(w -> w.ends().get(0).equals(common)), id.windings().toString());
            assertEquals(List.of(new OpenCoil(common, labelsOf(net, seed, 4))),
                    id.openCoils());
            assertTrue(id.connections().isEmpty(), id.connections().toString());
        }
    }

    @Test
    void openCoilsAreGivenForTheSchematic() {
        Network four = new Network(4, 4, List.of(coil(0, 1)));
        assertEquals(List.of(new OpenCoil(labelsOf(four, 3, 2).get(0), labelsOf(four, 3, 3))),
                identify(four, 3).openCoils());
        // the open half of a 6-lead winding runs from the loose lead to the tap, one of the pair's leads
        Network six = new Network(6, 6, List.of(coil(0, 1), coil(1, 2), coil(3, 4)));
        OpenCoil half = identify(six, 4).openCoils().get(0);
        assertEquals(labelsOf(six, 4, 5).get(0), half.end());
        assertEquals(new HashSet<>(labelsOf(six, 4, 3, 4)), new HashSet<>(half.otherEnd()));
        Network tapBroken = new Network(6, 7, List.of(coil(0, 1), coil(1, 2), coil(3, 6), coil(6, 5)));
        assertTrue(identify(tapBroken, 5).openCoils().isEmpty(), "a broken tap lead is no open coil");
    }
}
