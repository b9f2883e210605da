package org.lodestep.wiring;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import java.util.OptionalDouble;
import java.util.TreeMap;

/**
 * The lead-pair resistances measured on one motor, possibly incomplete: each pair is either measured (a finite value
 * in ohms, or open circuit) or not measured at all.
 *
 * <p>A pair may also be inferred rather than read: open because the only healthy layout the readings leave has no
 * coil between its leads (a guided measurement that stopped once the answer was certain). Inferred pairs take part
 * in the analysis like readings but are counted and shown apart from them.
 *
 * <p>Immutable. Lead order is the order in which labels were first given, so output follows the user's own order.
 */
public final class ResistanceMatrix {
    private final List<String> leads;
    private final Map<LeadPair, Double> ohms;
    private final Set<LeadPair> inferred;

    private ResistanceMatrix(List<String> leads, Map<LeadPair, Double> ohms, Set<LeadPair> inferred) {
        this.leads = List.copyOf(leads);
        this.ohms = Collections.unmodifiableMap(new TreeMap<>(ohms));
        this.inferred = Set.copyOf(inferred);
    }

    /** A builder that collects leads and readings. */
    public static Builder builder() {
        return new Builder();
    }

    /** The lead labels, in first-seen order. */
    public List<String> leads() {
        return leads;
    }

    /** Whether the pair's value is known (finite or open), read or inferred. */
    boolean isMeasured(LeadPair p) {
        return ohms.containsKey(p);
    }

    /** Whether the pair's value was inferred from the layout rather than read. */
    public boolean isInferred(LeadPair p) {
        return inferred.contains(p);
    }

    /** Number of pairs actually read (inferred ones not counted). */
    public int readCount() {
        return ohms.size() - inferred.size();
    }

    /** The same matrix without pair {@code p} (inferred pairs stay inferred). */
    ResistanceMatrix without(LeadPair p) {
        Map<LeadPair, Double> m = new LinkedHashMap<>(ohms);
        m.remove(p);
        Set<LeadPair> inf = new LinkedHashSet<>(inferred);
        inf.remove(p);
        return new ResistanceMatrix(leads, m, inf);
    }

    /** The same matrix with pair {@code p} reading {@code resistanceOhm} ({@code +Infinity} = open), as read. */
    ResistanceMatrix with(LeadPair p, double resistanceOhm) {
        Map<LeadPair, Double> m = new LinkedHashMap<>(ohms);
        m.put(p, resistanceOhm);
        Set<LeadPair> inf = new LinkedHashSet<>(inferred);
        inf.remove(p);
        return new ResistanceMatrix(leads, m, inf);
    }

    /** The same matrix with each pair of {@code pairs} inferred open (pairs already known are left as they are). */
    ResistanceMatrix withInferredOpen(List<LeadPair> pairs) {
        Map<LeadPair, Double> m = new LinkedHashMap<>(ohms);
        Set<LeadPair> inf = new LinkedHashSet<>(inferred);
        for (LeadPair p : pairs) {
            if (m.putIfAbsent(p, Double.POSITIVE_INFINITY) == null) {
                inf.add(p);
            }
        }
        return new ResistanceMatrix(leads, m, inf);
    }

    /** Whether the pair was measured and read open circuit. */
    public boolean isOpen(LeadPair p) {
        Double v = ohms.get(p);
        return v != null && v.isInfinite();
    }

    /** The measured resistance in ohms; empty when not measured or open. */
    public OptionalDouble ohms(LeadPair p) {
        Double v = ohms.get(p);
        return v == null || v.isInfinite() ? OptionalDouble.empty() : OptionalDouble.of(v);
    }

    /**
     * Every known pair with its value in ohms ({@code +Infinity} = open), in canonical pair order; inferred pairs
     * included ({@link #isInferred}).
     */
    public Map<LeadPair, Double> readings() {
        return ohms;
    }

    /** All N(N-1)/2 pairs of the leads, in lead order. */
    public List<LeadPair> allPairs() {
        List<LeadPair> out = new ArrayList<>();
        for (int i = 0; i < leads.size(); i++) {
            for (int j = i + 1; j < leads.size(); j++) {
                out.add(LeadPair.of(leads.get(i), leads.get(j)));
            }
        }
        return out;
    }

    /** The pairs not yet measured, in lead order. */
    List<LeadPair> unmeasuredPairs() {
        List<LeadPair> out = new ArrayList<>();
        for (LeadPair p : allPairs()) {
            if (!ohms.containsKey(p)) {
                out.add(p);
            }
        }
        return out;
    }

    /** Collects leads and readings; a pair given twice keeps the later value. */
    public static final class Builder {
        private final LinkedHashSet<String> leads = new LinkedHashSet<>();
        private final Map<LeadPair, Double> ohms = new LinkedHashMap<>();

        private Builder() {
        }

        /** Declares a lead even if no reading mentions it (an isolated lead is a finding, not nothing). */
        public Builder lead(String label) {
            Objects.requireNonNull(label, "label");
            if (label.isBlank()) {
                throw new IllegalArgumentException("lead labels must not be blank");
            }
            leads.add(label);
            return this;
        }

        /** Records a finite reading in ohms. */
        public Builder reading(String x, String y, double resistanceOhm) {
            if (!(resistanceOhm >= 0) || Double.isInfinite(resistanceOhm)) {
                throw new IllegalArgumentException("resistance must be finite and >= 0 ohm: " + resistanceOhm
                        + " ohm for " + x + "-" + y + " (use open() for an open circuit)");
            }
            return put(x, y, resistanceOhm);
        }

        /** Records an open-circuit reading. */
        public Builder open(String x, String y) {
            return put(x, y, Double.POSITIVE_INFINITY);
        }

        /** Records {@code resistanceOhm}, where {@code +Infinity} or an empty value means open. */
        public Builder reading(String x, String y, OptionalDouble resistanceOhm) {
            return resistanceOhm.isPresent() ? reading(x, y, resistanceOhm.getAsDouble()) : open(x, y);
        }

        private Builder put(String x, String y, double v) {
            LeadPair p = LeadPair.of(x, y);
            lead(x);
            lead(y);
            ohms.put(p, v);
            return this;
        }

        public ResistanceMatrix build() {
            return new ResistanceMatrix(new ArrayList<>(leads), ohms, Set.of());
        }
    }
}
