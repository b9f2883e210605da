package org.lodestep.wiring;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Sorts readings into continuity, open and leakage, and groups leads that are joined by continuity.
 *
 * <p>Continuity through copper is transitive, so groups are the connected components of the continuity readings.
 * Two groups are known to be separate once any pair between them reads open (or leakage); until then they might
 * still be one winding.
 */
final class ContinuityGroups {
    /**
     * Highest reading taken as winding continuity whatever the other readings, ohms: two-phase hybrid windings read
     * from a fraction of an ohm to a few hundred ohms (common practice, no published source).
     */
    static final double MAX_WINDING_OHM = 2_000.0;

    /**
     * A winding reading below this is a dead short, not a winding, ohms: the smallest two-phase hybrid windings read
     * a few tenths of an ohm (common practice, no published source).
     */
    static final double SHORT_OHM = 0.02;

    final double continuityLimitOhm;
    final List<List<String>> groups;
    final List<ReadingUse> uses;
    /** For each pair of groups (i &lt; j) not yet known to be separate, the first unmeasured pair between them. */
    final List<LeadPair> undecided;

    ContinuityGroups(ResistanceMatrix m, IdentifySettings s) {
        double min = Double.POSITIVE_INFINITY;
        for (double v : m.readings().values()) {
            // a dead short says nothing about the level of the windings; it is a finding of its own
            if (Double.isFinite(v) && v >= SHORT_OHM) {
                min = Math.min(min, v);
            }
        }
        // A near-zero lowest reading (probes touching) must not make every winding look like leakage; and no
        // stepper winding reads kilo-ohms, so a lone leakage reading is not taken for continuity either.
        continuityLimitOhm = Double.isFinite(min)
                ? Math.min(Math.max(min, s.contactAllowanceOhm() + 0.1) * s.continuityRatio(), MAX_WINDING_OHM)
                : MAX_WINDING_OHM;
        List<String> leads = m.leads();
        Map<String, String> parent = new LinkedHashMap<>();
        for (String l : leads) {
            parent.put(l, l);
        }
        uses = new ArrayList<>();
        for (Map.Entry<LeadPair, Double> e : m.readings().entrySet()) {
            String kind = kindOf(e.getValue());
            uses.add(new ReadingUse(e.getKey(), e.getValue(), kind, !m.isInferred(e.getKey())));
            if (kind.equals("continuity")) {
                union(parent, e.getKey().a(), e.getKey().b());
            }
        }
        Map<String, List<String>> byRoot = new LinkedHashMap<>();
        for (String l : leads) {
            byRoot.computeIfAbsent(find(parent, l), k -> new ArrayList<>()).add(l);
        }
        groups = List.copyOf(byRoot.values());
        undecided = new ArrayList<>();
        for (int i = 0; i < groups.size(); i++) {
            for (int j = i + 1; j < groups.size(); j++) {
                LeadPair firstUnmeasured = null;
                boolean separate = false;
                for (String x : groups.get(i)) {
                    for (String y : groups.get(j)) {
                        LeadPair p = LeadPair.of(x, y);
                        if (m.isMeasured(p)) {
                            separate = true;
                        } else if (firstUnmeasured == null) {
                            firstUnmeasured = p;
                        }
                    }
                }
                if (!separate) {
                    undecided.add(firstUnmeasured);
                }
            }
        }
    }

    /** {@code continuity}, {@code open} or {@code leakage} for a reading in ohms. */
    String kindOf(double ohms) {
        if (Double.isInfinite(ohms)) {
            return "open";
        }
        return ohms <= continuityLimitOhm ? "continuity" : "leakage";
    }

    private static String find(Map<String, String> parent, String x) {
        String p = parent.get(x);
        while (!p.equals(parent.get(p))) {
            p = parent.get(p);
        }
        return p;
    }

    private static void union(Map<String, String> parent, String x, String y) {
        String rx = find(parent, x);
        String ry = find(parent, y);
        if (!rx.equals(ry)) {
            parent.put(ry, rx);
        }
    }
}
