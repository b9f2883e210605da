package org.lodestep.motor;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Counts electrical cycles of a hand turn from rest to rest and reads the rotor tooth count from them, or refuses.
 *
 * <p>Physics (Acarnley, <i>Stepping Motors</i>, 4th ed., hybrid-motor chapters): the phasor {@code (eA, -eB)} of
 * the two phase EMFs turns through the electrical angle {@code Nr·θ} and its length is {@code Ke·|ω|}; a full turn
 * is {@code Nr} electrical cycles. The angle is trustworthy only while that length stands well above the noise and
 * hum of the idle stretches ({@link #TRUST_OVER_NOISE} times their peak), so it is unwrapped only there. Where the
 * shaft turns too slowly (the start and stop, a pause, a slow reversal) the travel is estimated from the EMF
 * amplitude divided by the Ke measured in the trusted stretches, with a stated bound; inside the capture the known
 * angles on both sides of a slow stretch fix that travel modulo one cycle, so a bound below half a cycle resolves it
 * exactly. The tooth count is the whole number, if exactly one, within the counted cycles ± their bound divided by
 * the revolutions ± the mark tolerance. Common counts (50, 100, 200) are preferred only among a few candidates the
 * measurement already allows; otherwise the answer is refused with the candidates.
 */
final class ToothCounter {
    /** The electrical angle is read directly where the EMF amplitude exceeds this many times the idle peak. */
    static final double TRUST_OVER_NOISE = 3.0;
    /** A shaft mark lined up by eye against a fixed mark, within ±2° mechanical (our assumption). */
    static final double MARK_TOLERANCE_REV = 2.0 / 360.0;
    /** Rotor tooth counts of common two-phase hybrid motors (1.8°, 0.9°, 0.45°); common practice. */
    static final int[] COMMON_TEETH = {50, 100, 200};
    /** Most candidates among which a common count may be preferred. */
    static final int MAX_CANDIDATES_FOR_COMMON = 5;
    private static final double BLOCK_S = 0.020;
    private static final double SMOOTH_S = 0.010;
    /** Angle error at each end of a trusted stretch: noise at the trust level plus harmonic and hum ripple, rad. */
    private static final double ENDPOINT_ERROR_RAD = Math.asin(1 / TRUST_OVER_NOISE) + 0.1;
    /** The angle error at the two ends of a count between instants that are both trusted, cycles. */
    static final double ENDPOINT_ERROR_CYCLES = 2 * ENDPOINT_ERROR_RAD / (2 * Math.PI);

    private ToothCounter() {
    }

    /**
     * The tracked electrical angle.
     *
     * @param angleRad         unwrapped electrical angle, held through slow stretches
     * @param trusted          where the angle was read directly
     * @param moving           where the EMF stands above the idle noise at all
     * @param cycles           net electrical cycles of the whole capture (signed)
     * @param uncertaintyCycles bound on the error of {@code cycles}
     * @param interiorUncertaintyCycles the part of that bound due to slow stretches inside the turn
     * @param trustedFraction  trusted share of the moving time
     */
    record Track(double[] angleRad, boolean[] trusted, boolean[] moving, double cycles, double uncertaintyCycles,
                 double interiorUncertaintyCycles, double trustedFraction) {
    }

    /**
     * Tracks the angle {@code atan2(y, x)} of a phasor whose length is proportional to speed.
     *
     * @param x            cosine-like component (for two phases, {@code -eB})
     * @param y            sine-like component (for two phases, {@code eA})
     * @param sampleRateHz sample rate, Hz
     */
    static Track track(double[] x, double[] y, double sampleRateHz) {
        int n = x.length;
        double[] amp = new double[n];
        double[] raw = new double[n];
        for (int i = 0; i < n; i++) {
            amp[i] = Math.hypot(x[i], y[i]);
            raw[i] = Math.atan2(y[i], x[i]);
        }
        double[] smooth = movingMean(amp, Math.max(1, (int) Math.round(SMOOTH_S * sampleRateHz)));
        int block = Math.max(16, (int) Math.round(BLOCK_S * sampleRateHz));
        Noise noise = idleNoise(amp, smooth, block);
        double high = percentile(amp, 0.95);
        double threshold = Math.max(TRUST_OVER_NOISE * noise.peak, 1e-3 * high);
        boolean[] trusted = new boolean[n];
        boolean[] moving = new boolean[n];
        for (int i = 0; i < n; i++) {
            trusted[i] = amp[i] > threshold;
            moving[i] = smooth[i] > noise.smoothPeak || trusted[i];
        }
        List<int[]> runs = runs(trusted, block);
        // A run shorter than one block is too short to tell its direction (a noise spike at the trust level would
        // pass for a reversal): it is bridged like any slow stretch.
        Arrays.fill(trusted, false);
        for (int[] r : runs) {
            Arrays.fill(trusted, r[0], r[1] + 1, true);
        }
        double[] angle = new double[n];
        if (runs.isEmpty()) {
            return new Track(angle, trusted, moving, 0, Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, 0);
        }
        // Unwrap inside each trusted run; runs are joined below.
        for (int[] r : runs) {
            angle[r[0]] = raw[r[0]];
            for (int i = r[0] + 1; i <= r[1]; i++) {
                angle[i] = angle[i - 1] + wrap(raw[i] - raw[i - 1]);
            }
        }
        double kePerRadPerS = amplitudePerSpeed(amp, angle, runs, block, sampleRateHz);
        if (!(kePerRadPerS > 0)) {
            return new Track(angle, trusted, moving, 0, Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, 0);
        }
        double uncertainty = 0;
        double interior = 0;
        // Travel before the first trusted instant: from rest, in the direction the first run turns.
        int[] first = runs.get(0);
        Travel start = travel(smooth, 0, first[0], noise.smoothPeak, kePerRadPerS, sampleRateHz);
        double total = direction(angle, first, block, true) * start.estimateRad;
        uncertainty += start.boundRad + ENDPOINT_ERROR_RAD;
        for (int k = 0; k < runs.size(); k++) {
            int[] r = runs.get(k);
            if (k > 0) {
                int[] prev = runs.get(k - 1);
                Travel gap = travel(smooth, prev[1] + 1, r[0], noise.smoothPeak, kePerRadPerS, sampleRateHz);
                boolean reversed = direction(angle, prev, block, false) != direction(angle, r, block, true);
                // The phasor is Ke·ω times a unit vector at the electrical angle: when ω changes sign it points the
                // other way, so across a reversal the raw angle jumps by half a cycle that the rotor did not turn.
                double d0 = wrap(raw[r[0]] - raw[prev[1]] + (reversed ? Math.PI : 0));
                double signed = reversed ? 0 : direction(angle, r, block, true) * gap.estimateRad;
                double limit = gap.estimateRad + gap.boundRad + 2 * ENDPOINT_ERROR_RAD;
                double chosen = Double.NaN;
                double lo = Double.POSITIVE_INFINITY;
                double hi = Double.NEGATIVE_INFINITY;
                int span = (int) Math.ceil(limit / (2 * Math.PI)) + 1;
                for (int c = -span; c <= span; c++) {
                    double d = d0 + 2 * Math.PI * c;
                    // d0 itself is always admitted: it is the least travel the two known angles allow
                    if (Math.abs(d) <= Math.max(limit, Math.abs(d0))) {
                        lo = Math.min(lo, d);
                        hi = Math.max(hi, d);
                        if (Double.isNaN(chosen) || Math.abs(d - signed) < Math.abs(chosen - signed)) {
                            chosen = d;
                        }
                    }
                }
                double gapError = Math.max(hi - chosen, chosen - lo) + 2 * ENDPOINT_ERROR_RAD;
                uncertainty += gapError;
                interior += gapError;
                total += chosen;
                double offset = angle[prev[1]] + chosen - angle[r[0]];
                for (int i = prev[1] + 1; i < r[0]; i++) {
                    angle[i] = angle[prev[1]];
                }
                for (int i = r[0]; i <= r[1]; i++) {
                    angle[i] += offset;
                }
            }
            total += angle[r[1]] - angle[r[0]];
        }
        int[] last = runs.get(runs.size() - 1);
        Travel end = travel(smooth, last[1] + 1, n, noise.smoothPeak, kePerRadPerS, sampleRateHz);
        total += direction(angle, last, block, false) * end.estimateRad;
        uncertainty += end.boundRad + ENDPOINT_ERROR_RAD;
        for (int i = 0; i < first[0]; i++) {
            angle[i] = angle[first[0]];
        }
        for (int i = last[1] + 1; i < n; i++) {
            angle[i] = angle[last[1]];
        }
        int trustedCount = 0;
        int movingCount = 0;
        for (int i = 0; i < n; i++) {
            trustedCount += trusted[i] ? 1 : 0;
            movingCount += moving[i] ? 1 : 0;
        }
        double fraction = movingCount == 0 ? 0 : Math.min(1, trustedCount / (double) movingCount);
        return new Track(angle, trusted, moving, total / (2 * Math.PI), uncertainty / (2 * Math.PI),
                interior / (2 * Math.PI), fraction);
    }

    /**
     * Reads the tooth count from counted cycles.
     *
     * @param cycles              electrical cycles counted (sign ignored)
     * @param uncertaintyCycles   bound on their error
     * @param revolutions         revolutions turned
     * @param revolutionTolerance bound on the error of {@code revolutions}
     * @param trustedFraction     share of moving time read directly (reported only)
     */
    static ToothCount count(double cycles, double uncertaintyCycles, double revolutions, double revolutionTolerance,
                            double trustedFraction) {
        double c = Math.abs(cycles);
        double u = Double.isFinite(uncertaintyCycles) ? uncertaintyCycles : Math.max(c, 1) * 1e6;
        double lowest = Math.max(0, (c - u) / (revolutions + revolutionTolerance));
        double highest = revolutions > revolutionTolerance ? (c + u) / (revolutions - revolutionTolerance)
                : Double.MAX_VALUE;
        List<Integer> candidates = new ArrayList<>();
        long from = Math.max(1, (long) Math.ceil(lowest));
        long to = (long) Math.floor(Math.min(highest, Integer.MAX_VALUE));
        for (long t = from; t <= to && candidates.size() <= 50; t++) {
            candidates.add((int) t);
        }
        if (candidates.size() > 50) {
            candidates = List.of(); // far too wide to list: the answer is simply unknown
        }
        Integer teeth = null;
        ToothCount.Confidence confidence;
        if (from > to) {
            confidence = ToothCount.Confidence.INCONSISTENT;
        } else if (candidates.size() == 1) {
            teeth = candidates.get(0);
            confidence = ToothCount.Confidence.EXACT;
        } else {
            List<Integer> common = new ArrayList<>();
            for (int t : COMMON_TEETH) {
                if (t >= from && t <= to) {
                    common.add(t);
                }
            }
            if (common.size() == 1 && !candidates.isEmpty() && candidates.size() <= MAX_CANDIDATES_FOR_COMMON) {
                teeth = common.get(0);
                confidence = ToothCount.Confidence.COMMON_COUNT;
            } else {
                confidence = ToothCount.Confidence.AMBIGUOUS;
            }
        }
        return new ToothCount(c, Math.min(u, Double.MAX_VALUE), revolutions, revolutionTolerance, c / revolutions,
                lowest, Math.min(highest, Double.MAX_VALUE), candidates, teeth, confidence, trustedFraction);
    }

    /** Travel estimate through a slow stretch and its bound, rad. */
    private record Travel(double estimateRad, double boundRad) {
    }

    /**
     * Travel through samples {@code [from, to)}: the EMF above the idle level divided by the amplitude per unit speed;
     * the bound allows a quarter of that plus the idle level itself wherever the shaft moved.
     */
    private static Travel travel(double[] smooth, int from, int to, double idle, double perSpeed, double fs) {
        double est = 0;
        double bound = 0;
        for (int i = from; i < to; i++) {
            if (smooth[i] > idle) {
                est += (smooth[i] - idle) / perSpeed / fs;
                bound += idle / perSpeed / fs;
            }
        }
        return new Travel(est, 0.25 * est + bound);
    }

    /** +1 or -1: the direction at the start ({@code atStart}) or end of a run, over up to one block. */
    private static int direction(double[] angle, int[] run, int block, boolean atStart) {
        int len = Math.min(block, run[1] - run[0]);
        double d = atStart ? angle[run[0] + len] - angle[run[0]] : angle[run[1]] - angle[run[1] - len];
        return d < 0 ? -1 : 1;
    }

    /** Least-squares slope through the origin of the block-mean amplitude against the electrical speed. */
    private static double amplitudePerSpeed(double[] amp, double[] angle, List<int[]> runs, int block, double fs) {
        double num = 0;
        double den = 0;
        for (int[] r : runs) {
            for (int s = r[0]; s + block - 1 <= r[1]; s += block) {
                double w = Math.abs(angle[s + block - 1] - angle[s]) / ((block - 1) / fs);
                double mean = 0;
                for (int i = s; i < s + block; i++) {
                    mean += amp[i];
                }
                mean /= block;
                num += mean * w;
                den += w * w;
            }
        }
        return den > 0 ? num / den : Double.NaN;
    }

    /** Peak levels of the idle stretches: the blocks up to 1.5 times as loud as the quietest 2 %. */
    private record Noise(double peak, double smoothPeak) {
    }

    private static Noise idleNoise(double[] amp, double[] smooth, int block) {
        int blocks = Math.max(1, amp.length / block);
        double[] means = new double[blocks];
        for (int b = 0; b < blocks; b++) {
            double s = 0;
            int end = Math.min(amp.length, (b + 1) * block);
            for (int i = b * block; i < end; i++) {
                s += amp[i];
            }
            means[b] = s / Math.max(1, end - b * block);
        }
        double[] sorted = means.clone();
        Arrays.sort(sorted);
        // Idle noise is stationary, so its blocks all sit near the quietest; a capture without idle stretches has
        // only its slow ends there, and few of them.
        double quiet = sorted[(int) (0.02 * (blocks - 1))];
        List<Double> a = new ArrayList<>();
        List<Double> s = new ArrayList<>();
        for (int b = 0; b < blocks; b++) {
            if (means[b] <= 1.5 * quiet) {
                int end = Math.min(amp.length, (b + 1) * block);
                for (int i = b * block; i < end; i++) {
                    a.add(amp[i]);
                    s.add(smooth[i]);
                }
            }
        }
        return new Noise(percentile(a, 0.995), percentile(s, 0.99));
    }

    private static List<int[]> runs(boolean[] mask, int minLength) {
        List<int[]> out = new ArrayList<>();
        int i = 0;
        while (i < mask.length) {
            if (!mask[i]) {
                i++;
                continue;
            }
            int j = i;
            while (j + 1 < mask.length && mask[j + 1]) {
                j++;
            }
            if (j - i + 1 >= minLength) {
                out.add(new int[] {i, j});
            }
            i = j + 1;
        }
        return out;
    }

    private static double[] movingMean(double[] v, int w) {
        int n = v.length;
        double[] prefix = new double[n + 1];
        for (int i = 0; i < n; i++) {
            prefix[i + 1] = prefix[i] + v[i];
        }
        double[] out = new double[n];
        int half = w / 2;
        for (int i = 0; i < n; i++) {
            int a = Math.max(0, i - half);
            int b = Math.min(n, i + half + 1);
            out[i] = (prefix[b] - prefix[a]) / (b - a);
        }
        return out;
    }

    private static double percentile(double[] v, double q) {
        double[] s = v.clone();
        Arrays.sort(s);
        return s[(int) (q * (s.length - 1))];
    }

    private static double percentile(List<Double> v, double q) {
        if (v.isEmpty()) {
            return 0;
        }
        double[] s = v.stream().mapToDouble(Double::doubleValue).toArray();
        Arrays.sort(s);
        return s[(int) (q * (s.length - 1))];
    }

    private static double wrap(double a) {
        return a - 2 * Math.PI * Math.floor((a + Math.PI) / (2 * Math.PI));
    }
}
