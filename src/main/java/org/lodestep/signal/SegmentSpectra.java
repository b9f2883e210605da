package org.lodestep.signal;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * Cuts a stream of samples, fed in blocks of any size, into overlapping segments and hands each segment's squared DFT
 * magnitudes to listeners (Welch averaging, spectrogram, order tracking), so one FFT serves every analysis and memory
 * stays at a few segments whatever the length of the capture. A trailing partial segment is dropped.
 */
public final class SegmentSpectra {

    /** Receives each segment's spectrum; the arrays are reused after the call returns. */
    public interface Listener {
        /**
         * @param firstSample      index of the segment's first sample in the stream
         * @param magnitudeSquared |X_k|² of the detrended, windowed segment, k = 0 ... n/2
         * @param meanSquare       mean square of the detrended segment before windowing (units²)
         */
        void segment(long firstSample, double[] magnitudeSquared, double meanSquare);
    }

    private final SpectralSettings settings;
    private final double sampleRateHz;
    private final List<Listener> listeners = new ArrayList<>();
    private final double[] window;
    private final double sumW;
    private final double sumW2;
    private final RealFft fft;
    private final double[] ring;
    private final double[] work;
    private final double[] mag2;
    private int filled;
    private long consumed;
    private long segments;

    public SegmentSpectra(SpectralSettings settings, double sampleRateHz) {
        this.settings = Objects.requireNonNull(settings, "settings");
        if (!(sampleRateHz > 0) || !Double.isFinite(sampleRateHz)) {
            throw new IllegalArgumentException("sample rate must be positive and finite, got " + sampleRateHz + " Hz");
        }
        this.sampleRateHz = sampleRateHz;
        int n = settings.segmentLength();
        this.window = settings.window().periodic(n);
        double s1 = 0;
        double s2 = 0;
        for (double w : window) {
            s1 += w;
            s2 += w * w;
        }
        this.sumW = s1;
        this.sumW2 = s2;
        this.fft = new RealFft(n);
        this.ring = new double[n];
        this.work = new double[n];
        this.mag2 = new double[settings.binCount()];
    }

    /** Feeds {@code len} samples from {@code x[off ...]}. Non-finite samples are rejected: the caller repairs or reports. */
    public void feed(double[] x, int off, int len) {
        int n = ring.length;
        int hop = settings.hopSamples();
        int i = off;
        int end = off + len;
        while (i < end) {
            int take = Math.min(n - filled, end - i);
            System.arraycopy(x, i, ring, filled, take);
            filled += take;
            i += take;
            if (filled == n) {
                emit();
                System.arraycopy(ring, hop, ring, 0, n - hop);
                filled = n - hop;
                consumed += hop;
            }
        }
    }

    private void emit() {
        int n = ring.length;
        double mean = 0;
        if (settings.detrend() == Detrend.MEAN) {
            for (int i = 0; i < n; i++) {
                mean += ring[i];
            }
            mean /= n;
        }
        double ms = 0;
        for (int i = 0; i < n; i++) {
            if (!Double.isFinite(ring[i])) {
                throw new IllegalArgumentException("sample " + (consumed + i) + " is not a finite number");
            }
            double v = ring[i] - mean;
            ms += v * v;
            work[i] = v * window[i];
        }
        ms /= n;
        fft.magnitudeSquared(work, mag2);
        segments++;
        for (Listener l : listeners) {
            l.segment(consumed, mag2, ms);
        }
    }

    /** Adds a listener; call before the first {@link #feed}. */
    public void addListener(Listener listener) {
        if (segments > 0) {
            throw new IllegalStateException("listeners must be added before the first segment");
        }
        listeners.add(Objects.requireNonNull(listener, "listener"));
    }

    /** Number of whole segments analysed so far. */
    public long segmentCount() {
        return segments;
    }

    public SpectralSettings settings() {
        return settings;
    }

    public double sampleRateHz() {
        return sampleRateHz;
    }

    /** Frequency step between bins, f_s / segmentLength, in Hz. */
    public double binHz() {
        return sampleRateHz / settings.segmentLength();
    }

    /** Equivalent noise bandwidth of the window, in bins (Harris 1978, eq. 14). */
    public double enbwBins() {
        return settings.segmentLength() * sumW2 / (sumW * sumW);
    }

    /** Scales a squared magnitude of bin {@code k} (or a mean of several) into {@code scaling}'s unit. */
    public double scale(double magnitudeSquared, int k, SpectrumScaling scaling) {
        return scaling.scale(magnitudeSquared, k, settings.segmentLength(), sumW, sumW2, sampleRateHz);
    }
}
