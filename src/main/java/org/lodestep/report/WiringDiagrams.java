package org.lodestep.report;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.lodestep.report.html.DriverTerminal;
import org.lodestep.report.html.WiringDiagram;
import org.lodestep.wiring.DriverWiring;
import org.lodestep.wiring.Identification;
import org.lodestep.wiring.OpenCoil;
import org.lodestep.wiring.Topology;
import org.lodestep.wiring.Winding;

/**
 * Turns a lead identification and one of its driver connections into a {@link WiringDiagram}: windings become coils
 * (phase taken from the terminals their leads go to), the connection's terminals, jumpers and insulated leads become
 * the lead destinations. A 5-lead motor's four half-windings from the common are drawn as two centre-tapped coils
 * sharing the common lead, which is what the motor is inside.
 */
public final class WiringDiagrams {
    private WiringDiagrams() {
    }

    /**
     * The diagram of {@code connection} for the motor of {@code id}.
     *
     * @throws IllegalArgumentException when the connection names a lead or terminal the identification does not have
     */
    public static WiringDiagram of(Identification id, DriverWiring connection) {
        String title = title(id.topology(), connection.name());
        WiringDiagram.Builder b = WiringDiagram.builder(title);
        if (!connection.verified()) {
            // resistance cannot tell which ends are coil starts (nor, 5- and 8-lead, which coils pair): say so
            b.startsUnknown();
        }
        Map<String, List<String>> terminals = connection.terminals();
        if (id.topology() == Topology.FIVE_LEAD) {
            fiveLeadCoils(b, id.windings(), terminals);
        } else {
            List<Winding> windings = id.windings();
            // Phase A first: the windings whose leads reach an A terminal, then the rest.
            List<Winding> a = new ArrayList<>();
            List<Winding> rest = new ArrayList<>();
            for (Winding w : windings) {
                (phaseOf(w, terminals, windings).equals("A") ? a : rest).add(w);
            }
            for (Winding w : a) {
                b.coil("A", w.ends().get(0), w.ends().get(1), w.tap()).values(values(w));
            }
            for (Winding w : rest) {
                b.coil("B", w.ends().get(0), w.ends().get(1), w.tap()).values(values(w));
            }
        }
        Set<String> assigned = brokenCoils(b, id);
        for (Map.Entry<String, List<String>> e : terminals.entrySet()) {
            DriverTerminal t = DriverTerminal.parse(e.getKey());
            for (String lead : e.getValue()) {
                b.connect(lead, t);
            }
        }
        for (List<String> j : connection.jumpers()) {
            b.tie(j.toArray(String[]::new));
        }
        Set<String> onCoils = new LinkedHashSet<>();
        id.windings().forEach(w -> onCoils.addAll(w.leads()));
        for (String lead : connection.insulate()) {
            // a lead of an open coil is insulated with its broken coil; any other lead on no coil is left out
            if (onCoils.contains(lead) && !assigned.contains(lead)) {
                b.insulate(lead);
            }
        }
        return b.build();
    }

    /**
     * The motor as found when no connection works (a 4-lead motor with a phase open): its windings with their
     * values and the open coil drawn broken, every lead insulated; empty when there is nothing to draw that way.
     */
    public static java.util.Optional<WiringDiagram> asFound(Identification id) {
        if (id.openCoils().isEmpty() || !id.connections().isEmpty() || id.topology() == Topology.FIVE_LEAD) {
            return java.util.Optional.empty();
        }
        WiringDiagram.Builder b = WiringDiagram.builder("As found, " + id.topology().label() + ": no connection"
                + " works");
        for (Winding w : id.windings()) {
            b.coil("A", w.ends().get(0), w.ends().get(1), w.tap()).values(values(w));
            w.leads().forEach(b::insulate);
        }
        brokenCoils(b, id);
        return java.util.Optional.of(b.build());
    }

    /** The open coils drawn broken, their leads insulated; returns those leads. */
    private static Set<String> brokenCoils(WiringDiagram.Builder b, Identification id) {
        Set<String> leads = new LinkedHashSet<>();
        for (OpenCoil c : id.openCoils()) {
            boolean known = c.otherEnd().size() == 1;
            b.brokenCoil(c.end(), known ? c.otherEnd().get(0) : null,
                    known ? null : "to the tap: " + String.join(" or ", c.otherEnd()));
            leads.add(c.end());
            if (known) {
                leads.add(c.otherEnd().get(0));
            }
        }
        leads.forEach(b::insulate);
        return leads;
    }

    /** A winding's values as the diagram writes them: the whole, or its two halves, each marked when inferred. */
    private static WiringDiagram.SegmentValue[] values(Winding w) {
        if (w.tap() == null) {
            return new WiringDiagram.SegmentValue[] {
                new WiringDiagram.SegmentValue(LeadsTextReport.ohm(w.resistanceOhm()), !w.resistanceMeasured())};
        }
        return new WiringDiagram.SegmentValue[] {
            new WiringDiagram.SegmentValue(LeadsTextReport.ohm(w.halfResistancesOhm().get(0)),
                    !w.halvesMeasured().get(0)),
            new WiringDiagram.SegmentValue(LeadsTextReport.ohm(w.halfResistancesOhm().get(1)),
                    !w.halvesMeasured().get(1))};
    }

    /**
     * The windings the readings have found so far, before the layout is certain: each a coil with its ends and tap,
     * wired to nothing yet; the phase names are provisional (alternating, in the order the windings were found).
     *
     * @throws IllegalArgumentException when there is no winding yet
     */
    public static WiringDiagram soFar(Identification id) {
        if (id.windings().isEmpty()) {
            throw new IllegalArgumentException("no winding found yet: nothing to draw");
        }
        WiringDiagram.Builder b = WiringDiagram.builder("Windings found so far (phases provisional)");
        Set<String> leads = new LinkedHashSet<>();
        List<Winding> ws = id.windings();
        for (int i = 0; i < ws.size(); i++) {
            Winding w = ws.get(i);
            b.coil(i % 2 == 0 ? "A" : "B", w.ends().get(0), w.ends().get(1), w.tap()).values(values(w));
            leads.addAll(w.leads());
        }
        leads.forEach(b::pending);
        return b.build();
    }

    /** A heading such as "Bipolar series, 6-lead". */
    static String title(Topology t, String connectionName) {
        String n = connectionName.replace('-', ' ');
        n = n.isEmpty() ? n : Character.toUpperCase(n.charAt(0)) + n.substring(1);
        return t == Topology.UNKNOWN ? n : n + ", " + t.label();
    }

    /**
     * The phase of a winding: that of the first terminal one of its leads goes to; a winding on no phase terminal
     * (a series half-winding tied at both ends never is) takes the phase of the winding it is tied to, else B.
     */
    private static String phaseOf(Winding w, Map<String, List<String>> terminals, List<Winding> all) {
        String p = directPhase(w, terminals);
        if (p != null) {
            return p;
        }
        return all.indexOf(w) < all.size() / 2 ? "A" : "B";
    }

    private static String directPhase(Winding w, Map<String, List<String>> terminals) {
        for (Map.Entry<String, List<String>> e : terminals.entrySet()) {
            String phase = DriverTerminal.parse(e.getKey()).phase();
            if (phase.isEmpty()) {
                continue;
            }
            for (String lead : w.leads()) {
                if (e.getValue().contains(lead)) {
                    return phase;
                }
            }
        }
        return null;
    }

    /** The value of the 5-lead coil from the common to {@code end}. */
    private static WiringDiagram.SegmentValue coilValue(List<Winding> halves, String com, String end) {
        for (Winding w : halves) {
            if (w.ends().contains(com) && w.ends().contains(end)) {
                return new WiringDiagram.SegmentValue(LeadsTextReport.ohm(w.resistanceOhm()), !w.resistanceMeasured());
            }
        }
        throw new IllegalArgumentException("no coil from " + com + " to " + end);
    }

    private static void fiveLeadCoils(WiringDiagram.Builder b, List<Winding> halves,
                                      Map<String, List<String>> terminals) {
        Set<String> common = new LinkedHashSet<>(terminals.getOrDefault("COM", List.of()));
        if (common.size() != 1) {
            throw new IllegalArgumentException("a 5-lead connection needs exactly one common lead, got " + common);
        }
        String com = common.iterator().next();
        for (String phase : List.of("A", "B")) {
            List<String> ends = new ArrayList<>();
            for (Winding w : halves) {
                if (phase.equals(directPhase(w, terminals))) {
                    ends.add(w.ends().get(0).equals(com) ? w.ends().get(1) : w.ends().get(0));
                }
            }
            if (ends.size() != 2) {
                throw new IllegalArgumentException("phase " + phase + " of a 5-lead connection needs two half-windings,"
                        + " got " + ends);
            }
            b.coil(phase, ends.get(0), ends.get(1), com).values(coilValue(halves, com, ends.get(0)),
                    coilValue(halves, com, ends.get(1)));
        }
    }
}
