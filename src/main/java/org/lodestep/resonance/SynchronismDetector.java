package org.lodestep.resonance;

import java.util.ArrayList;
import java.util.List;

/**
 * Whether a response still follows the step command, window by window through a sweep, by time-synchronous
 * averaging: each sample is filed by the commanded step phase (the commanded full-step count modulo a period of
 * {@code periodFullSteps}), and the power of the synchronous average is compared with the window's whole power. A
 * rotor that follows the command responds with a waveform periodic in the step count, whatever the rate does within
 * the window, so nearly all its power is synchronous; a rotor that slips poles responds at frequencies unrelated to
 * the rate and the synchronous share collapses.
 *
 * <p>Source: time-domain synchronous averaging of rotating machinery signals, S. Braun, "The extraction of periodic
 * waveforms by time domain averaging", Acustica 32 (1975) 69–77, and P. D. McFadden, "A revised model for the
 * extraction of periodic waveforms by time domain averaging", Mech. Syst. Signal Process. 1 (1987) 83–95 (from
 * memory). A period of 2 full steps keeps the half-order response of a parametric resonance synchronous; a current
 * is periodic in 4 full steps (one electrical cycle). The unbiased share (s − B/n)/(1 − B/n), B bins and n samples,
 * removes what noise alone leaves in the bin means. Window length (at least {@link #MIN_PERIODS} periods and 0.1 s)
 * is common practice (no published source).
 */
final class SynchronismDetector {
    static final int MIN_PERIODS = 8;
    static final double MIN_WINDOW_S = 0.1;

    /** One analysed window: its mean commanded rate, synchronous share of power (0 ... 1) and RMS. */
    record Window(double startS, double rateFullStepsPerS, double synchronousShare, double rms) {
    }

    /** Samples per call of the per-sample loop ({@link #feed} says why). */
    private static final int RUN_SAMPLES = 4096;

    private final double sampleRateHz;
    private final double periodFullSteps;
    private final List<Window> windows = new ArrayList<>();
    private double[] binSum = new double[0];
    private int[] binCount = new int[0];
    private int bins;
    private long index;
    private long windowStart = -1;
    private double startSteps;
    private double previousSteps = Double.NaN;
    private double lastSteps;
    private double sum;
    private double sumSquares;
    private int n;

    SynchronismDetector(double sampleRateHz, double periodFullSteps) {
        Require.positive(sampleRateHz, "sample rate", "Hz");
        Require.positive(periodFullSteps, "synchronous period", "full steps");
        this.sampleRateHz = sampleRateHz;
        this.periodFullSteps = periodFullSteps;
    }

    /**
     * Feeds samples with the commanded full-step count at each (NaN where the command is unknown: such samples
     * close the open window).
     */
    void feed(double[] x, double[] fullSteps, int off, int len) {
        // In runs of a few thousand samples: the optimising compiler then compiles the loop once, when its calls
        // are many, instead of once while a long call runs (on-stack replacement) and again for the calls after it.
        for (int from = off, end = off + len; from < end; from += RUN_SAMPLES) {
            feedRun(x, fullSteps, from, Math.min(RUN_SAMPLES, end - from));
        }
    }

    private void feedRun(double[] x, double[] fullSteps, int off, int len) {
        // The per-sample state lives in locals between window changes: field traffic in this loop, run for every
        // sample of a capture, cost more than the arithmetic (the first-tier compiler keeps no field in a register).
        final double limitSteps = MIN_PERIODS * periodFullSteps;
        final double limitSamples = MIN_WINDOW_S * sampleRateHz;
        final double period = periodFullSteps;
        // A power-of-two period (2 or 4 full steps) divides exactly as a multiplication by its reciprocal.
        final boolean exactReciprocal = period == Math.scalb(1.0, Math.getExponent(period));
        final double reciprocal = 1 / period;
        double[] bs = binSum;
        int[] bc = binCount;
        int nb = bins;
        long idx = index;
        long wStart = windowStart;
        double start = startSteps;
        double prev = previousSteps;
        double last = lastSteps;
        double s = sum;
        double ss = sumSquares;
        int count = n;
        double whole = Double.NaN; // floor(phase) of the last sample binned; NaN: work it out afresh
        for (int i = off, end = off + len; i < end; i++, idx++) {
            double steps = fullSteps[i];
            double v = x[i];
            if (!Double.isFinite(steps) || !Double.isFinite(v)) {
                if (wStart >= 0) {
                    store(idx, wStart, start, last, s, ss, count);
                    close();
                    wStart = -1;
                }
                prev = Double.NaN;
                continue;
            }
            double increment = steps - prev;
            prev = steps;
            if (!(increment > 0)) {
                continue; // the first sample, or a command at rest: no rate to fold by
            }
            if (wStart < 0 || steps - start >= limitSteps && idx - wStart >= limitSamples) {
                if (wStart >= 0) {
                    store(idx, wStart, start, last, s, ss, count);
                    close();
                }
                open(increment);
                bs = binSum;
                bc = binCount;
                nb = bins;
                wStart = idx;
                start = steps;
                s = 0;
                ss = 0;
                count = 0;
            }
            double phase = exactReciprocal ? steps * reciprocal : steps / period;
            // The whole periods, floor(phase), carried from sample to sample as an integer-valued double: the phase
            // creeps up by a fraction of a period per sample, so it mostly stays and now and then gains one. Both
            // are exact, so the fraction is the one phase − floor(phase) gives; a library floor per sample is not
            // inlined by the first-tier compiler, and a long conversion per sample waited on the one before.
            double fraction = phase - whole;
            if (!(fraction >= 0 && fraction < 1)) {
                whole = fraction >= 1 && fraction < 2 ? whole + 1 : Math.floor(phase);
                fraction = phase - whole;
            }
            int b = (int) (fraction * nb);
            b = Math.min(nb - 1, Math.max(0, b));
            bs[b] += v;
            bc[b]++;
            s += v;
            ss += v * v;
            count++;
            last = steps;
        }
        previousSteps = prev;
        store(idx, wStart, start, last, s, ss, count);
    }

    /** Writes the loop's locals back to the fields, before a window closes and when a block ends. */
    private void store(long idx, long wStart, double start, double last, double s, double ss, int count) {
        index = idx;
        windowStart = wStart;
        startSteps = start;
        lastSteps = last;
        sum = s;
        sumSquares = ss;
        n = count;
    }

    /**
     * Opens a window with one sample per bin over one period at the present rate (8 ... 1024 bins); {@link #feedRun}
     * starts the window's sums and position in its locals.
     */
    private void open(double incrementFullSteps) {
        bins = (int) Math.max(8, Math.min(1024, Math.round(periodFullSteps / incrementFullSteps)));
        binSum = new double[bins];
        binCount = new int[bins];
    }

    private void close() {
        if (windowStart < 0) {
            return;
        }
        double spanSteps = lastSteps - startSteps;
        if (n >= 4 && spanSteps > 0) {
            double mean = sum / n;
            double total = sumSquares / n - mean * mean;
            double sync = 0;
            int used = 0;
            for (int b = 0; b < bins; b++) {
                if (binCount[b] > 0) {
                    double a = binSum[b] / binCount[b] - mean;
                    sync += binCount[b] * a * a;
                    used++;
                }
            }
            sync /= n;
            double share = total > 0 ? sync / total : 1;
            double bias = (double) used / n;
            share = bias < 1 ? (share - bias) / (1 - bias) : Double.NaN;
            double rate = spanSteps / ((n - 1) / sampleRateHz);
            windows.add(new Window(windowStart / sampleRateHz, rate, Math.max(0, Math.min(1, share)),
                    Math.sqrt(Math.max(0, total))));
        }
        windowStart = -1;
    }

    List<Window> finish() {
        close();
        return List.copyOf(windows);
    }
}
