package org.lodestep.wiring;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.function.BiFunction;

/**
 * Finds the one reading that spoils an otherwise healthy matrix: a decimal slip, a transposed label, a poor contact.
 *
 * <p>Method (series circuits, common practice): leave each reading out in turn; when exactly one leaves readings that
 * settle a healthy layout with no finding beyond phase imbalance, that layout is the answer and the reading left out
 * is named with the value the layout predicts for it (the coils between its leads). A reading that only leakage
 * explains (a finite value where the layout has no coil) is not a slip: it stays a leakage finding. When no single
 * reading, or more than one, explains the disagreement, nothing is changed.
 */
final class SingleSlip {
    /** A ratio within this fraction of ×10 or ÷10 is taken as a decimal slip. */
    static final double DECIMAL_TOLERANCE = 0.15;
    /** A reading within this fraction of another pair's predicted value is taken as a transposed label. */
    static final double TRANSPOSED_TOLERANCE = 0.05;

    private SingleSlip() {
    }

    /**
     * The identification from all readings but one, with that reading named, or empty.
     *
     * @param identify identifies a matrix as read (without looking for slips)
     */
    static Optional<Identification> find(ResistanceMatrix m, IdentifySettings s, Identification asRead,
                                         BiFunction<ResistanceMatrix, IdentifySettings, Identification> identify) {
        if (!worthSearching(asRead)) {
            // A clean layout with only an imbalance: a real imbalance must not be explained away by dropping the
            // reading that shows it, but a tenfold one is a decimal slip.
            boolean imbalanced = asRead.findings().stream().anyMatch(f -> f.code() == FindingCode.PHASE_IMBALANCE);
            return imbalanced ? decimalSlip(m, s, identify) : Optional.empty();
        }
        Identification found = null;
        LeadPair slipped = null;
        for (LeadPair p : m.readings().keySet()) {
            if (m.isInferred(p)) {
                continue;
            }
            ResistanceMatrix rest = m.without(p);
            Identification id = identify.apply(rest, s);
            if (!healthy(id)) {
                continue;
            }
            if (Double.isInfinite(predictedOhm(id, p))) {
                continue; // a finite reading where no coil joins the leads: leakage, or a matrix we cannot mend
            }
            if (found != null) {
                return Optional.empty(); // two readings could each be the odd one: do not guess
            }
            found = id;
            slipped = p;
        }
        if (found == null) {
            return decimalSlip(m, s, identify);
        }
        return Optional.of(named(m, found, slipped, predictedOhm(found, slipped)));
    }

    /**
     * A reading no other reading predicts (each coil of an 8-lead motor is read once) can still be a decimal slip:
     * when exactly one reading, taken ×10 or ÷10, makes the matrix healthy and balanced, it is named, and the coil it
     * reads is marked as not measured.
     */
    private static Optional<Identification> decimalSlip(ResistanceMatrix m, IdentifySettings s,
            BiFunction<ResistanceMatrix, IdentifySettings, Identification> identify) {
        Identification found = null;
        LeadPair slipped = null;
        double corrected = Double.NaN;
        for (Map.Entry<LeadPair, Double> e : m.readings().entrySet()) {
            if (Double.isInfinite(e.getValue()) || m.isInferred(e.getKey())) {
                continue;
            }
            for (double factor : new double[] {10, 0.1}) {
                Identification id = identify.apply(m.with(e.getKey(), e.getValue() * factor), s);
                if (healthy(id) && id.findings().isEmpty()) {
                    if (found != null) {
                        return Optional.empty();
                    }
                    found = id;
                    slipped = e.getKey();
                    corrected = e.getValue() * factor;
                }
            }
        }
        if (found == null) {
            return Optional.empty();
        }
        LeadPair p = slipped;
        List<Winding> windings = found.windings().stream().map(w -> w.leads().contains(p.a())
                && w.leads().contains(p.b()) ? notRead(w, p) : w).toList();
        Identification marked = new Identification(found.leads(), found.topology(), windings,
                found.windingsAtReferenceOhm(), found.temperature(), found.findings(), found.connections(),
                found.missingPairs(), found.determined(), found.readings().stream().filter(u -> !u.pair().equals(p))
                .toList(), found.measuredPairs(), found.totalPairs(), found.openCoils());
        return Optional.of(named(m, marked, slipped, corrected));
    }

    /** The winding with the reading of {@code p} no longer counted as read (the whole, or the half it is). */
    private static Winding notRead(Winding w, LeadPair p) {
        if (w.tap() == null || !(p.a().equals(w.tap()) || p.b().equals(w.tap()))) {
            return new Winding(w.ends(), w.tap(), w.resistanceOhm(), w.halfResistancesOhm(), w.halfWinding(), false,
                    w.halvesMeasured());
        }
        String end = p.a().equals(w.tap()) ? p.b() : p.a();
        List<Boolean> halves = new ArrayList<>(w.halvesMeasured());
        halves.set(w.ends().indexOf(end), false);
        return new Winding(w.ends(), w.tap(), w.resistanceOhm(), w.halfResistancesOhm(), w.halfWinding(),
                w.resistanceMeasured(), halves);
    }

    private static Identification named(ResistanceMatrix m, Identification found, LeadPair slipped,
                                        double predicted) {
        double read = m.readings().get(slipped);
        List<Finding> findings = new ArrayList<>(found.findings());
        findings.add(0, new Finding(FindingCode.INCONSISTENT_MATRIX, Severity.WARNING, String.format(Locale.ROOT,
                "%s-%s reads %s where the other readings predict %s: %s. Measure %s-%s again; the layout is taken "
                + "from the other readings.", slipped.a(), slipped.b(), ohm(read), ohm(predicted),
                cause(read, predicted, found, slipped), slipped.a(), slipped.b()), List.of(slipped.a(), slipped.b())));
        List<ReadingUse> uses = new ArrayList<>(found.readings());
        uses.add(new ReadingUse(slipped, read, "suspect", true));
        return new Identification(found.leads(), found.topology(), found.windings(),
                found.windingsAtReferenceOhm(), found.temperature(), findings, found.connections(),
                found.missingPairs(), found.determined(), uses, m.readCount(), found.totalPairs(), found.openCoils());
    }

    /**
     * Worth a search: the readings as a whole give no layout, or break it. A contact outlier is already named by the
     * series checks, and tap asymmetry is a real fault, so neither is searched.
     */
    private static boolean worthSearching(Identification id) {
        return id.topology() == Topology.UNKNOWN || id.findings().stream().anyMatch(f ->
                f.code() == FindingCode.INCONSISTENT_MATRIX || f.code() == FindingCode.PHASE_LEAKAGE);
    }

    private static boolean healthy(Identification id) {
        return id.topology() != Topology.UNKNOWN && id.determined()
                && id.findings().stream().allMatch(f -> f.code() == FindingCode.PHASE_IMBALANCE);
    }

    /** Ohms the layout predicts between the pair's leads; +Infinity when no coil joins them. */
    static double predictedOhm(Identification id, LeadPair p) {
        for (Winding w : id.windings()) {
            List<String> leads = w.leads();
            if (!leads.contains(p.a()) || !leads.contains(p.b())) {
                continue;
            }
            if (w.tap() == null) {
                return w.resistanceOhm();
            }
            String other = p.a().equals(w.tap()) ? p.b() : p.b().equals(w.tap()) ? p.a() : null;
            return other == null ? w.resistanceOhm() : w.halfResistancesOhm().get(w.ends().indexOf(other));
        }
        if (id.topology() == Topology.FIVE_LEAD) {
            // two coils from the common lead in series
            double sum = 0;
            int n = 0;
            for (Winding w : id.windings()) {
                if (w.ends().contains(p.a()) || w.ends().contains(p.b())) {
                    sum += w.resistanceOhm();
                    n++;
                }
            }
            if (n == 2) {
                return sum;
            }
        }
        return Double.POSITIVE_INFINITY;
    }

    private static String cause(double read, double predicted, Identification id, LeadPair slipped) {
        if (Double.isInfinite(read)) {
            return "a probe that did not touch, or a lead missed";
        }
        double ratio = read / predicted;
        if (Math.abs(ratio / 10 - 1) <= DECIMAL_TOLERANCE) {
            return "likely a decimal slip (×10)";
        }
        if (Math.abs(ratio * 10 - 1) <= DECIMAL_TOLERANCE) {
            return "likely a decimal slip (÷10)";
        }
        for (String a : id.leads()) {
            for (String b : id.leads()) {
                if (a.compareTo(b) < 0) {
                    LeadPair q = LeadPair.of(a, b);
                    double v = predictedOhm(id, q);
                    if (!q.equals(slipped) && Double.isFinite(v) && Math.abs(read / v - 1) <= TRANSPOSED_TOLERANCE) {
                        return "it reads like " + q.a() + "-" + q.b() + " should, so likely a transposed label";
                    }
                }
            }
        }
        return ratio > 1 ? "likely a poor probe contact" : "likely a mis-recorded value";
    }

    private static String ohm(double v) {
        return Double.isInfinite(v) ? "open" : String.format(Locale.ROOT, "%.3g Ω", v);
    }
}
