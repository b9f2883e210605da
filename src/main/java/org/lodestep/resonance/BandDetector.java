package org.lodestep.resonance;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Finds spans of a response curve that rise over a robust baseline.
 *
 * <p>The baseline at each rate is a running low quantile (by default the 20th percentile; the median is the textbook
 * choice) of the levels within a relative rate window. The point-to-point noise of the curve is estimated robustly
 * from its first differences, σ = 1.4826·MAD(Δ)/√2 (the MAD scaled to a normal σ: P. J. Huber, E. M. Ronchetti,
 * <i>Robust Statistics</i>, 2nd ed., Wiley 2009, section 5.1), so broad humps do not inflate it. A band opens where
 * the level exceeds the baseline by the larger of the threshold and 3σ (or exceeds an absolute level), closes when
 * it falls below the entry level minus the hysteresis; bands closer than the merge gap are joined, and each band's
 * edges are then drawn in to where the level is within the edge drop (3 dB: the half-power points) of its peak. The
 * default values are common practice (no published source).
 */
final class BandDetector {

    /** Indices of one band into the curve: first, last and strongest point, and the peak's excess over baseline. */
    record Span(int first, int last, int peak, double excessDb) {
    }

    private BandDetector() {
    }

    /** The running-quantile baseline, in dB, at each point. */
    static double[] baseline(double[] rates, double[] levelDb, double halfWidth, double quantile) {
        int n = rates.length;
        double[] base = new double[n];
        int lo = 0;
        int hi = 0;
        for (int i = 0; i < n; i++) {
            double from = rates[i] / (1 + halfWidth);
            double to = rates[i] * (1 + halfWidth);
            while (rates[lo] < from) {
                lo++;
            }
            while (hi < n && rates[hi] <= to) {
                hi++;
            }
            base[i] = quantile(Arrays.copyOfRange(levelDb, lo, hi), quantile);
        }
        return base;
    }

    static List<Span> detect(double[] rates, double[] levelDb, BandSettings s) {
        if (rates.length == 0) {
            return new ArrayList<>();
        }
        double[] base = baseline(rates, levelDb, s.baselineHalfWidth(), s.baselineQuantile());
        return spans(rates, levelDb, base, entryLevels(rates, levelDb, base, s), s);
    }

    /**
     * The level (dB) a band must reach at each point to open: the baseline plus the larger of the threshold and
     * three times the curve's point-to-point noise, or the absolute level where one is set.
     */
    static double[] entryLevels(double[] rates, double[] levelDb, double[] base, BandSettings s) {
        int n = rates.length;
        double[] enter = new double[n];
        if (Double.isNaN(s.absoluteLevel())) {
            double sigma = 0;
            if (n > 2) {
                double[] diff = new double[n - 1];
                for (int i = 0; i + 1 < n; i++) {
                    diff[i] = levelDb[i + 1] - levelDb[i];
                }
                sigma = 1.4826 * median(absDeviation(diff)) / Math.sqrt(2);
            }
            double over = Math.max(s.thresholdDb(), 3 * sigma);
            for (int i = 0; i < n; i++) {
                enter[i] = base[i] + over;
            }
        } else {
            Arrays.fill(enter, 20 * Math.log10(s.absoluteLevel()));
        }
        return enter;
    }

    private static List<Span> spans(double[] rates, double[] levelDb, double[] base, double[] enter, BandSettings s) {
        int n = rates.length;
        List<Span> spans = new ArrayList<>();
        int i = 0;
        while (i < n) {
            if (levelDb[i] < enter[i]) {
                i++;
                continue;
            }
            int first = i;
            // Walk back to where the level left the exit level, so a band's start is not cut by the entry level.
            while (first > 0 && levelDb[first - 1] >= enter[first - 1] - s.hysteresisDb()) {
                first--;
            }
            int last = i;
            while (last + 1 < n && levelDb[last + 1] >= enter[last + 1] - s.hysteresisDb()) {
                last++;
            }
            spans.add(span(first, last, levelDb, base));
            i = last + 1;
        }
        List<Span> merged = new ArrayList<>();
        for (Span sp : spans) {
            if (!merged.isEmpty()) {
                Span prev = merged.get(merged.size() - 1);
                if (sp.first() <= prev.last()
                        || rates[sp.first()] - rates[prev.last()] <= s.mergeGap() * rates[prev.last()]) {
                    merged.set(merged.size() - 1, span(prev.first(), Math.max(prev.last(), sp.last()), levelDb, base));
                    continue;
                }
            }
            merged.add(sp);
        }
        List<Span> trimmed = new ArrayList<>();
        for (Span sp : merged) {
            double floor = levelDb[sp.peak()] - s.edgeDropDb();
            int first = sp.peak();
            while (first > sp.first() && levelDb[first - 1] >= floor) {
                first--;
            }
            int last = sp.peak();
            while (last < sp.last() && levelDb[last + 1] >= floor) {
                last++;
            }
            trimmed.add(new Span(first, last, sp.peak(), sp.excessDb()));
        }
        trimmed.removeIf(sp -> sp.last() - sp.first() + 1 < s.minPoints());
        return trimmed;
    }

    private static Span span(int first, int last, double[] levelDb, double[] base) {
        int peak = first;
        for (int k = first; k <= last; k++) {
            if (levelDb[k] > levelDb[peak]) {
                peak = k;
            }
        }
        return new Span(first, last, peak, levelDb[peak] - base[peak]);
    }

    private static double[] absDeviation(double[] x) {
        double m = median(x.clone());
        double[] d = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            d[i] = Math.abs(x[i] - m);
        }
        return d;
    }

    /** Quantile q of {@code x} (sorted in place), linear interpolation between order statistics. */
    static double quantile(double[] x, double q) {
        Arrays.sort(x);
        double pos = q * (x.length - 1);
        int i = (int) Math.floor(pos);
        return i + 1 < x.length ? x[i] + (pos - i) * (x[i + 1] - x[i]) : x[i];
    }

    /** Median of {@code x} (sorted in place). */
    static double median(double[] x) {
        Arrays.sort(x);
        int n = x.length;
        return n % 2 == 1 ? x[n / 2] : 0.5 * (x[n / 2 - 1] + x[n / 2]);
    }
}
