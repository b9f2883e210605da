package org.lodestep.motor;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;

import org.lodestep.wiring.Topology;
import org.lodestep.wiring.Finding;

/**
 * Puts the coils of a motor into phases A and B and orients them, from the back-EMF phasing when there is one,
 * otherwise from the resistance topology alone (possible for 4- and 6-lead motors only, with arbitrary polarity).
 * A coil that shares a lead with an oriented coil (the centre tap of a 5- or 6-lead motor) continues it.
 */
final class PhaseAssignment {
    /** One coil, current entering at {@code start}. */
    record OrientedCoil(String start, String end) {
        Set<String> key() {
            return Set.of(start, end);
        }
    }

    /** The result: phases A and B in series order (empty when unknown), whether polarity is measured, findings. */
    record Result(Topology topology, List<String> leads, List<OrientedCoil> phaseA, List<OrientedCoil> phaseB,
                  boolean polarityKnown, List<Finding> findings) {
        boolean complete() {
            return !phaseA.isEmpty() && !phaseB.isEmpty();
        }
    }

    static final Comparator<String> LABEL_ORDER = (a, b) -> {
        boolean na = a.chars().allMatch(Character::isDigit) && !a.isEmpty() && a.length() < 10;
        boolean nb = b.chars().allMatch(Character::isDigit) && !b.isEmpty() && b.length() < 10;
        if (na && nb) {
            return Integer.compare(Integer.parseInt(a), Integer.parseInt(b));
        }
        return a.compareTo(b);
    };

    private PhaseAssignment() {
    }

    static Result assign(WindingInput windings, BackEmfResult emf) {
        List<Finding> findings = new ArrayList<>();
        List<OrientedLeads> coils = new ArrayList<>();
        Set<String> leads = new TreeSet<>(LABEL_ORDER);
        Topology topology;
        if (windings != null) {
            windings.coils().forEach(c -> coils.add(c.leads()));
            leads.addAll(windings.leads());
            topology = windings.topology();
        } else if (emf != null) {
            emf.coils().forEach(c -> coils.add(c.measured()));
            topology = inferTopology(coils);
            if (topology != Topology.UNKNOWN) {
                findings.add(Finding.info(MotorFindingCode.TOPOLOGY_ASSUMED, "no resistance matrix: taken as " + topology.label()
                        + " from the back-EMF channels alone (each channel one coil); measure resistances to confirm"));
            }
        } else {
            topology = Topology.UNKNOWN;
        }
        coils.forEach(c -> {
            leads.add(c.first());
            leads.add(c.second());
        });
        Map<String, String> component = components(coils);

        Map<Set<String>, OrientedCoil> oriented = new LinkedHashMap<>();
        Map<Set<String>, String> phase = new HashMap<>();
        boolean polarityKnown;
        if (emf != null && !emf.coils().isEmpty()) {
            polarityKnown = true;
            for (EmfCoil ec : emf.coils()) {
                String s = ec.oriented().first();
                String e = ec.oriented().second();
                if (has(coils, s, e)) {
                    oriented.put(Set.of(s, e), new OrientedCoil(s, e));
                    phase.put(Set.of(s, e), ec.phase());
                    continue;
                }
                String tap = null;
                for (String c : leads) {
                    if (has(coils, s, c) && has(coils, c, e)) {
                        tap = c;
                    }
                }
                if (tap != null) {
                    oriented.put(Set.of(s, tap), new OrientedCoil(s, tap));
                    oriented.put(Set.of(tap, e), new OrientedCoil(tap, e));
                    phase.put(Set.of(s, tap), ec.phase());
                    phase.put(Set.of(tap, e), ec.phase());
                } else {
                    findings.add(Finding.warning(MotorFindingCode.CHANNEL_UNMATCHED, "back-EMF channel " + ec.measured()
                            + " is not across a coil found by the resistance measurement; ignored"));
                }
            }
            propagate(coils, oriented, phase);
            if (topology != Topology.FIVE_LEAD) {
                Map<String, Set<String>> phasesOfComponent = new HashMap<>();
                for (OrientedLeads c : coils) {
                    String p = phase.get(Set.of(c.first(), c.second()));
                    if (p != null) {
                        phasesOfComponent.computeIfAbsent(component.get(c.first()), k -> new TreeSet<>()).add(p);
                    }
                }
                phasesOfComponent.forEach((root, ps) -> {
                    if (ps.size() > 1) {
                        findings.add(Finding.error(MotorFindingCode.PHASE_MISMATCH, "the resistance measurement joins leads "
                                + membersOf(component, root) + " in one winding, but their back-EMF falls in both "
                                + "phases: recheck the lead labels of the two measurements"));
                    }
                });
            }
            for (OrientedLeads c : coils) {
                if (!phase.containsKey(Set.of(c.first(), c.second()))) {
                    findings.add(Finding.warning(MotorFindingCode.COIL_NOT_PHASED, "coil " + c + " was not in the back-EMF capture; "
                            + "its phase and polarity are unknown"));
                }
            }
        } else {
            polarityKnown = false;
            Set<String> roots = new LinkedHashSet<>();
            for (String l : leads) {
                if (component.containsKey(l)) {
                    roots.add(component.get(l));
                }
            }
            if (roots.size() == 2 && (topology == Topology.FOUR_LEAD || topology == Topology.SIX_LEAD)) {
                List<String> rootList = new ArrayList<>(roots);
                for (int k = 0; k < 2; k++) {
                    String root = rootList.get(k);
                    List<OrientedLeads> mine = coils.stream().filter(c -> component.get(c.first()).equals(root)).toList();
                    List<String> ends = endsOf(mine);
                    String start = ends.isEmpty() ? mine.get(0).first() : ends.get(0);
                    OrientedLeads first = mine.stream().filter(c -> c.first().equals(start) || c.second().equals(start))
                            .findFirst().orElseThrow();
                    OrientedCoil oc = first.first().equals(start) ? new OrientedCoil(first.first(), first.second())
                            : new OrientedCoil(first.second(), first.first());
                    oriented.put(oc.key(), oc);
                    phase.put(oc.key(), k == 0 ? "A" : "B");
                }
                propagate(coils, oriented, phase);
            }
        }
        List<OrientedCoil> a = seriesOrder(oriented, phase, "A");
        List<OrientedCoil> b = seriesOrder(oriented, phase, "B");
        if (topology == Topology.EIGHT_LEAD && emf != null && (a.size() != 2 || b.size() != 2)) {
            findings.add(Finding.error(MotorFindingCode.PAIRING_FAILED, "an 8-lead motor needs two coils in each phase; back-EMF "
                    + "gave " + a.size() + " in A and " + b.size() + " in B"));
        }
        return new Result(topology, List.copyOf(leads), a, b, polarityKnown, findings);
    }

    private static Topology inferTopology(List<OrientedLeads> coils) {
        Set<String> all = new java.util.HashSet<>();
        for (OrientedLeads c : coils) {
            all.add(c.first());
            all.add(c.second());
        }
        boolean disjoint = all.size() == 2 * coils.size();
        if (disjoint && coils.size() == 4) {
            return Topology.EIGHT_LEAD;
        }
        if (disjoint && coils.size() == 2) {
            return Topology.FOUR_LEAD;
        }
        return Topology.UNKNOWN;
    }

    private static boolean has(List<OrientedLeads> coils, String x, String y) {
        for (OrientedLeads c : coils) {
            if ((c.first().equals(x) && c.second().equals(y)) || (c.first().equals(y) && c.second().equals(x))) {
                return true;
            }
        }
        return false;
    }

    /** Orients unphased coils that share a lead (a centre tap) with a phased one, continuing it. */
    private static void propagate(List<OrientedLeads> coils, Map<Set<String>, OrientedCoil> oriented,
                                  Map<Set<String>, String> phase) {
        boolean changed = true;
        while (changed) {
            changed = false;
            for (OrientedLeads c : coils) {
                Set<String> key = Set.of(c.first(), c.second());
                if (oriented.containsKey(key)) {
                    continue;
                }
                for (OrientedCoil o : new ArrayList<>(oriented.values())) {
                    String shared = c.first().equals(o.end()) || c.first().equals(o.start()) ? c.first()
                            : c.second().equals(o.end()) || c.second().equals(o.start()) ? c.second() : null;
                    if (shared == null) {
                        continue;
                    }
                    String other = shared.equals(c.first()) ? c.second() : c.first();
                    OrientedCoil oc = shared.equals(o.end()) ? new OrientedCoil(shared, other)
                            : new OrientedCoil(other, shared);
                    oriented.put(key, oc);
                    phase.put(key, phase.get(o.key()));
                    changed = true;
                    break;
                }
            }
        }
    }

    /** Coils of one phase, chained ones in current order (end of one = start of next), else by start label. */
    private static List<OrientedCoil> seriesOrder(Map<Set<String>, OrientedCoil> oriented,
                                                  Map<Set<String>, String> phase, String name) {
        List<OrientedCoil> mine = new ArrayList<>();
        oriented.forEach((k, v) -> {
            if (name.equals(phase.get(k))) {
                mine.add(v);
            }
        });
        mine.sort(Comparator.comparing(OrientedCoil::start, LABEL_ORDER));
        if (mine.size() == 2 && mine.get(1).end().equals(mine.get(0).start())) {
            return List.of(mine.get(1), mine.get(0));
        }
        if (mine.size() == 2 && !mine.get(0).end().equals(mine.get(1).start())) {
            // separate coils: the one with the lowest lead label first
            String low0 = min(mine.get(0));
            String low1 = min(mine.get(1));
            if (LABEL_ORDER.compare(low1, low0) < 0) {
                return List.of(mine.get(1), mine.get(0));
            }
        }
        return mine;
    }

    private static String min(OrientedCoil c) {
        return LABEL_ORDER.compare(c.start(), c.end()) <= 0 ? c.start() : c.end();
    }

    /** Union-find over leads: each lead mapped to its component's root label. */
    private static Map<String, String> components(List<OrientedLeads> coils) {
        Map<String, String> parent = new HashMap<>();
        for (OrientedLeads c : coils) {
            parent.putIfAbsent(c.first(), c.first());
            parent.putIfAbsent(c.second(), c.second());
            String ra = root(parent, c.first());
            String rb = root(parent, c.second());
            if (!ra.equals(rb)) {
                if (LABEL_ORDER.compare(ra, rb) < 0) {
                    parent.put(rb, ra);
                } else {
                    parent.put(ra, rb);
                }
            }
        }
        Map<String, String> out = new HashMap<>();
        for (String l : parent.keySet()) {
            out.put(l, root(parent, l));
        }
        return out;
    }

    private static String root(Map<String, String> parent, String x) {
        while (!parent.get(x).equals(x)) {
            x = parent.get(x);
        }
        return x;
    }

    private static String membersOf(Map<String, String> component, String root) {
        Set<String> m = new TreeSet<>(LABEL_ORDER);
        component.forEach((l, r) -> {
            if (r.equals(root)) {
                m.add(l);
            }
        });
        return String.join(", ", m);
    }

    /** Leads that appear in only one coil of the group, in label order (the winding ends; the tap is excluded). */
    private static List<String> endsOf(List<OrientedLeads> group) {
        Map<String, Integer> count = new HashMap<>();
        for (OrientedLeads c : group) {
            count.merge(c.first(), 1, Integer::sum);
            count.merge(c.second(), 1, Integer::sum);
        }
        List<String> ends = new ArrayList<>();
        count.forEach((l, n) -> {
            if (n == 1) {
                ends.add(l);
            }
        });
        ends.sort(LABEL_ORDER);
        return ends;
    }
}
