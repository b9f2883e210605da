package org.lodestep.wiring;

import java.util.ArrayList;
import java.util.List;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.QRDecomposition;
import org.apache.commons.math3.linear.RealVector;

/**
 * Finds the hub lead of a group of leads joined by coils to one common point: the centre tap of a 6-lead winding
 * (group of 3) or the common lead of a 5-lead motor (group of 5).
 *
 * <p>Model (series circuit, common practice): each non-hub lead i reaches the hub through its own coil h_i, so a
 * hub-to-end reading is h_i and an end-to-end reading is h_i + h_j. For each candidate hub the coil resistances are
 * fitted to the readings by least squares (Commons Math QR). A motor's coils are nominally equal, so the right hub
 * gives positive, similar coils; a wrong hub gives a coil near zero or negative, or readings the model cannot fit.
 *
 * <p>Decision: a hub is accepted when it is the only one for which equal coils (within
 * {@link HealthyGroupFeasibility#COIL_SPREAD}) and per-reading contact resistance within the allowance explain every
 * reading. When no hub passes that test and the group is fully measured (a faulty motor), the least-squares fit
 * decides, so that the findings can name the fault.
 */
final class HubFit {
    /** Largest (max − min)/mean of fitted coils for a plausible hub; wide, so that faults are reported, not hidden. */
    static final double MAX_SPREAD = 0.5;
    /** Largest RMS misfit relative to the mean reading for a plausible hub. */
    static final double MAX_MISFIT = 0.2;

    /** One candidate hub and how well it fits. */
    record Candidate(String hub, List<String> ends, double[] coilOhm, double spread, double misfit, boolean fits) {
        double score() {
            return spread + misfit;
        }
    }

    /** The plausible hub, or null when the readings do not settle it; {@code candidates} holds every evaluation. */
    final Candidate best;
    final List<Candidate> candidates;
    /** True when every candidate fails: the readings contradict the series model. */
    final boolean nothingFits;

    HubFit(List<String> group, ResistanceMatrix m, double contactAllowanceOhm) {
        candidates = new ArrayList<>();
        List<Candidate> healthy = new ArrayList<>();
        for (String hub : group) {
            Candidate c = evaluate(hub, group, m);
            candidates.add(c);
            if (HealthyGroupFeasibility.feasible(hub, group, m, contactAllowanceOhm)) {
                healthy.add(c);
            }
        }
        boolean complete = true;
        for (int i = 0; i < group.size(); i++) {
            for (int j = i + 1; j < group.size(); j++) {
                complete &= m.isMeasured(LeadPair.of(group.get(i), group.get(j)));
            }
        }
        List<Candidate> fitting = candidates.stream().filter(Candidate::fits)
                .sorted(java.util.Comparator.comparingDouble(Candidate::score)).toList();
        if (healthy.size() == 1) {
            // Only one hub explains the readings with equal coils and contact resistance within the allowance.
            best = healthy.get(0);
        } else if (healthy.isEmpty() && complete && fitting.size() == 1) {
            // A faulty group (say shorted turns), fully measured: the best least-squares fit names the tap so the
            // findings can describe the fault.
            best = fitting.get(0);
        } else if (healthy.isEmpty() && complete && fitting.size() > 1
                && fitting.get(0).score() * 2 < fitting.get(1).score()) {
            best = fitting.get(0);
        } else {
            best = null;
        }
        nothingFits = healthy.isEmpty() && fitting.isEmpty();
    }

    private static Candidate evaluate(String hub, List<String> group, ResistanceMatrix m) {
        List<String> ends = group.stream().filter(l -> !l.equals(hub)).toList();
        List<double[]> rows = new ArrayList<>();
        List<Double> values = new ArrayList<>();
        for (int i = 0; i < group.size(); i++) {
            for (int j = i + 1; j < group.size(); j++) {
                LeadPair p = LeadPair.of(group.get(i), group.get(j));
                if (m.ohms(p).isEmpty()) {
                    continue;
                }
                double[] row = new double[ends.size()];
                for (String l : List.of(p.a(), p.b())) {
                    int k = ends.indexOf(l);
                    if (k >= 0) {
                        row[k] = 1;
                    }
                }
                rows.add(row);
                values.add(m.ohms(p).getAsDouble());
            }
        }
        double[] none = new double[ends.size()];
        if (rows.size() < ends.size()) {
            return new Candidate(hub, ends, none, Double.NaN, Double.NaN, false);
        }
        Array2DRowRealMatrix a = new Array2DRowRealMatrix(rows.toArray(new double[0][]));
        RealVector b = new ArrayRealVector(values.stream().mapToDouble(Double::doubleValue).toArray());
        QRDecomposition qr = new QRDecomposition(a, 1e-9);
        if (!qr.getSolver().isNonSingular()) {
            return new Candidate(hub, ends, none, Double.NaN, Double.NaN, false);
        }
        double[] coil = qr.getSolver().solve(b).toArray();
        RealVector residual = a.operate(new ArrayRealVector(coil)).subtract(b);
        double meanReading = values.stream().mapToDouble(Double::doubleValue).average().orElse(1);
        double misfit = Math.sqrt(residual.dotProduct(residual) / values.size()) / Math.max(meanReading, 1e-9);
        boolean allPositive = java.util.Arrays.stream(coil).allMatch(c -> c > 0 && Double.isFinite(c));
        double spread = allPositive ? PhaseImbalance.fraction(coil) : Double.POSITIVE_INFINITY;
        // With redundant readings the misfit alone rejects a wrong hub, so a real tap asymmetry may show.
        double maxSpread = rows.size() > ends.size() ? 1.5 : MAX_SPREAD;
        boolean fits = allPositive && spread <= maxSpread && misfit <= MAX_MISFIT;
        return new Candidate(hub, ends, coil, spread, misfit, fits);
    }
}
