package org.lodestep.signal;

import java.util.List;
import java.util.Objects;

/**
 * A one-sided spectrum: values at k·binHz for k = 0 ... n/2, in the unit its {@link SpectrumScaling} states.
 * Immutable; {@link #values()} returns a copy.
 */
public final class Spectrum {
    private final double[] values;
    private final double binHz;
    private final SpectrumScaling scaling;
    private final long segmentsAveraged;

    Spectrum(double[] values, double binHz, SpectrumScaling scaling, long segmentsAveraged) {
        this.values = values.clone();
        this.binHz = binHz;
        this.scaling = Objects.requireNonNull(scaling, "scaling");
        this.segmentsAveraged = segmentsAveraged;
    }

    /** The spectrum of one segment: the whole of {@code x}, windowed, in {@code scaling}'s unit. */
    public static Spectrum of(double[] x, double sampleRateHz, Window window, Detrend detrend, SpectrumScaling scaling) {
        Welch welch = new Welch(new SpectralSettings(x.length, 0, window, detrend), sampleRateHz);
        welch.feed(x, 0, x.length);
        return welch.spectrum(scaling);
    }

    public double[] values() {
        return values.clone();
    }

    /** Value at bin k. */
    public double value(int k) {
        return values[k];
    }

    /** Number of bins, n/2 + 1. */
    public int size() {
        return values.length;
    }

    /** Frequency step between bins, in Hz. */
    public double binHz() {
        return binHz;
    }

    /** Frequency of bin k, in Hz. */
    public double frequencyHz(int k) {
        return k * binHz;
    }

    public SpectrumScaling scaling() {
        return scaling;
    }

    /** How many segments were averaged (1 for a single periodogram). */
    public long segmentsAveraged() {
        return segmentsAveraged;
    }

    /** Σ values·binHz: for a DENSITY spectrum the mean square of the signal (Parseval), in units². */
    public double integral() {
        double s = 0;
        for (double v : values) {
            s += v;
        }
        return s * binHz;
    }

    /** Index of the largest value at or above {@code fromHz}. */
    public int peakBin(double fromHz) {
        int best = Math.max(0, (int) Math.ceil(fromHz / binHz));
        for (int k = best + 1; k < values.length; k++) {
            if (values[k] > values[best]) {
                best = k;
            }
        }
        return best;
    }

    /** Frequencies, for tables and plots. */
    public List<Double> frequenciesHz() {
        Double[] f = new Double[values.length];
        for (int k = 0; k < f.length; k++) {
            f[k] = k * binHz;
        }
        return List.of(f);
    }
}
