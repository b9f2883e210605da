package org.lodestep.wiring;

/**
 * Phase (or coil) resistance imbalance: the spread of nominally equal windings relative to their mean,
 * (max − min)/mean. The definition is common practice of the trade (no standard defines it); datasheets quote it
 * in per cent and a tolerance of about ±10 % on phase resistance is typical.
 */
public final class PhaseImbalance {
    private PhaseImbalance() {
    }

    /**
     * (max − min)/mean of the given resistances, as a fraction (0.05 = 5 %).
     *
     * @param resistancesOhm two or more positive, finite resistances, Ω
     * @throws IllegalArgumentException when fewer than two values are given or one is not positive and finite
     */
    public static double fraction(double... resistancesOhm) {
        if (resistancesOhm.length < 2) {
            throw new IllegalArgumentException("imbalance needs two or more resistances, got " + resistancesOhm.length);
        }
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        double sum = 0;
        for (double r : resistancesOhm) {
            if (!(r > 0) || !Double.isFinite(r)) {
                throw new IllegalArgumentException("resistance must be positive and finite, got " + r + " Ω");
            }
            min = Math.min(min, r);
            max = Math.max(max, r);
            sum += r;
        }
        return (max - min) / (sum / resistancesOhm.length);
    }

    /** The same as {@link #fraction}, in per cent. */
    public static double percent(double... resistancesOhm) {
        return 100.0 * fraction(resistancesOhm);
    }
}
