package org.lodestep.wiring;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;

/**
 * Test helper: the true resistance between any two leads of an ideal motor layout, and meter readings of it with
 * probe contact resistance (uniform 0.05 to 0.3 Ω per reading, the range issue 2 asks for) and ±0.5 % meter noise.
 *
 * <p>Values follow from series circuits (references §4, common practice): a coil reads r, two coils in
 * series 2r, isolated leads read open.
 */
final class SimulatedMotor {
    final List<String> labels;
    /** Number of coils between leads i and j (0 = open); indices into labels. */
    final int[][] coils;
    final double coilOhm;

    SimulatedMotor(List<String> labels, int[][] coils, double coilOhm) {
        this.labels = List.copyOf(labels);
        this.coils = coils;
        this.coilOhm = coilOhm;
    }

    /** Layout {@code k} of {@link MotorHypotheses} for the labels. */
    static SimulatedMotor layout(List<String> labels, int index, double coilOhm) {
        return new SimulatedMotor(labels, MotorHypotheses.forLeads(labels.size()).get(index), coilOhm);
    }

    /** The labels shuffled with a seeded random. */
    static List<String> shuffled(List<String> labels, long seed) {
        List<String> l = new ArrayList<>(labels);
        Collections.shuffle(l, new Random(seed));
        return l;
    }

    /** True resistance, +Infinity when open. */
    double trueOhm(String a, String b) {
        int k = coils[labels.indexOf(a)][labels.indexOf(b)];
        return k == 0 ? Double.POSITIVE_INFINITY : k * coilOhm;
    }

    /** A reading with contact resistance and noise. */
    double read(String a, String b, Random rnd) {
        double t = trueOhm(a, b);
        if (Double.isInfinite(t)) {
            return t;
        }
        return t * (1 + (rnd.nextDouble() - 0.5) * 0.01) + 0.05 + 0.25 * rnd.nextDouble();
    }

    /** Every pair read once, except {@code skip}. */
    ResistanceMatrix matrix(Random rnd, List<LeadPair> skip) {
        ResistanceMatrix.Builder b = ResistanceMatrix.builder();
        labels.forEach(b::lead);
        for (int i = 0; i < labels.size(); i++) {
            for (int j = i + 1; j < labels.size(); j++) {
                String x = labels.get(i);
                String y = labels.get(j);
                if (skip.contains(LeadPair.of(x, y))) {
                    continue;
                }
                double v = read(x, y, rnd);
                if (Double.isInfinite(v)) {
                    b.open(x, y);
                } else {
                    b.reading(x, y, v);
                }
            }
        }
        return b.build();
    }
}
