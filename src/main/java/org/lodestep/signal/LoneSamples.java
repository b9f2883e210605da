package org.lodestep.signal;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Single samples that jump far over both their neighbours: a glitch of the acquisition (a flipped bit, a conversion
 * error, a crackling contact), which no sampled oscillation makes.
 *
 * <p>Why a lone jump is not signal: a sinusoid of amplitude A sampled at angle step θ = ω·Δt moves by at most
 * 2A·sin(θ/2) from one sample to the next, and at a peak it rises over its neighbours by A(1 − cos θ) = 2A·sin²(θ/2),
 * which is no more than that largest step (trigonometric identities; true at any sample rate above the Nyquist
 * rate). So a sample that stands over both neighbours by several times the largest step between the other samples
 * around it is not part of an oscillation sampled there. Our own screen (references §33): four times the largest
 * step within 16 samples either side, and at least four of the record's least step (a converter's code, so a
 * quiet stretch's flicker between two codes is no glitch). Noise alone practically never gives it: the largest of 32 steps of Gaussian
 * noise of deviation σ is about 4 σ, and a sample 16 σ above both neighbours has a probability far below 10⁻⁴⁰.
 */
public final class LoneSamples {
    /** Samples either side whose steps set the yardstick. */
    static final int REACH = 16;
    /** How many times the largest step nearby a lone sample must stand over both neighbours. */
    static final double FACTOR = 4;

    private LoneSamples() {
    }

    /**
     * A glitch found.
     *
     * @param index       the sample's index
     * @param readValue   what it read
     * @param bridgedValue the mean of its two neighbours, which stands in for it
     */
    public record LoneSample(int index, double readValue, double bridgedValue) {
    }

    /** The lone samples of {@code x}, in order; the first and last samples have one neighbour and are never lone. */
    public static List<LoneSample> find(double[] x) {
        List<LoneSample> found = new ArrayList<>();
        // A converter's least step: on a quiet stretch every step is 0 but a code's flicker, which is no glitch.
        double quantum = smallestStep(x);
        for (int i = 1; i + 1 < x.length; i++) {
            double up = x[i] - x[i - 1];
            double down = x[i] - x[i + 1];
            if ((up > 0) != (down > 0) || up == 0 || down == 0) {
                continue; // not an extremum over both neighbours
            }
            double over = Math.min(Math.abs(up), Math.abs(down));
            double largest = Math.max(quantum, largestStepAround(x, i));
            if (over > FACTOR * largest) {
                found.add(new LoneSample(i, x[i], (x[i - 1] + x[i + 1]) / 2));
            }
        }
        return List.copyOf(found);
    }

    /** A copy of {@code x} with each lone sample replaced by the mean of its neighbours. */
    public static double[] bridged(double[] x, List<LoneSample> lone) {
        double[] y = x.clone();
        for (LoneSample s : lone) {
            y[s.index()] = s.bridgedValue();
        }
        return y;
    }

    /**
     * The samples bridged, in a sentence for a report: how many, up to three with their times and readings, and what
     * to check.
     *
     * @param timeS the time of each sample, s
     * @param unit  the samples' unit, or "" for none
     */
    public static String describe(List<LoneSample> lone, double[] timeS, String unit) {
        String u = unit == null || unit.isBlank() ? "" : " " + unit;
        StringBuilder named = new StringBuilder();
        for (int i = 0; i < Math.min(3, lone.size()); i++) {
            LoneSample s = lone.get(i);
            named.append(i == 0 ? "" : "; ").append(String.format(Locale.ROOT, "t = %s s read %.3g%s (neighbours'"
                    + " mean %.3g%s)", seconds(timeS[s.index()]), s.readValue(), u, s.bridgedValue(), u));
        }
        if (lone.size() > 3) {
            named.append("; and ").append(lone.size() - 3).append(" more");
        }
        return String.format(Locale.ROOT, "%d sample%s taken for a glitch and bridged by the mean of its neighbours:"
                + " %s. A lone sample standing over both neighbours by more than four times the largest step around it"
                + " is no part of the signal; check the sensor's cable and the acquisition.", lone.size(),
                lone.size() == 1 ? "" : "s", named);
    }

    /** Six significant figures, without the trailing zeros of a sample clock's round times. */
    private static String seconds(double t) {
        String s = String.format(Locale.ROOT, "%.6g", t);
        return s.contains("e") || !s.contains(".") ? s : s.replaceAll("0+$", "").replaceAll("\\.$", "");
    }

    /** The smallest step between neighbouring samples that is not zero; 0 when every step is. */
    private static double smallestStep(double[] x) {
        double smallest = Double.POSITIVE_INFINITY;
        for (int j = 1; j < x.length; j++) {
            double d = Math.abs(x[j] - x[j - 1]);
            if (d > 0 && d < smallest) {
                smallest = d;
            }
        }
        return Double.isInfinite(smallest) ? 0 : smallest;
    }

    /** The largest step between neighbouring samples within {@link #REACH} of i, the two steps touching i left out. */
    private static double largestStepAround(double[] x, int i) {
        double largest = 0;
        int from = Math.max(1, i - REACH);
        int to = Math.min(x.length - 1, i + REACH + 1);
        for (int j = from; j <= to; j++) {
            if (j == i || j == i + 1) {
                continue;
            }
            largest = Math.max(largest, Math.abs(x[j] - x[j - 1]));
        }
        return largest;
    }
}
