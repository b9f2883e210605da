package org.lodestep.motor;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * A few electrical cycles of a back-EMF capture, for drawing the phases against each other: every live coil's
 * voltage with its start lead positive ({@link EmfCoil#oriented}), over the stretch where the shaft turned fastest
 * (the largest EMF, the cleanest waveform). Time runs from a rising zero crossing of phase A, so phase B's next
 * rising crossing sits at its lag: with B oriented to lag A (references §14), about a quarter of a cycle later.
 *
 * @param timeMs     time from phase A's rising zero crossing, ms
 * @param waves      one per live coil, phase A's first
 * @param periodMs   mean electrical period over the stretch (its {@code cycles} rising crossings of A), ms
 * @param bRisingMs  phase B's first rising zero crossing after A's, ms; NaN with one phase
 * @param lagDeg     how far B lags A over the whole capture, electrical degrees, as the analysis measured it
 *                   ({@link BackEmfResult#quadratureLagDeg}); NaN with one phase
 */
public record BackEmfTrace(double[] timeMs, List<Wave> waves, double periodMs, double bRisingMs, double lagDeg) {
    /** Electrical cycles drawn. */
    public static final int CYCLES = 3;
    /** At most this many samples per coil are kept (the capture is thinned by a whole stride beyond). */
    static final int MAX_SAMPLES = 2000;
    /** A zero crossing counts once the voltage has gone this fraction of the stretch's peak beyond zero. */
    static final double HYSTERESIS = 0.2;

    /**
     * One coil's voltage, start lead positive.
     *
     * @param phase    {@code "A"} or {@code "B"}
     * @param coil     the coil, start to end
     * @param voltageV the voltage from start to end, mean removed, V
     */
    public record Wave(String phase, OrientedLeads coil, double[] voltageV) {
        public Wave {
            Objects.requireNonNull(phase, "phase");
            Objects.requireNonNull(coil, "coil");
            voltageV = voltageV.clone();
        }

        @Override
        public double[] voltageV() {
            return voltageV.clone();
        }
    }

    public BackEmfTrace {
        timeMs = timeMs.clone();
        waves = List.copyOf(waves);
        for (Wave w : waves) {
            if (w.voltageV.length != timeMs.length) {
                throw new IllegalArgumentException("coil " + w.coil() + " has " + w.voltageV.length + " samples, the"
                        + " trace " + timeMs.length);
            }
        }
        Checks.positive(periodMs, "electrical period", "ms");
    }

    @Override
    public double[] timeMs() {
        return timeMs.clone();
    }

    /** A time on this trace's axis as electrical degrees from phase A's rising zero crossing. */
    public double electricalDeg(double timeMs) {
        return timeMs / periodMs * 360;
    }

    /**
     * The stretch of {@link #CYCLES} electrical cycles around the fastest turning of a capture.
     *
     * @param channels     the capture's back-EMF channels, as analysed
     * @param sampleRateHz their sample rate, Hz
     * @param result       the analysis of those channels
     * @return the trace, or null when the capture has no such stretch (too slow, too short, no live coil)
     */
    public static BackEmfTrace of(List<EmfChannel> channels, double sampleRateHz, BackEmfResult result) {
        Checks.positive(sampleRateHz, "sample rate", "Hz");
        List<EmfCoil> coils = new ArrayList<>(result.phase("A"));
        coils.addAll(result.phase("B"));
        if (coils.isEmpty()) {
            return null;
        }
        List<double[]> v = new ArrayList<>();
        for (EmfCoil c : coils) {
            EmfChannel ch = channels.stream().filter(x -> x.pair().equals(c.measured())).findFirst().orElse(null);
            if (ch == null) {
                return null;
            }
            double[] x = ch.voltageV();
            double mean = 0;
            for (double s : x) {
                mean += s / x.length;
            }
            double sign = c.reversed() ? -1 : 1;
            for (int i = 0; i < x.length; i++) {
                x[i] = sign * (x[i] - mean);
            }
            v.add(x);
        }
        double[] a = v.get(0);
        int n = a.length;
        int fastest = fastestBlock(a, sampleRateHz);
        double h = HYSTERESIS * peakNear(a, fastest, sampleRateHz);
        List<Double> rising = risingCrossings(a, h);
        // the rising crossing at or before the fastest block with CYCLES more after it
        int k = -1;
        for (int j = 0; j + CYCLES < rising.size(); j++) {
            if (rising.get(j) <= fastest || k < 0) {
                k = j;
            }
        }
        if (k < 0) {
            return null;
        }
        double t0 = rising.get(k);
        double t1 = rising.get(k + CYCLES);
        double period = (t1 - t0) / CYCLES;
        int from = (int) Math.max(0, Math.floor(t0 - 0.1 * period));
        int to = (int) Math.min(n, Math.ceil(t1 + 0.1 * period) + 1);
        int stride = Math.max(1, (int) Math.ceil((to - from) / (double) MAX_SAMPLES));
        int m = (to - from + stride - 1) / stride;
        double[] time = new double[m];
        for (int i = 0; i < m; i++) {
            time[i] = (from + i * stride - t0) / sampleRateHz * 1000;
        }
        List<Wave> waves = new ArrayList<>();
        for (int c = 0; c < coils.size(); c++) {
            double[] y = new double[m];
            for (int i = 0; i < m; i++) {
                y[i] = v.get(c)[from + i * stride];
            }
            waves.add(new Wave(coils.get(c).phase(), coils.get(c).oriented(), y));
        }
        double bRising = Double.NaN;
        List<EmfCoil> b = result.phase("B");
        if (!b.isEmpty()) {
            double[] bv = v.get(result.phase("A").size());
            for (double t : risingCrossings(bv, HYSTERESIS * peakNear(bv, fastest, sampleRateHz))) {
                if (t > t0) {
                    bRising = (t - t0) / sampleRateHz * 1000;
                    break;
                }
            }
        }
        Double lag = result.quadratureLagDeg();
        return new BackEmfTrace(time, waves, period / sampleRateHz * 1000, bRising, lag == null ? Double.NaN : lag);
    }

    /** Index of the middle of the 20 ms block with the largest mean square: the fastest turning. */
    private static int fastestBlock(double[] x, double sampleRateHz) {
        int block = Math.max(16, (int) Math.round(BackEmfAnalyzer.BLOCK_S * sampleRateHz));
        int best = 0;
        double bestSs = -1;
        for (int s = 0; s + block <= x.length; s += block) {
            double ss = 0;
            for (int i = s; i < s + block; i++) {
                ss += x[i] * x[i];
            }
            if (ss > bestSs) {
                bestSs = ss;
                best = s + block / 2;
            }
        }
        return best;
    }

    /** The largest |x| within 100 ms of {@code at}. */
    private static double peakNear(double[] x, int at, double sampleRateHz) {
        int w = (int) Math.round(0.1 * sampleRateHz);
        double p = 0;
        for (int i = Math.max(0, at - w); i < Math.min(x.length, at + w); i++) {
            p = Math.max(p, Math.abs(x[i]));
        }
        return p;
    }

    /**
     * Rising zero crossings, in fractional samples: the last interpolated crossing before the voltage, having been
     * below −h, rises above +h.
     */
    static List<Double> risingCrossings(double[] x, double h) {
        List<Double> out = new ArrayList<>();
        boolean armed = false;
        double lastZero = Double.NaN;
        for (int i = 1; i < x.length; i++) {
            if (x[i - 1] < 0 && x[i] >= 0) {
                lastZero = i - 1 + x[i - 1] / (x[i - 1] - x[i]);
            }
            if (x[i] < -h) {
                armed = true;
            } else if (armed && x[i] > h && !Double.isNaN(lastZero)) {
                out.add(lastZero);
                armed = false;
            }
        }
        return out;
    }
}
