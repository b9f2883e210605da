package org.lodestep.report.html;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Set;

/**
 * A small model of how a motor's leads go to a driver, and its drawing: coils (windings or half-windings) with their
 * end leads and optional centre tap, grouped by phase, and where each lead goes: a driver terminal, a tie with other
 * leads (series link), or insulated and unused.
 *
 * <p>Covers 4-, 5-, 6- and 8-lead motors in bipolar series, bipolar parallel, half-coil and unipolar connections. A
 * 5-lead motor's shared common is one lead named as the tap of both coils.
 *
 * <pre>{@code
 * WiringDiagram d = WiringDiagram.builder("Bipolar series, 6-lead")
 *         .coil("A", "Black", "Green", "Yellow").coil("B", "Red", "Blue", "White")
 *         .connect("Black", DriverTerminal.A_PLUS).connect("Green", DriverTerminal.A_MINUS)
 *         .connect("Red", DriverTerminal.B_PLUS).connect("Blue", DriverTerminal.B_MINUS)
 *         .insulate("Yellow").insulate("White")
 *         .build();
 * SvgFragment svg = d.toSvg();
 * }</pre>
 */
public final class WiringDiagram {
    private final String connection;
    private final List<Coil> coils;
    private final Map<String, Destination> destinations;
    private final List<List<String>> ties;
    private final Map<Coil, List<SegmentValue>> values;
    private final List<BrokenCoil> brokenCoils;
    private final boolean startsKnown;

    private WiringDiagram(Builder b) {
        this.connection = b.connection;
        this.values = Map.copyOf(b.values);
        this.brokenCoils = List.copyOf(b.brokenCoils);
        this.startsKnown = b.startsKnown;
        this.coils = List.copyOf(b.coils);
        this.destinations = Map.copyOf(b.destinations);
        List<List<String>> t = new ArrayList<>();
        for (List<String> tie : b.ties) {
            t.add(List.copyOf(tie));
        }
        this.ties = List.copyOf(t);
    }

    /** Starts a diagram; {@code connection} names it ("Bipolar series, 8-lead"). */
    public static Builder builder(String connection) {
        return new Builder(connection);
    }

    /**
     * One coil: a whole winding, or one of the two half-windings of an 8-lead motor's phase.
     *
     * @param phase     "A" or "B"
     * @param startLead the lead at the coil's start (dot end)
     * @param endLead   the lead at its end
     * @param tapLead   the centre tap's lead, or null
     */
    public record Coil(String phase, String startLead, String endLead, String tapLead) {
        public Coil {
            if (!"A".equals(phase) && !"B".equals(phase)) {
                throw new IllegalArgumentException("coil phase must be A or B, got '" + phase + "'");
            }
            requireLabel(startLead, "start lead");
            requireLabel(endLead, "end lead");
            if (tapLead != null) {
                requireLabel(tapLead, "tap lead");
            }
            if (startLead.equals(endLead) || startLead.equals(tapLead) || endLead.equals(tapLead)) {
                throw new IllegalArgumentException("coil of phase " + phase + " names lead '"
                        + (startLead.equals(endLead) || startLead.equals(tapLead) ? startLead : endLead) + "' twice");
            }
        }

        private static void requireLabel(String s, String what) {
            if (s == null || s.isBlank()) {
                throw new IllegalArgumentException(what + " needs a label");
            }
        }
    }

    /**
     * The resistance written beside one segment of a coil (the whole coil, or start-to-tap and tap-to-end).
     *
     * @param text     the value as written, e.g. "2.16 Ω"
     * @param inferred true when it was inferred from other readings, not read: drawn in italics, marked "inferred"
     */
    public record SegmentValue(String text, boolean inferred) {
        public SegmentValue {
            Objects.requireNonNull(text, "text");
        }
    }

    /**
     * A coil that reads open, drawn broken (dashed, with a gap and the word "open"), wired to nothing.
     *
     * @param startLead the lead at its one end
     * @param endLead   the lead at its other end, or null when that end is not known
     * @param endNote   what the unknown end is (e.g. "tap: red or blue"), or null when {@code endLead} is given
     */
    public record BrokenCoil(String startLead, String endLead, String endNote) {
        public BrokenCoil {
            Objects.requireNonNull(startLead, "startLead");
            if ((endLead == null) == (endNote == null)) {
                throw new IllegalArgumentException("a broken coil needs an end lead or a note for its end, not both");
            }
        }
    }

    /** Where one lead goes. */
    sealed interface Destination permits ToTerminal, ToTie, Insulated, Pending {
    }

    /** A lead whose wiring is not known yet: a drawing of the windings a probe session has found so far. */
    record Pending() implements Destination {
    }

    record ToTerminal(DriverTerminal terminal) implements Destination {
    }

    record ToTie(int index) implements Destination {
    }

    record Insulated() implements Destination {
    }

    /** The connection's name. */
    public String connection() {
        return connection;
    }

    /**
     * False when the coil starts (polarity dots) are a guess the measurement could not settle: they are then drawn
     * hollow with a question mark, and the legend says so.
     */
    public boolean startsKnown() {
        return startsKnown;
    }

    /** The coils in drawing order (phase A first). */
    public List<Coil> coils() {
        return coils;
    }

    /** The values written beside {@code coil}'s segments (one, or two for a tapped coil); empty when none. */
    public List<SegmentValue> valuesOf(Coil coil) {
        return values.getOrDefault(coil, List.of());
    }

    /** Coils that read open, drawn broken after the others. */
    public List<BrokenCoil> brokenCoils() {
        return brokenCoils;
    }

    /** The leads wired to {@code terminal}, in coil order (two for a parallel connection). */
    public List<String> leadsAt(DriverTerminal terminal) {
        List<String> out = new ArrayList<>();
        for (String lead : leads()) {
            if (destinations.get(lead) instanceof ToTerminal t && t.terminal() == terminal) {
                out.add(lead);
            }
        }
        return out;
    }

    /** Groups of leads tied together and insulated (series links, joined commons). */
    public List<List<String>> ties() {
        return ties;
    }

    /** Leads insulated and left unconnected. */
    public List<String> insulated() {
        List<String> out = new ArrayList<>();
        for (String lead : leads()) {
            if (destinations.get(lead) instanceof Insulated) {
                out.add(lead);
            }
        }
        return out;
    }

    /** Every distinct lead in coil order. */
    public List<String> leads() {
        Set<String> s = new LinkedHashSet<>();
        for (Coil c : coils) {
            s.add(c.startLead());
            if (c.tapLead() != null) {
                s.add(c.tapLead());
            }
            s.add(c.endLead());
        }
        for (BrokenCoil c : brokenCoils) {
            s.add(c.startLead());
            if (c.endLead() != null) {
                s.add(c.endLead());
            }
        }
        return List.copyOf(s);
    }

    Destination destination(String lead) {
        return destinations.get(lead);
    }

    /** One-line summaries, terminal by terminal, then ties and insulated leads (also printed under the drawing). */
    public List<String> summary() {
        List<String> lines = new ArrayList<>();
        for (DriverTerminal t : DriverTerminal.values()) {
            List<String> at = leadsAt(t);
            if (!at.isEmpty()) {
                lines.add(t.label() + " \u2190 " + String.join(" + ", at) + (at.size() > 1 ? " (joined)" : ""));
            }
        }
        for (int i = 0; i < ties.size(); i++) {
            lines.add("J" + (i + 1) + ": " + String.join(" + ", ties.get(i)) + " tied together, insulated");
        }
        List<String> ins = insulated();
        if (!ins.isEmpty()) {
            lines.add("Insulate, do not connect: " + String.join(", ", ins));
        }
        for (BrokenCoil c : brokenCoils) {
            lines.add("Open coil (drawn broken): " + c.startLead() + " \u2013 "
                    + (c.endLead() != null ? c.endLead() : c.endNote()) + ", no continuity");
        }
        List<String> pending = new ArrayList<>();
        for (String lead : leads()) {
            if (destinations.get(lead) instanceof Pending) {
                pending.add(lead);
            }
        }
        if (!pending.isEmpty()) {
            lines.add("Not wired yet: " + String.join(", ", pending));
        }
        return lines;
    }

    /** The drawing as an {@code <svg>} element. */
    public SvgFragment toSvg() {
        return WiringDiagramSvg.render(this);
    }

    /** Collects coils and lead destinations; {@link #build} checks that every lead goes somewhere exactly once. */
    public static final class Builder {
        private final String connection;
        private final List<Coil> coils = new ArrayList<>();
        private final Map<String, Destination> destinations = new LinkedHashMap<>();
        private final List<List<String>> ties = new ArrayList<>();
        private final Map<Coil, List<SegmentValue>> values = new LinkedHashMap<>();
        private final List<BrokenCoil> brokenCoils = new ArrayList<>();
        private boolean startsKnown = true;

        private Builder(String connection) {
            this.connection = Objects.requireNonNull(connection, "connection");
        }

        /** Marks the coil starts as guessed (resistance alone cannot tell a coil's polarity). */
        public Builder startsUnknown() {
            this.startsKnown = false;
            return this;
        }

        /** A coil without a tap. */
        public Builder coil(String phase, String startLead, String endLead) {
            return coil(phase, startLead, endLead, null);
        }

        /** A coil with a centre tap (tapLead may be null). */
        public Builder coil(String phase, String startLead, String endLead, String tapLead) {
            coils.add(new Coil(phase, startLead, endLead, tapLead));
            return this;
        }

        /**
         * The resistances of the coil added last, written beside it: one value for a coil without a tap, two
         * (start to tap, tap to end) for a tapped one.
         */
        public Builder values(SegmentValue... perSegment) {
            if (coils.isEmpty()) {
                throw new IllegalStateException("values belong to a coil: add the coil first");
            }
            Coil last = coils.get(coils.size() - 1);
            int segments = last.tapLead() == null ? 1 : 2;
            if (perSegment.length != segments) {
                throw new IllegalArgumentException("coil " + last.startLead() + "-" + last.endLead() + " has "
                        + segments + " segment(s), got " + perSegment.length + " value(s)");
            }
            values.put(last, List.of(perSegment));
            return this;
        }

        /** A coil that reads open, drawn broken; its leads still need a destination (insulate them). */
        public Builder brokenCoil(String startLead, String endLead, String endNote) {
            brokenCoils.add(new BrokenCoil(startLead, endLead, endNote));
            return this;
        }

        /** Wires {@code lead} to a driver terminal; two leads on one terminal are joined there (parallel). */
        public Builder connect(String lead, DriverTerminal terminal) {
            return assign(lead, new ToTerminal(Objects.requireNonNull(terminal, "terminal")));
        }

        /** Ties leads together and insulates the joint (the series link of an 8-lead phase). */
        public Builder tie(String... leads) {
            if (leads.length < 2) {
                throw new IllegalArgumentException("a tie needs at least two leads");
            }
            int index = ties.size();
            for (String lead : leads) {
                assign(lead, new ToTie(index));
            }
            ties.add(List.of(leads));
            return this;
        }

        /** Leaves a lead's wiring open: it is drawn on its coil, going nowhere yet. */
        public Builder pending(String lead) {
            return assign(lead, new Pending());
        }

        /** Insulates a lead and leaves it unconnected. */
        public Builder insulate(String lead) {
            return assign(lead, new Insulated());
        }

        private Builder assign(String lead, Destination d) {
            Objects.requireNonNull(lead, "lead");
            Destination old = destinations.putIfAbsent(lead, d);
            if (old != null) {
                throw new IllegalArgumentException("lead '" + lead + "' is given two destinations");
            }
            return this;
        }

        public WiringDiagram build() {
            if (coils.isEmpty() && brokenCoils.isEmpty()) {
                throw new IllegalStateException("a wiring diagram needs at least one coil");
            }
            Set<String> leads = new LinkedHashSet<>();
            Map<String, Integer> uses = new LinkedHashMap<>();
            List<String[]> onCoils = new ArrayList<>();
            for (Coil c : coils) {
                onCoils.add(new String[] {c.startLead(), c.endLead(), c.tapLead()});
            }
            for (BrokenCoil c : brokenCoils) {
                onCoils.add(new String[] {c.startLead(), c.endLead()});
            }
            for (String[] coilLeads : onCoils) {
                for (String l : coilLeads) {
                    if (l != null) {
                        leads.add(l);
                        uses.merge(l, 1, Integer::sum);
                    }
                }
            }
            for (Map.Entry<String, Integer> u : uses.entrySet()) {
                // A lead may appear on two coils only as a shared tap (the 5-lead common).
                if (u.getValue() > 1 && coils.stream().filter(c -> u.getKey().equals(c.tapLead())).count()
                        != u.getValue()) {
                    throw new IllegalArgumentException("lead '" + u.getKey() + "' is on two coils but not as a "
                            + "shared centre tap");
                }
            }
            for (String l : leads) {
                if (!destinations.containsKey(l)) {
                    throw new IllegalArgumentException("lead '" + l + "' has no destination (connect, tie or "
                            + "insulate it)");
                }
            }
            for (String l : destinations.keySet()) {
                if (!leads.contains(l)) {
                    throw new IllegalArgumentException("lead '" + l + "' is wired but is on no coil");
                }
            }
            return new WiringDiagram(this);
        }
    }
}
