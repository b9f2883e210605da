package org.lodestep.wiring;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * A guided measurement: proposes the next lead pair to measure, records readings (with undo), and says when the
 * answer is certain. Both the interactive {@code leads probe} command and a rig driver sit on it.
 *
 * <p>Planning, for 4, 5, 6 and 8 leads: the session keeps every healthy layout still consistent with the readings
 * ({@link MotorHypotheses}; each arises from the same number of labelings, so they are equally likely) and stops once
 * one is left and every winding's resistance has been read from its own coils ({@link
 * MotorHypotheses#windingReadings}). A pair whose answer the readings already imply for a healthy motor is never
 * asked, unless it reads a winding not yet read; so the separation of two windings is inferred from the layout, not
 * proved by an open reading, and is shown as inferred. The next pair is the one that minimises the expected number
 * of readings still to take after it (one step of lookahead), with the remaining cost of a set of layouts estimated
 * by the larger of two lower bounds: the windings still to read, and log_b of the number of layouts, b being the
 * outcomes one reading can have (open, one coil, two coils in series). The second is the source-coding bound: a
 * sequence of b-way readings that singles out one of |A| equally likely layouts is a b-ary prefix code for them, so
 * its expected length is at least the entropy log_b |A| (Cover and Thomas, Elements of Information Theory, 2nd ed.,
 * theorem 5.3.1; references §29). Outcomes are predicted as the session sees them: the first coil readings give
 * only the ratio between coil counts, not the counts.
 *
 * <p>When a reading contradicts every healthy layout (a faulty motor), the session asks for the pairs the
 * identification still needs to settle the groups, and then for every remaining pair, so that the findings rest on
 * the whole matrix. Lead counts without a layout table ask for the identification's missing pairs. Not thread-safe.
 */
public final class ProbeSession {
    /** Largest ratio between per-coil values of one layout's finite readings for them to be the same coil size. */
    static final double COIL_RATIO_LIMIT = 1.45;

    private record Entry(LeadPair pair, double ohms) {
    }

    private final List<String> leads;
    private final IdentifySettings settings;
    private final List<int[][]> layouts;
    private final List<List<long[]>> windingReadings;
    /** Outcomes one reading can have over the layouts: the base of the information bound. */
    private final int outcomes;
    private final Deque<Entry> entries = new ArrayDeque<>();

    /**
     * @param leads    the lead labels, at least two, distinct
     * @param settings identification settings
     */
    public ProbeSession(List<String> leads, IdentifySettings settings) {
        if (leads.size() < 2) {
            throw new IllegalArgumentException("need at least 2 leads, got " + leads.size());
        }
        if (leads.stream().distinct().count() != leads.size()) {
            throw new IllegalArgumentException("lead labels must be distinct: " + leads);
        }
        for (String l : leads) {
            if (l == null || l.isBlank()) {
                throw new IllegalArgumentException("lead labels must not be blank: " + leads);
            }
        }
        this.leads = List.copyOf(leads);
        this.settings = settings;
        this.layouts = MotorHypotheses.forLeads(leads.size());
        this.windingReadings = layouts.stream().map(MotorHypotheses::windingReadings).toList();
        java.util.Set<Integer> seen = new java.util.HashSet<>();
        for (int[][] k : layouts) {
            for (int i = 0; i < k.length; i++) {
                for (int j = i + 1; j < k.length; j++) {
                    seen.add(k[i][j]);
                }
            }
        }
        this.outcomes = Math.max(2, seen.size());
    }

    /** The lead labels. */
    public List<String> leads() {
        return leads;
    }

    /** Records a reading: {@code ohms} empty means open circuit. A pair measured again replaces the earlier value. */
    public void record(LeadPair pair, OptionalDouble ohms) {
        if (!leads.contains(pair.a()) || !leads.contains(pair.b())) {
            throw new IllegalArgumentException("unknown lead in " + pair + "; leads are " + String.join(", ", leads));
        }
        double v = ohms.isPresent() ? ohms.getAsDouble() : Double.POSITIVE_INFINITY;
        if (!(v >= 0) || (ohms.isPresent() && Double.isInfinite(v))) {
            throw new IllegalArgumentException("resistance must be finite and >= 0 ohm: " + v);
        }
        entries.push(new Entry(pair, v));
    }

    /** Withdraws the last reading; false when there is none. */
    public boolean undo() {
        return entries.poll() != null;
    }

    /** Readings recorded so far (a pair measured twice counts once). */
    public int readingCount() {
        return matrix().readings().size();
    }

    /** The readings so far as a matrix. */
    public ResistanceMatrix matrix() {
        ResistanceMatrix.Builder b = ResistanceMatrix.builder();
        leads.forEach(b::lead);
        List<Entry> inOrder = new ArrayList<>(entries);
        java.util.Collections.reverse(inOrder);
        for (Entry e : inOrder) {
            if (Double.isInfinite(e.ohms())) {
                b.open(e.pair().a(), e.pair().b());
            } else {
                b.reading(e.pair().a(), e.pair().b(), e.ohms());
            }
        }
        return b.build();
    }

    /**
     * The identification from the readings so far; once one healthy layout is left with every winding read, the
     * pairs it leaves open without a reading are added as inferred.
     */
    public Identification result() {
        return LeadIdentifier.identify(completed(matrix()), settings);
    }

    /** Whether the answer is certain: every pair measured, or the readings settle the layout (see class notes). */
    public boolean determined() {
        return nextPair().isEmpty();
    }

    /** The pair to measure next, or empty once {@link #determined()}. */
    public Optional<LeadPair> nextPair() {
        ResistanceMatrix m = matrix();
        List<LeadPair> unmeasured = m.unmeasuredPairs();
        if (unmeasured.isEmpty()) {
            return Optional.empty();
        }
        List<Integer> alive = consistentLayouts(m);
        long read = readMask(m);
        if (!alive.isEmpty() && !(alive.size() == 1 && unread(alive.get(0), read) == 0)) {
            Optional<LeadPair> planned = planned(alive, m, unmeasured, read);
            if (planned.isPresent()) {
                return planned;
            }
        }
        Identification id = LeadIdentifier.identify(completed(m), settings);
        boolean healthyAndSettled = alive.size() == 1 && unread(alive.get(0), read) == 0;
        if ((layouts.isEmpty() || healthyAndSettled) && id.determined()) {
            return Optional.empty();
        }
        // A faulty motor (no healthy layout left), or a layout the readings do not yet settle for the identifier:
        // what the identification still needs first, then (faulty motor) every remaining pair.
        for (LeadPair p : id.missingPairs()) {
            if (!m.isMeasured(p)) {
                return Optional.of(p);
            }
        }
        return Optional.of(unmeasured.get(0));
    }

    /** The pair with the fewest expected readings after it, or empty when no pair can tell or read anything. */
    private Optional<LeadPair> planned(List<Integer> alive, ResistanceMatrix m, List<LeadPair> unmeasured,
                                       long read) {
        List<LeadPair> known = new ArrayList<>(m.readings().keySet());
        LeadPair best = null;
        double bestCost = Double.POSITIVE_INFINITY;
        for (LeadPair p : unmeasured) {
            int i = leads.indexOf(p.a());
            int j = leads.indexOf(p.b());
            long after = read | MotorHypotheses.bit(i, j);
            Map<Long, List<Integer>> outcomesSeen = new java.util.LinkedHashMap<>();
            boolean readsWinding = false;
            for (int k : alive) {
                outcomesSeen.computeIfAbsent(seenAs(layouts.get(k), known, i, j), x -> new ArrayList<>()).add(k);
                readsWinding |= unread(k, after) < unread(k, read);
            }
            if (outcomesSeen.size() == 1 && !readsWinding) {
                continue; // the answer is already implied and reads no winding: never asked
            }
            double cost = 1;
            for (List<Integer> group : outcomesSeen.values()) {
                cost += (double) group.size() / alive.size() * remainingBound(group, after);
            }
            if (cost < bestCost - 1e-9) {
                bestCost = cost;
                best = p;
            }
        }
        return Optional.ofNullable(best);
    }

    /** Lower bound on the readings still needed once {@code group} is left and the pairs in {@code read} are read. */
    private double remainingBound(List<Integer> group, long read) {
        double windings = 0;
        for (int k : group) {
            windings += unread(k, read);
        }
        return Math.max(windings / group.size(), Math.log(group.size()) / Math.log(outcomes));
    }

    /** Readings layout {@code k} still needs for every winding's resistance, given the pairs read. */
    private int unread(int k, long read) {
        int n = 0;
        for (long[] ways : windingReadings.get(k)) {
            int fewest = Integer.MAX_VALUE;
            for (long w : ways) {
                fewest = Math.min(fewest, Long.bitCount(w & ~read));
            }
            n += fewest;
        }
        return n;
    }

    private long readMask(ResistanceMatrix m) {
        long mask = 0;
        for (LeadPair p : m.readings().keySet()) {
            mask |= MotorHypotheses.bit(leads.indexOf(p.a()), leads.indexOf(p.b()));
        }
        return mask;
    }

    /**
     * What the readings of {@code known} and pair (i, j) would look like on layout {@code k}: open or the coil count
     * of each, where coil counts that are all equal are seen only as continuity (their scale is unknown).
     */
    private long seenAs(int[][] k, List<LeadPair> known, int i, int j) {
        int[] counts = new int[known.size() + 1];
        for (int q = 0; q < known.size(); q++) {
            counts[q] = k[leads.indexOf(known.get(q).a())][leads.indexOf(known.get(q).b())];
        }
        counts[known.size()] = k[i][j];
        int level = 0;
        boolean oneLevel = true;
        for (int c : counts) {
            if (c > 0) {
                oneLevel &= level == 0 || level == c;
                level = c;
            }
        }
        long key = 0;
        for (int c : counts) {
            key = key * 3 + (oneLevel && c > 0 ? 1 : c);
        }
        return key;
    }

    /**
     * The matrix with the pairs that the only healthy layout left leaves without a coil inferred open, once that
     * layout has every winding read; otherwise the matrix as read.
     */
    private ResistanceMatrix completed(ResistanceMatrix m) {
        List<Integer> alive = consistentLayouts(m);
        if (alive.size() != 1 || unread(alive.get(0), readMask(m)) != 0) {
            return m;
        }
        int[][] k = layouts.get(alive.get(0));
        List<LeadPair> open = new ArrayList<>();
        for (LeadPair p : m.unmeasuredPairs()) {
            if (k[leads.indexOf(p.a())][leads.indexOf(p.b())] == 0) {
                open.add(p);
            }
        }
        return m.withInferredOpen(open);
    }

    /** Indices of the healthy layouts that agree with every reading so far. */
    List<Integer> consistentLayouts(ResistanceMatrix m) {
        ContinuityGroups cg = new ContinuityGroups(m, settings);
        List<Integer> out = new ArrayList<>();
        for (int k = 0; k < layouts.size(); k++) {
            if (agrees(layouts.get(k), m, cg)) {
                out.add(k);
            }
        }
        return out;
    }

    private boolean agrees(int[][] k, ResistanceMatrix m, ContinuityGroups cg) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = 0;
        for (var e : m.readings().entrySet()) {
            int i = leads.indexOf(e.getKey().a());
            int j = leads.indexOf(e.getKey().b());
            boolean continuity = cg.kindOf(e.getValue()).equals("continuity");
            if (continuity != (k[i][j] > 0)) {
                return false;
            }
            if (continuity) {
                double perCoil = e.getValue() / k[i][j];
                lo = Math.min(lo, perCoil);
                hi = Math.max(hi, perCoil);
            }
        }
        return hi == 0 || hi <= lo * COIL_RATIO_LIMIT || lo == 0;
    }
}
