package org.lodestep.wiring;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * Works out windings, centre taps, topology, findings and driver connections from lead-pair resistances, complete or
 * not.
 *
 * <p>Method (circuit topology, common practice; references §4): leads joined by continuity form a group;
 * a group of two is one winding (or one half-winding of an 8-lead motor), a group of three is a centre-tapped winding
 * whose tap reads about half the end-to-end resistance to both ends, a group of five is four half-windings sharing
 * one common lead (of four on a 5-lead motor, three coils on it with the fourth open). The tap or common lead is found by fitting coil resistances (see {@link HubFit}), which tolerates
 * meter noise and probe contact resistance and works from a spanning subset of the readings.
 */
public final class LeadIdentifier {

    private LeadIdentifier() {
    }

    /** Identifies the motor from the readings with the given settings. */
    public static Identification identify(ResistanceMatrix m, IdentifySettings s) {
        Identification asRead = identifyAsRead(m, s);
        return SingleSlip.find(m, s, asRead, LeadIdentifier::identifyAsRead).orElse(asRead);
    }

    /** Identifies the readings as they are, trusting each one. */
    static Identification identifyAsRead(ResistanceMatrix m, IdentifySettings s) {
        ContinuityGroups cg = new ContinuityGroups(m, s);
        List<LeadPair> missing = new ArrayList<>(cg.undecided);
        List<Finding> findings = new ArrayList<>();
        List<Winding> windings = new ArrayList<>();
        List<String> singletons = new ArrayList<>();
        List<Integer> sizes = new ArrayList<>();
        boolean allStructured = true;
        for (List<String> g : cg.groups) {
            sizes.add(g.size());
            findings.addAll(WindingChecks.openInsideGroup(g, m));
            // Four leads joined on a 5-lead motor: three coils on the common lead, the fourth open.
            int shape = g.size() == 4 && m.leads().size() == 5 ? 5 : g.size();
            switch (shape) {
                case 1 -> singletons.add(g.get(0));
                case 2 -> windings.add(new Winding(g, m.ohms(LeadPair.of(g.get(0), g.get(1))).getAsDouble(), false,
                        true));
                case 3, 5 -> {
                    HubFit fit = new HubFit(g, m, s.contactAllowanceOhm());
                    if (fit.best != null) {
                        windings.addAll(WindingChecks.windingsOf(fit.best, m));
                        findings.addAll(WindingChecks.seriesChecks(fit.best, m, s));
                    } else {
                        allStructured = false;
                        List<LeadPair> unmeasured = unmeasuredWithin(g, m);
                        missing.addAll(unmeasured);
                        if (unmeasured.isEmpty()) {
                            findings.add(WindingChecks.unfitGroup(g));
                        }
                    }
                }
                default -> {
                    allStructured = false;
                    List<LeadPair> unmeasured = unmeasuredWithin(g, m);
                    missing.addAll(unmeasured);
                    if (unmeasured.isEmpty()) {
                        findings.add(WindingChecks.unfitGroup(g));
                    }
                }
            }
        }
        boolean groupsDecided = cg.undecided.isEmpty();
        Topology topology = groupsDecided && allStructured ? topologyOf(sizes) : Topology.UNKNOWN;
        if (topology == Topology.EIGHT_LEAD) {
            windings = windings.stream().map(w -> new Winding(w.ends(), w.resistanceOhm(), true, true))
                    .toList();
        }
        for (Winding w : windings) {
            WindingChecks.shorted(w).ifPresent(findings::add);
        }
        findings.addAll(WindingChecks.leakage(cg.uses.stream().filter(u -> u.kind().equals("leakage")).toList(),
                windings, cg.continuityLimitOhm));
        List<DriverWiring> salvage = null;
        List<OpenCoil> openCoils = List.of();
        if (groupsDecided && !singletons.isEmpty()) {
            var faulty = topology == Topology.UNKNOWN && allStructured
                    ? FaultyLayout.infer(m.leads().size(), cg.groups, windings) : java.util.Optional.<FaultyLayout.Inference>empty();
            if (faulty.isPresent()) {
                topology = faulty.get().topology();
                windings = faulty.get().windings();
                salvage = faulty.get().salvage();
                openCoils = faulty.get().openCoils();
                findings.add(new Finding(FindingCode.OPEN_WINDING, Severity.ERROR, faulty.get().message(),
                        faulty.get().openLeads()));
            } else {
                findings.add(WindingChecks.openWinding(singletons, windings, m.leads().size()));
            }
        }
        if (salvage == null) {
            WindingChecks.imbalance(topology, windings, s).ifPresent(findings::add);
        }
        findings.sort(Comparator.comparing(Finding::severity).reversed());

        List<Double> atReference = new ArrayList<>();
        TemperatureCorrection temperature = null;
        if (Double.isFinite(s.ambientC())) {
            temperature = new TemperatureCorrection(s.ambientC(), s.referenceC(), s.copper().kC(),
                    s.copper().standard());
            for (Winding w : windings) {
                atReference.add(CopperTemperature.correct(w.resistanceOhm(), s.ambientC(), s.referenceC(), s.copper()));
            }
        }
        List<LeadPair> distinctMissing = missing.stream().distinct().toList();
        return new Identification(m.leads(), topology, windings, atReference, temperature, findings,
                salvage != null ? salvage : ConnectionGuide.connections(topology, windings), distinctMissing, distinctMissing.isEmpty(), cg.uses,
                m.readCount(), m.allPairs().size(), openCoils);
    }

    private static List<LeadPair> unmeasuredWithin(List<String> g, ResistanceMatrix m) {
        List<LeadPair> out = new ArrayList<>();
        for (int i = 0; i < g.size(); i++) {
            for (int j = i + 1; j < g.size(); j++) {
                LeadPair p = LeadPair.of(g.get(i), g.get(j));
                if (!m.isMeasured(p)) {
                    out.add(p);
                }
            }
        }
        return out;
    }

    private static Topology topologyOf(List<Integer> sizes) {
        List<Integer> sorted = sizes.stream().sorted().toList();
        if (sorted.equals(List.of(2, 2))) {
            return Topology.FOUR_LEAD;
        }
        if (sorted.equals(List.of(5))) {
            return Topology.FIVE_LEAD;
        }
        if (sorted.equals(List.of(3, 3))) {
            return Topology.SIX_LEAD;
        }
        if (sorted.equals(List.of(2, 2, 2, 2))) {
            return Topology.EIGHT_LEAD;
        }
        return Topology.UNKNOWN;
    }
}
