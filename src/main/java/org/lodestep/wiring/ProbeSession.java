package org.lodestep.wiring;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * A guided measurement: proposes the next lead pair to measure, records readings (with undo), and says when the
 * answer is certain. Both the interactive {@code leads probe} command and a rig driver sit on it.
 *
 * <p>Planning: for 4, 5, 6 and 8 leads the session keeps every healthy layout still consistent with the readings
 * ({@link MotorHypotheses}) and asks for the pair whose outcome (open, one coil, two coils) splits them most evenly
 * (fewest expected survivors: the sum of squared outcome counts). Once one layout is left, or none fits (a faulty
 * motor, or another lead count), it asks for the pairs {@link LeadIdentifier} still needs, and then (faulty motor) for every
 * remaining pair, so that the findings rest on the whole matrix. Not thread-safe.
 */
public final class ProbeSession {
    /** Largest ratio between per-coil values of one layout's finite readings for them to be the same coil size. */
    static final double COIL_RATIO_LIMIT = 1.45;

    private record Entry(LeadPair pair, double ohms) {
    }

    private final List<String> leads;
    private final IdentifySettings settings;
    private final List<int[][]> layouts;
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

    /** The identification from the readings so far. */
    public Identification result() {
        return LeadIdentifier.identify(matrix(), settings);
    }

    /** Whether the answer is certain: every pair measured, or the readings settle the layout (see class notes). */
    public boolean determined() {
        ResistanceMatrix m = matrix();
        if (m.unmeasuredPairs().isEmpty()) {
            return true;
        }
        return settled(LeadIdentifier.identify(m, settings), consistentLayouts(m));
    }

    /**
     * Certain when the identification needs no more pairs and, for a lead count with known layouts, exactly one
     * layout is left; when none is left the motor is faulty and every pair is measured, so findings see everything.
     */
    private boolean settled(Identification id, List<int[][]> alive) {
        if (!id.determined()) {
            return false;
        }
        return layouts.isEmpty() || alive.size() == 1;
    }

    /** The pair to measure next, or empty once {@link #determined()}. */
    public Optional<LeadPair> nextPair() {
        ResistanceMatrix m = matrix();
        List<LeadPair> unmeasured = m.unmeasuredPairs();
        if (unmeasured.isEmpty()) {
            return Optional.empty();
        }
        Identification id = LeadIdentifier.identify(m, settings);
        List<int[][]> alive = consistentLayouts(m);
        if (settled(id, alive)) {
            return Optional.empty();
        }
        if (alive.size() > 1) {
            LeadPair best = null;
            long bestCost = Long.MAX_VALUE;
            for (LeadPair p : unmeasured) {
                int i = leads.indexOf(p.a());
                int j = leads.indexOf(p.b());
                long[] counts = new long[3];
                for (int[][] k : alive) {
                    counts[k[i][j]]++;
                }
                long cost = counts[0] * counts[0] + counts[1] * counts[1] + counts[2] * counts[2];
                if (cost < bestCost) {
                    bestCost = cost;
                    best = p;
                }
            }
            if (bestCost < (long) alive.size() * alive.size()) {
                return Optional.of(best);
            }
        }
        // One layout left: confirm it, joining predicted windings first (one continuity reading settles many pairs).
        LeadPair fallback = null;
        for (LeadPair p : id.missingPairs()) {
            if (m.isMeasured(p)) {
                continue;
            }
            if (alive.size() == 1 && alive.get(0)[leads.indexOf(p.a())][leads.indexOf(p.b())] > 0) {
                return Optional.of(p);
            }
            if (fallback == null) {
                fallback = p;
            }
        }
        if (fallback != null) {
            return Optional.of(fallback);
        }
        return Optional.of(unmeasured.get(0));
    }

    /** Healthy layouts that agree with every reading so far. */
    List<int[][]> consistentLayouts(ResistanceMatrix m) {
        ContinuityGroups cg = new ContinuityGroups(m, settings);
        List<int[][]> out = new ArrayList<>();
        for (int[][] k : layouts) {
            if (agrees(k, m, cg)) {
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
