package org.lodestep.wiring;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.stream.Stream;

/**
 * Builds windings from a fitted group and the findings about them: series relations, tap symmetry, phase balance,
 * leakage and open windings.
 *
 * <p>Series relation (circuit topology): end-to-end = half 1 + half 2. Probe contact adds 0 to
 * {@code contactAllowanceOhm} to every reading, so end-to-end − (half 1 + half 2) lies between −2·allowance and
 * +allowance, plus 2 % of the reading for the meter. Imbalance = (max − min)/mean (common practice, from the circuit
 * topology, references §4).
 */
final class WindingChecks {
    private static final double METER_FRACTION = 0.02;

    private WindingChecks() {
    }

    static List<Winding> windingsOf(HubFit.Candidate c, ResistanceMatrix m) {
        List<Winding> out = new ArrayList<>();
        if (c.ends().size() == 2) {
            String e1 = c.ends().get(0);
            String e2 = c.ends().get(1);
            // A half not read is the fitted coil (with the whole and the other half read: their difference).
            OptionalDouble r1 = m.ohms(LeadPair.of(c.hub(), e1));
            OptionalDouble r2 = m.ohms(LeadPair.of(c.hub(), e2));
            double h1 = r1.orElse(c.coilOhm()[0]);
            double h2 = r2.orElse(c.coilOhm()[1]);
            OptionalDouble measured = m.ohms(LeadPair.of(e1, e2));
            out.add(new Winding(List.of(e1, e2), c.hub(), measured.orElse(h1 + h2), List.of(h1, h2), false,
                    measured.isPresent(), List.of(r1.isPresent(), r2.isPresent())));
        } else {
            for (int i = 0; i < c.ends().size(); i++) {
                String e = c.ends().get(i);
                OptionalDouble measured = m.ohms(LeadPair.of(c.hub(), e));
                out.add(new Winding(List.of(c.hub(), e), measured.orElse(c.coilOhm()[i]), true,
                        measured.isPresent()));
            }
        }
        return out;
    }

    static List<Finding> seriesChecks(HubFit.Candidate c, ResistanceMatrix m, IdentifySettings s) {
        List<Finding> out = new ArrayList<>();
        double allowance = s.contactAllowanceOhm();
        if (c.ends().size() == 2) {
            String t = c.hub();
            String e1 = c.ends().get(0);
            String e2 = c.ends().get(1);
            OptionalDouble h1 = m.ohms(LeadPair.of(t, e1));
            OptionalDouble h2 = m.ohms(LeadPair.of(t, e2));
            OptionalDouble ee = m.ohms(LeadPair.of(e1, e2));
            boolean explained = false;
            if (h1.isPresent() && h2.isPresent() && ee.isPresent()) {
                double a = h1.getAsDouble();
                double b = h2.getAsDouble();
                double whole = ee.getAsDouble();
                double d = whole - a - b;
                double slack = METER_FRACTION * whole;
                if (whole < Math.max(a, b) - allowance) {
                    explained = true;
                    out.add(new Finding(FindingCode.INCONSISTENT_MATRIX, Severity.WARNING, String.format(Locale.ROOT,
                            "%s-%s reads %s end to end, less than its half %s-%s (%s): a series winding cannot; a value"
                            + " was mis-recorded or two labels swapped. Measure %s-%s, %s-%s and %s-%s again.",
                            e1, e2, ohm(whole), t, a > b ? e1 : e2, ohm(Math.max(a, b)), e1, e2, t, e1, t, e2),
                            List.of(e1, e2, t)));
                } else if (d > allowance + slack) {
                    explained = true;
                    out.add(new Finding(FindingCode.CONTACT_RESISTANCE, Severity.WARNING, String.format(Locale.ROOT,
                            "%s-%s reads %s, %s above the sum of its halves (%s + %s): a poor probe contact on that"
                            + " reading. Clean the lead ends and measure %s-%s again.",
                            e1, e2, ohm(whole), ohm(d), ohm(a), ohm(b), e1, e2), List.of(e1, e2)));
                } else if (d < -2 * allowance - slack) {
                    explained = true;
                    String high = a > b ? e1 : e2;
                    out.add(new Finding(FindingCode.CONTACT_RESISTANCE, Severity.WARNING, String.format(Locale.ROOT,
                            "The halves of winding %s-%s add up to %s more than its end-to-end reading %s: the higher"
                            + " half %s-%s (%s) likely had a poor probe contact. Clean the lead ends and measure %s-%s"
                            + " again.", e1, e2, ohm(-d), ohm(whole), t, high, ohm(Math.max(a, b)), t, high),
                            List.of(t, high)));
                }
            }
            if (!explained && h1.isPresent() && h2.isPresent()) {
                double a = h1.getAsDouble();
                double b = h2.getAsDouble();
                double asym = Math.abs(a - b) / ((a + b) / 2);
                if (asym > s.imbalanceTolerance() && Math.abs(a - b) > allowance) {
                    String low = a < b ? e1 : e2;
                    out.add(new Finding(FindingCode.TAP_ASYMMETRY, Severity.WARNING, String.format(Locale.ROOT,
                            "The halves of winding %s-%s differ by %.1f %% (%s-%s %s, %s-%s %s; tolerance %.0f %%):"
                            + " shorted turns in the lower half %s-%s are likely. Measure both halves again; if it"
                            + " persists, do not use the half-winding connection, and expect the motor to run hot or"
                            + " rough.", e1, e2, 100 * asym, t, e1, ohm(a), t, e2, ohm(b),
                            100 * s.imbalanceTolerance(), t, low), List.of(e1, e2, t)));
                }
            }
        } else {
            seriesChecksOfCommon(c, m, allowance).ifPresent(out::add);
        }
        return out;
    }

    /** 5-lead: the reading with the largest residual against the fitted coils, if beyond what contact explains. */
    private static Optional<Finding> seriesChecksOfCommon(HubFit.Candidate c, ResistanceMatrix m, double allowance) {
        List<String> group = new ArrayList<>(c.ends());
        group.add(c.hub());
        LeadPair worst = null;
        double worstResidual = 0;
        double worstValue = 0;
        for (int i = 0; i < group.size(); i++) {
            for (int j = i + 1; j < group.size(); j++) {
                LeadPair p = LeadPair.of(group.get(i), group.get(j));
                OptionalDouble v = m.ohms(p);
                if (v.isEmpty()) {
                    continue;
                }
                double predicted = 0;
                for (String l : List.of(p.a(), p.b())) {
                    int k = c.ends().indexOf(l);
                    if (k >= 0) {
                        predicted += c.coilOhm()[k];
                    }
                }
                double residual = v.getAsDouble() - predicted;
                if (Math.abs(residual) > Math.abs(worstResidual)) {
                    worst = p;
                    worstResidual = residual;
                    worstValue = v.getAsDouble();
                }
            }
        }
        if (worst == null || Math.abs(worstResidual) <= allowance + 3 * METER_FRACTION * worstValue) {
            return Optional.empty();
        }
        if (worstResidual > 0) {
            return Optional.of(new Finding(FindingCode.CONTACT_RESISTANCE, Severity.WARNING, String.format(Locale.ROOT,
                    "%s reads %s, about %s above what the other readings of the common group imply: a poor probe"
                    + " contact. Clean the lead ends and measure %s again.", worst, ohm(worstValue),
                    ohm(worstResidual), worst), List.of(worst.a(), worst.b())));
        }
        return Optional.of(new Finding(FindingCode.INCONSISTENT_MATRIX, Severity.WARNING, String.format(Locale.ROOT,
                "%s reads %s, about %s below what the other readings of the common group imply, which contact"
                + " resistance cannot cause: a value was mis-recorded or labels swapped. Measure %s again.", worst,
                ohm(worstValue), ohm(-worstResidual), worst), List.of(worst.a(), worst.b())));
    }

    /**
     * Pairs measured open inside one continuity group: copper joins every lead of a group, so each such reading
     * contradicts the others, whatever the layout. One finding names each pair with the path that conducts.
     */
    static List<Finding> openInsideGroup(List<String> g, ResistanceMatrix m) {
        List<Finding> out = new ArrayList<>();
        for (int i = 0; i < g.size(); i++) {
            for (int j = i + 1; j < g.size(); j++) {
                LeadPair p = LeadPair.of(g.get(i), g.get(j));
                if (!m.isOpen(p)) {
                    continue;
                }
                List<String> path = conductingPath(g, m, p.a(), p.b());
                double sum = 0;
                List<String> parts = new ArrayList<>();
                for (int k = 1; k < path.size(); k++) {
                    double v = m.ohms(LeadPair.of(path.get(k - 1), path.get(k))).getAsDouble();
                    sum += v;
                    parts.add(ohm(v));
                }
                out.add(new Finding(FindingCode.INCONSISTENT_MATRIX, Severity.ERROR, String.format(Locale.ROOT,
                        "%s reads open, but %s conducts (%s = %s), so %s must too: a value was mis-recorded, a probe"
                        + " slipped, or two labels are swapped. Measure %s and the readings along that path again.",
                        p, String.join("-", path), String.join(" + ", parts), ohm(sum), p, p), List.of(p.a(), p.b())));
            }
        }
        return out;
    }

    /** Shortest chain of finite readings from one lead to another within a group (breadth first). */
    private static List<String> conductingPath(List<String> g, ResistanceMatrix m, String from, String to) {
        java.util.Map<String, String> previous = new java.util.HashMap<>();
        java.util.ArrayDeque<String> queue = new java.util.ArrayDeque<>(List.of(from));
        previous.put(from, from);
        while (!queue.isEmpty() && !previous.containsKey(to)) {
            String at = queue.poll();
            for (String next : g) {
                if (!previous.containsKey(next) && m.ohms(LeadPair.of(at, next)).isPresent()) {
                    previous.put(next, at);
                    queue.add(next);
                }
            }
        }
        List<String> path = new ArrayList<>(List.of(to));
        for (String at = to; !at.equals(from); at = previous.get(at)) {
            path.add(0, previous.get(at));
        }
        return path;
    }

    static Finding unfitGroup(List<String> g) {
        return new Finding(FindingCode.INCONSISTENT_MATRIX, Severity.ERROR, String.format(Locale.ROOT,
                "Leads %s are joined by continuity in a way no two-phase winding layout explains (shorted windings,"
                + " a wrongly recorded value, or one label used for two leads). Make sure the motor is disconnected"
                + " from any driver, check the labels, and measure these pairs again.", String.join(", ", g)), g);
    }

    /**
     * One finding per leakage fault: the readings between the same two windings are one fault (their insulation from
     * each other), however many lead pairs show it; a reading between leads of no known winding stands alone.
     */
    static List<Finding> leakage(List<ReadingUse> leaks, List<Winding> windings, double limitOhm) {
        Map<List<Integer>, List<ReadingUse>> byWindings = new LinkedHashMap<>();
        List<Finding> out = new ArrayList<>();
        for (ReadingUse u : leaks) {
            int a = windingOf(u.pair().a(), windings);
            int b = windingOf(u.pair().b(), windings);
            if (a < 0 || b < 0 || a == b) {
                out.add(leakage(u, limitOhm));
            } else {
                byWindings.computeIfAbsent(List.of(Math.min(a, b), Math.max(a, b)), k -> new ArrayList<>()).add(u);
            }
        }
        for (var e : byWindings.entrySet()) {
            List<ReadingUse> between = e.getValue();
            out.add(between.size() == 1 ? leakage(between.get(0), limitOhm)
                    : leakageBetween(windings.get(e.getKey().get(0)), windings.get(e.getKey().get(1)), between,
                    limitOhm));
        }
        return out;
    }

    private static int windingOf(String lead, List<Winding> windings) {
        for (int i = 0; i < windings.size(); i++) {
            if (windings.get(i).leads().contains(lead)) {
                return i;
            }
        }
        return -1;
    }

    /**
     * Several readings between two windings. Through one leakage path of resistance R between a point of each
     * winding, the reading between any lead of the first and any of the second is R plus the copper from each lead
     * to its point (series resistances add): so the readings lie between R and R plus both windings' resistances,
     * and the lowest is between the leads nearest the path. Readings spread wider than that take more than one path.
     */
    private static Finding leakageBetween(Winding w1, Winding w2, List<ReadingUse> between, double limitOhm) {
        ReadingUse lowest = between.stream().min(Comparator.comparingDouble(ReadingUse::resistanceOhm)).orElseThrow();
        double lowOhm = lowest.resistanceOhm();
        double highOhm = between.stream().mapToDouble(ReadingUse::resistanceOhm).max().orElseThrow();
        // A handheld meter's error on one range (about 1 % of the reading, common practice) and probe contact (tenths
        // of an ohm) blur where along the windings the path is.
        double blurOhm = 0.01 * lowOhm + 0.3;
        double copperOhm = w1.resistanceOhm() + w2.resistanceOhm();
        String where;
        if (highOhm - lowOhm > copperOhm + blurOhm) {
            where = "They spread wider than one leakage path allows (more than both windings' " + ohm(copperOhm)
                    + "), so there is more than one path.";
        } else if (highOhm - lowOhm > blurOhm) {
            where = "They fit one leakage path of about " + ohm(lowOhm) + " nearest " + lowest.pair().a() + " and "
                    + lowest.pair().b() + " (the lowest reading; the others add the copper from each lead to it).";
        } else {
            where = "They fit one leakage path of about " + ohm(lowOhm) + ".";
        }
        List<String> leads = between.stream().flatMap(u -> Stream.of(u.pair().a(), u.pair().b()))
                .distinct().sorted().toList();
        String range = !ohm(lowOhm).equals(ohm(highOhm)) ? ohm(lowOhm) + " to " + ohm(highOhm)
                : (between.size() == 2 ? "both " : "all ") + ohm(lowOhm);
        return new Finding(FindingCode.PHASE_LEAKAGE, Severity.ERROR, String.format(Locale.ROOT,
                "%s %s and %s are not isolated from each other: %d readings between them, %s, far above winding"
                + " continuity (limit %s) but not open (damaged insulation, contamination, or leads touching). %s"
                + " Separate and clean the lead ends and measure again; if it stays, run an insulation-resistance test"
                + " before using the motor.", w1.halfWinding() && w2.halfWinding() ? "Half-windings" : "Windings",
                String.join("-", w1.ends()), String.join("-", w2.ends()), between.size(), range, ohm(limitOhm),
                where), leads);
    }

    private static Finding leakage(ReadingUse u, double limitOhm) {
        LeadPair p = u.pair();
        return new Finding(FindingCode.PHASE_LEAKAGE, Severity.ERROR, String.format(Locale.ROOT,
                "%s reads %s: far above winding continuity (limit %s) but not open, so there is leakage between leads"
                + " that should be isolated (damaged insulation, contamination, or leads touching). Separate and clean"
                + " the lead ends and measure %s again; if it stays, run an insulation-resistance test before using"
                + " the motor.", p, ohm(u.resistanceOhm()), ohm(limitOhm), p), List.of(p.a(), p.b()));
    }

    static Finding openWinding(List<String> singletons, List<Winding> windings, int leadCount) {
        String what;
        List<Winding> bare = windings.stream().filter(w -> w.tap() == null && !w.halfWinding()).toList();
        if (singletons.size() == 1 && leadCount == 6 && bare.size() == 1) {
            Winding w = bare.get(0);
            what = "Lead " + singletons.get(0) + " has no continuity to any other lead; with " + w.ends().get(0)
                    + " and " + w.ends().get(1) + " it most likely formed a centre-tapped winding whose half to "
                    + singletons.get(0) + " is open (broken lead or burnt coil).";
        } else if (singletons.size() == 1) {
            what = "Lead " + singletons.get(0) + " has no continuity to any other lead: a broken lead or an open"
                    + " coil behind it.";
        } else if (singletons.size() == 2 && (leadCount == 4 || leadCount == 8)) {
            what = "Leads " + singletons.get(0) + " and " + singletons.get(1) + " connect to nothing: the winding"
                    + " between them is open (broken lead or burnt coil).";
        } else {
            what = "Leads " + String.join(", ", singletons) + " connect to no other lead: open coils or broken leads.";
        }
        return new Finding(FindingCode.OPEN_WINDING, Severity.ERROR, what + " Check the leads where they enter the"
                + " motor and the crimps or joints along them; if the break is inside, the motor needs rewinding or"
                + " replacing.", singletons);
    }

    /** A dead short where a winding should read: a shorted coil, leads touching, or the probes on each other. */
    static Optional<Finding> shorted(Winding w) {
        if (!w.resistanceMeasured() || w.resistanceOhm() >= ContinuityGroups.SHORT_OHM) {
            return Optional.empty();
        }
        String pair = w.ends().get(0) + "-" + w.ends().get(1);
        return Optional.of(new Finding(FindingCode.SHORTED_WINDING, Severity.ERROR, String.format(Locale.ROOT,
                "%s reads %s end to end, a dead short, not a winding (stepper windings read a few tenths of an ohm"
                + " or more): the coil is shorted, the leads touch, or the probes touched each other. Measure %s"
                + " again with the probes on the two leads only.", pair, ohm(w.resistanceOhm()), pair), w.ends()));
    }

    static Optional<Finding> imbalance(Topology t, List<Winding> all, IdentifySettings s) {
        // Values derived from other readings carry several contact resistances: compare readings only.
        // A dead short is its own finding; balance is judged among the windings that read as windings.
        List<Winding> windings = all.stream().filter(Winding::resistanceMeasured)
                .filter(w -> w.resistanceOhm() >= ContinuityGroups.SHORT_OHM).toList();
        if (t == Topology.UNKNOWN || windings.size() < 2) {
            return Optional.empty();
        }
        Winding min = windings.get(0);
        Winding max = windings.get(0);
        for (Winding w : windings) {
            if (w.resistanceOhm() < min.resistanceOhm()) {
                min = w;
            }
            if (w.resistanceOhm() > max.resistanceOhm()) {
                max = w;
            }
        }
        double imbalance = PhaseImbalance.fraction(windings.stream().mapToDouble(Winding::resistanceOhm).toArray());
        // Probe contact alone can make two readings differ by up to the allowance: not a motor fault.
        if (!(imbalance > s.imbalanceTolerance())
                || max.resistanceOhm() - min.resistanceOhm() <= s.contactAllowanceOhm()) {
            return Optional.empty();
        }
        String unit = t == Topology.FOUR_LEAD || t == Topology.SIX_LEAD ? "Phase" : "Half-winding";
        return Optional.of(new Finding(FindingCode.PHASE_IMBALANCE, Severity.WARNING, String.format(Locale.ROOT,
                "%s resistances differ by %.1f %% (%s %s, %s %s; tolerance %.0f %%, common practice). Measure both"
                + " again at the same temperature with clean contacts; if it persists, %s has a poor joint or %s"
                + " shorted turns, and the motor will run unevenly.", unit, 100 * imbalance, name(max),
                ohm(max.resistanceOhm()), name(min), ohm(min.resistanceOhm()), 100 * s.imbalanceTolerance(),
                name(max), name(min)), List.of()));
    }


    private static String name(Winding w) {
        return w.ends().get(0) + "-" + w.ends().get(1);
    }

    /** Ohms with a sensible prefix, for messages. */
    static String ohm(double v) {
        if (Double.isInfinite(v)) {
            return "open";
        }
        if (v >= 1e6) {
            return String.format(Locale.ROOT, "%.3g MΩ", v / 1e6);
        }
        if (v >= 1e3) {
            return String.format(Locale.ROOT, "%.3g kΩ", v / 1e3);
        }
        return String.format(Locale.ROOT, "%.3g Ω", v);
    }
}
