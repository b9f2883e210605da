package org.lodestep.signal;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.locks.LockSupport;

/**
 * Cuts a stream of samples, fed in blocks of any size, into overlapping segments and hands each segment's squared DFT
 * magnitudes to listeners (Welch averaging, spectrogram, order tracking), so one FFT serves every analysis and memory
 * stays at a few dozen segments whatever the length of the capture. A trailing partial segment is dropped.
 *
 * <p>The segments completed by one {@link #feed} are transformed in a batch shared among one thread per core, then
 * handed to the listeners in stream order on the feeding thread. Each segment is transformed by the same code with
 * its own arrays, so the spectra are bit for bit those of a serial run. Not thread-safe: feed from one thread.
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

    /** Most segments transformed per batch: enough to share among the lanes (about 1 MiB at 4096 points). */
    private static final int MAX_BATCH_SEGMENTS = 32;
    /** Samples a batch may hold, so long segments keep memory to a few MiB: batches of 2 from 2^18 points on. */
    private static final int BATCH_SAMPLE_BUDGET = 1 << 19;
    /** Below this many complete segments a batch is transformed on the feeding thread alone. */
    private static final int PARALLEL_MIN_SEGMENTS = 4;
    /** Batches transformed on the feeding thread alone after the helpers made it wait (a busy machine). */
    private static final int BACK_OFF_BATCHES = 16;

    private final SpectralSettings settings;
    private final double sampleRateHz;
    private final List<Listener> listeners = new ArrayList<>();
    private final double[] window;
    private final double sumW;
    private final double sumW2;
    /** Samples from stream index {@link #consumed} on: room for a batch of overlapping segments. */
    private final double[] samples;
    private final double[][] mag2;
    private final double[] meanSquare;
    /** Per batch slot: stream index of the segment's first non-finite sample, or -1. */
    private final long[] badSample;
    private final Lane[] lanes;
    private int filled;
    private long consumed;
    private long segments;
    /** The batch being transformed: its segment count and the next slot a lane may take. */
    private int batchCount;
    private final AtomicInteger nextSlot = new AtomicInteger();
    /** Whether to fall back to the feeding thread for a while when waiting on helpers costs more than they save. */
    private final boolean adaptive;
    private int serialBatchesLeft;

    /** A segmenter that transforms on one thread per core (see {@link TransformThreads#defaultLanes()}). */
    public SegmentSpectra(SpectralSettings settings, double sampleRateHz) {
        this(settings, sampleRateHz, TransformThreads.defaultLanes(), true);
    }

    /** A segmenter that always shares batches among {@code lanes} threads, for tests of the parallel path. */
    SegmentSpectra(SpectralSettings settings, double sampleRateHz, int lanes) {
        this(settings, sampleRateHz, lanes, false);
    }

    /**
     * @param lanes threads that transform segments, the feeding thread included (1 = serial); listeners are called
     *              in segment order on the feeding thread whatever the lane count, with bit-identical spectra
     * @param adaptive fall back to the feeding thread alone for a few batches when it waited on a helper longer
     *              than half its own share of a batch (a helper thread descheduled on a busy machine)
     */
    private SegmentSpectra(SpectralSettings settings, double sampleRateHz, int lanes, boolean adaptive) {
        this.settings = Objects.requireNonNull(settings, "settings");
        if (!(sampleRateHz > 0) || !Double.isFinite(sampleRateHz)) {
            throw new IllegalArgumentException("sample rate must be positive and finite, got " + sampleRateHz + " Hz");
        }
        if (lanes < 1) {
            throw new IllegalArgumentException("lanes must be at least 1, got " + lanes);
        }
        this.sampleRateHz = sampleRateHz;
        this.adaptive = adaptive;
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
        int batch = Math.max(2, Math.min(MAX_BATCH_SEGMENTS, BATCH_SAMPLE_BUDGET / n));
        this.samples = new double[n + settings.hopSamples() * (batch - 1)];
        this.mag2 = new double[batch][];
        this.meanSquare = new double[batch];
        this.badSample = new long[batch];
        this.lanes = new Lane[Math.min(lanes, batch)];
        this.lanes[0] = new Lane(n); // the helpers' lanes are made on the first parallel batch
    }

    /**
     * Feeds {@code len} samples from {@code x[off ...]}; every segment completed by them reaches the listeners before
     * this returns. Non-finite samples are rejected: the caller repairs or reports.
     */
    public void feed(double[] x, int off, int len) {
        int i = off;
        int end = off + len;
        while (i < end) {
            int take = Math.min(samples.length - filled, end - i);
            System.arraycopy(x, i, samples, filled, take);
            filled += take;
            i += take;
            if (filled == samples.length) {
                transformCompleteSegments();
            }
        }
        transformCompleteSegments();
    }

    /** Transforms the complete segments in {@link #samples}, hands them on in order and keeps the unfinished tail. */
    private void transformCompleteSegments() {
        int n = settings.segmentLength();
        int hop = settings.hopSamples();
        if (filled < n) {
            return;
        }
        int count = (filled - n) / hop + 1;
        transform(count);
        for (int slot = 0; slot < count; slot++) {
            if (badSample[slot] >= 0) {
                throw new IllegalArgumentException("sample " + badSample[slot] + " is not a finite number");
            }
            segments++;
            long first = consumed + (long) slot * hop;
            for (Listener l : listeners) {
                l.segment(first, mag2[slot], meanSquare[slot]);
            }
        }
        int drop = count * hop;
        System.arraycopy(samples, drop, samples, 0, filled - drop);
        filled -= drop;
        consumed += drop;
    }

    /** Fills slots 0 ... count-1; the lanes take slots one at a time, so a lane that is held up delays nobody. */
    private void transform(int count) {
        batchCount = count;
        nextSlot.set(0);
        // Long segments come in small batches, and each of their transforms is worth sharing.
        int helpers = count < Math.min(PARALLEL_MIN_SEGMENTS, mag2.length) ? 0 : Math.min(lanes.length, count) - 1;
        if (serialBatchesLeft > 0) {
            serialBatchesLeft--;
            helpers = 0;
        }
        for (int h = 1; h <= helpers; h++) {
            if (lanes[h] == null) {
                lanes[h] = new Lane(settings.segmentLength());
            }
            lanes[h].start(Thread.currentThread());
        }
        long t0 = adaptive && helpers > 0 ? System.nanoTime() : 0;
        lanes[0].transformSlots();
        long t1 = adaptive && helpers > 0 ? System.nanoTime() : 0;
        for (int h = 1; h <= helpers; h++) {
            lanes[h].awaitOrCancel();
        }
        if (adaptive && helpers > 0 && System.nanoTime() - t1 > (t1 - t0) / 2) {
            serialBatchesLeft = BACK_OFF_BATCHES; // which thread computes a segment never changes its bits
        }
    }

    /** One thread's FFT and work array; runs as a helper task or on the feeding thread. */
    private final class Lane implements Runnable {
        private static final int IDLE = 0;
        private static final int QUEUED = 1;
        private static final int RUNNING = 2;
        private static final int DONE = 3;
        private static final int SPINS = 2000;

        private final RealFft fft;
        private final double[] work;
        private final AtomicInteger state = new AtomicInteger(IDLE);
        private volatile Thread waiter;
        private Throwable failure;

        Lane(int n) {
            this.fft = new RealFft(n);
            this.work = new double[n];
        }

        void start(Thread feeder) {
            waiter = feeder;
            failure = null;
            state.set(QUEUED); // publishes the batch fields to the helper that takes this lane
            TransformThreads.pool().execute(this);
        }

        @Override
        public void run() {
            if (!state.compareAndSet(QUEUED, RUNNING)) {
                return; // the feeding thread finished this batch without us, or another task took the lane
            }
            try {
                transformSlots();
            } catch (Throwable t) {
                failure = t;
            } finally {
                state.set(DONE);
                LockSupport.unpark(waiter);
            }
        }

        /** Waits for a helper that started; one still queued is cancelled, its slots were taken by others. */
        void awaitOrCancel() {
            if (!state.compareAndSet(QUEUED, IDLE)) {
                // The helper is at most one segment behind (tens of microseconds): spin briefly before sleeping, as
                // a wake-up costs about as much as the wait.
                for (int spin = 0; spin < SPINS && state.get() != DONE; spin++) {
                    Thread.onSpinWait();
                }
                while (state.get() != DONE) {
                    LockSupport.park(this);
                }
                state.set(IDLE);
            }
            if (failure != null) {
                throw new IllegalStateException("a transform thread failed", failure);
            }
        }

        void transformSlots() {
            int slot;
            while ((slot = nextSlot.getAndIncrement()) < batchCount) {
                transformSlot(slot);
            }
        }

        /** Detrends, windows and transforms the segment of batch slot {@code slot}. */
        private void transformSlot(int slot) {
            int n = work.length;
            int from = slot * settings.hopSamples();
            double[] x = samples;
            // Sums in four interleaved partial sums: one running sum makes each addition wait on the one before,
            // and these two loops over every sample then cost about a quarter of the transform's time. The partial
            // sums also round less than one running sum does (N. J. Higham, Accuracy and Stability of Numerical
            // Algorithms, 2nd ed., SIAM 2002, ch. 4; references §30).
            double mean = 0;
            if (settings.detrend() == Detrend.MEAN) {
                double a0 = 0;
                double a1 = 0;
                double a2 = 0;
                double a3 = 0;
                int i = 0;
                for (; i + 3 < n; i += 4) {
                    a0 += x[from + i];
                    a1 += x[from + i + 1];
                    a2 += x[from + i + 2];
                    a3 += x[from + i + 3];
                }
                for (; i < n; i++) {
                    a0 += x[from + i];
                }
                mean = ((a0 + a1) + (a2 + a3)) / n;
            }
            double m0 = 0;
            double m1 = 0;
            double m2 = 0;
            double m3 = 0;
            int i = 0;
            for (; i + 3 < n; i += 4) {
                double v0 = x[from + i] - mean;
                double v1 = x[from + i + 1] - mean;
                double v2 = x[from + i + 2] - mean;
                double v3 = x[from + i + 3] - mean;
                m0 += v0 * v0;
                m1 += v1 * v1;
                m2 += v2 * v2;
                m3 += v3 * v3;
                work[i] = v0 * window[i];
                work[i + 1] = v1 * window[i + 1];
                work[i + 2] = v2 * window[i + 2];
                work[i + 3] = v3 * window[i + 3];
            }
            for (; i < n; i++) {
                double v = x[from + i] - mean;
                m0 += v * v;
                work[i] = v * window[i];
            }
            double ms = (m0 + m1) + (m2 + m3);
            if (!Double.isFinite(ms)) {
                // a non-finite sample makes the mean square non-finite: name the first one
                for (int k = 0; k < n; k++) {
                    if (!Double.isFinite(x[from + k])) {
                        badSample[slot] = consumed + from + k;
                        return;
                    }
                }
            }
            badSample[slot] = -1;
            meanSquare[slot] = ms / n;
            if (mag2[slot] == null) {
                mag2[slot] = new double[settings.binCount()];
            }
            fft.magnitudeSquared(work, mag2[slot]);
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
