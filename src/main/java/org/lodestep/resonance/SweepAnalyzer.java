package org.lodestep.resonance;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import org.lodestep.signal.BesideWork;
import org.lodestep.signal.OrderTracking;
import org.lodestep.signal.SegmentSpectra;
import org.lodestep.signal.Spectrogram;
import org.lodestep.signal.SpectrumScaling;
import org.lodestep.signal.Welch;

/**
 * Streams a vibration (or sound) capture taken during a step-rate sweep and builds the response curve: for each
 * spectral segment, the step rate at its centre (from the programmed law or from a recorded step-pulse channel), the
 * segment's RMS and the amplitudes at the electrical frequency and at 1×, 2× and 4× the full-step rate, accumulated in
 * log-spaced rate bins. Memory depends on the rate range and the segment length, not on the capture length.
 *
 * <p>Feed blocks with {@link #feed}, then call {@link #finish}.
 */
public final class SweepAnalyzer {
    private static final double[] ORDERS = {0.25, 1, 2, 4};
    /** Harmonics of the electrical frequency tracked in a phase current: the fundamental, then 4k ± 1. */
    static final int[] CURRENT_HARMONICS = {1, 3, 5, 7, 9};
    /** Lowest electrical frequency, in spectral bins, whose harmonics are tracked in a current. */
    static final double MIN_ELECTRICAL_BINS = 4;
    /** Pulse thresholds are set from the first second of the pulse channel. */
    private static final double PULSE_PROBE_S = 1.0;
    /** Blocks from this many frames on run the synchronism check beside the spectra (smaller: not worth a hand-off). */
    private static final int BESIDE_MIN_FRAMES = 4096;

    private final SweepSettings settings;
    private final double sampleRateHz;
    private final SweepLaw law;
    private final int microsteps;
    private final ResponseChannel kind;
    private final SynchronismDetector sync;
    private PulsePhase pulsePhase;
    private double[] stepsBuffer = new double[0];
    private final SegmentSpectra framer;
    private final Welch welch;
    private final Spectrogram spectrogram;
    private final TreeMap<Integer, RateBin> bins = new TreeMap<>();
    private final double logStep;
    private StepPulseRate pulses;
    private double[][] probe;
    private int probeFilled;
    private long fed;
    private long outside;

    private SweepAnalyzer(SweepSettings settings, double sampleRateHz, SweepLaw law, int microsteps,
                          ResponseChannel kind) {
        this.settings = settings;
        this.kind = java.util.Objects.requireNonNull(kind, "response channel");
        this.sync = new SynchronismDetector(sampleRateHz, kind.synchronousPeriodFullSteps());
        this.sampleRateHz = sampleRateHz;
        this.law = law;
        this.microsteps = microsteps;
        this.framer = new SegmentSpectra(settings.spectral(), sampleRateHz);
        this.welch = new Welch(framer);
        this.spectrogram = new Spectrogram(framer, settings.spectrogramColumns());
        this.logStep = Math.log1p(settings.rateResolution());
        framer.addListener(this::segment);
    }

    /** An analyzer for a sweep whose rate followed a programmed law. */
    public static SweepAnalyzer programmed(SweepSettings settings, double sampleRateHz, SweepLaw law) {
        return programmed(settings, sampleRateHz, law, ResponseChannel.VIBRATION);
    }

    /** An analyzer for a sweep whose rate followed a programmed law, on a channel of the given kind. */
    public static SweepAnalyzer programmed(SweepSettings settings, double sampleRateHz, SweepLaw law,
                                           ResponseChannel kind) {
        Require.positive(sampleRateHz, "sample rate", "Hz");
        return new SweepAnalyzer(settings, sampleRateHz, java.util.Objects.requireNonNull(law, "law"), 1, kind);
    }

    /**
     * An analyzer that takes the rate from a recorded step-pulse channel fed alongside the vibration.
     *
     * @param microsteps step pulses per full step at the driver
     */
    public static SweepAnalyzer fromPulses(SweepSettings settings, double sampleRateHz, int microsteps) {
        return fromPulses(settings, sampleRateHz, microsteps, ResponseChannel.VIBRATION);
    }

    /** As {@link #fromPulses(SweepSettings, double, int)}, on a channel of the given kind. */
    public static SweepAnalyzer fromPulses(SweepSettings settings, double sampleRateHz, int microsteps,
                                           ResponseChannel kind) {
        Require.positive(sampleRateHz, "sample rate", "Hz");
        if (microsteps < 1) {
            throw new IllegalArgumentException("microsteps must be at least 1 pulse per full step, got " + microsteps);
        }
        SweepAnalyzer a = new SweepAnalyzer(settings, sampleRateHz, null, microsteps, kind);
        a.probe = new double[2][(int) Math.max(settings.spectral().segmentLength(), sampleRateHz * PULSE_PROBE_S)];
        return a;
    }

    /**
     * Feeds {@code len} frames.
     *
     * @param vibration the analysed channel
     * @param pulses    the step-pulse channel (same frames), or null for a programmed sweep
     */
    public void feed(double[] vibration, double[] pulses, int off, int len) {
        if (law == null && pulses == null) {
            throw new IllegalArgumentException("this sweep takes its rate from the step-pulse channel; none was fed");
        }
        if (probe != null) {
            int take = Math.min(len, probe[0].length - probeFilled);
            System.arraycopy(vibration, off, probe[0], probeFilled, take);
            System.arraycopy(pulses, off, probe[1], probeFilled, take);
            probeFilled += take;
            if (probeFilled < probe[0].length) {
                return;
            }
            startPulses();
            off += take;
            len -= take;
        }
        analyse(vibration, pulses, off, len);
    }

    /** Rate from the pulses, spectra, and the commanded step count for the synchronism check. */
    private void analyse(double[] x, double[] pulseLevels, int off, int len) {
        if (stepsBuffer.length < len) {
            stepsBuffer = new double[len];
        }
        long first = fed;
        if (law == null) {
            pulses.feed(pulseLevels, off, len); // before the spectra: a segment's rate comes from its pulses
            pulsePhase.feed(pulseLevels, off, len, stepsBuffer, 0);
        }
        fed += len;
        // The step counts of a programmed sweep and the synchronism check need nothing from the spectra: they run
        // on a transform thread, ahead of the helpers the framer asks for, while this thread frames and transforms.
        // The detector sees the blocks one after another, in order, whichever thread runs it, so its results do not
        // change.
        Runnable beside = () -> {
            if (law != null) {
                law.fullStepsAt(first, sampleRateHz, stepsBuffer, len);
            }
            sync.feed(x, shifted(off, len), off, len);
        };
        BesideWork task = len >= BESIDE_MIN_FRAMES && Runtime.getRuntime().availableProcessors() > 1
                ? BesideWork.start(beside) : null;
        if (task == null) {
            beside.run();
        }
        framer.feed(x, off, len);
        if (task != null) {
            task.join(); // runs it here if no transform thread took it yet
        }
    }

    /** The step counts laid out at the same offset as the samples they belong to. */
    private double[] shifted(int off, int len) {
        if (off == 0) {
            return stepsBuffer;
        }
        double[] a = new double[off + len];
        System.arraycopy(stepsBuffer, 0, a, off, len);
        return a;
    }

    /** Sets the pulse thresholds at 40 % and 60 % of the probe's range, then replays the probe. */
    private void startPulses() {
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < probeFilled; i++) {
            double v = probe[1][i];
            if (!Double.isFinite(v)) {
                throw new IllegalArgumentException("step-pulse sample " + i + " is not a finite number");
            }
            min = Math.min(min, v);
            max = Math.max(max, v);
        }
        if (!(max > min)) {
            throw new IllegalArgumentException("the step-pulse channel is flat in its first " + probeFilled
                    + " samples (" + min + "): no pulses to take the rate from");
        }
        double[][] p = probe;
        int n = probeFilled;
        probe = null;
        pulses = new StepPulseRate(sampleRateHz, microsteps, min + 0.4 * (max - min), min + 0.6 * (max - min));
        pulsePhase = new PulsePhase(microsteps, min + 0.4 * (max - min), min + 0.6 * (max - min));
        analyse(p[0], p[1], 0, n);
    }

    private void segment(long firstSample, double[] mag2, double meanSquare) {
        int n = settings.spectral().segmentLength();
        double fromS = firstSample / sampleRateHz;
        double toS = (firstSample + n) / sampleRateHz;
        double rate = law != null ? law.rateFullStepsPerSAt(0.5 * (fromS + toS)) : pulses.rateFullStepsPerS(fromS, toS);
        if (!(rate > 0)) {
            outside++;
            return;
        }
        int key = (int) Math.floor(Math.log(rate) / logStep);
        RateBin bin = bins.computeIfAbsent(key, k -> new RateBin(mag2.length));
        bin.count++;
        bin.sumRate += rate;
        bin.sumMeanSquare += meanSquare;
        for (int o = 0; o < ORDERS.length; o++) {
            double a = OrderTracking.amplitudeAt(mag2, framer, ORDERS[o] * rate);
            if (Double.isNaN(a)) {
                bin.orderMissing[o] = true;
            } else {
                bin.sumOrderSquare[o] += a * a;
            }
        }
        for (int k = 0; k < mag2.length; k++) {
            bin.sumMag2[k] += (float) mag2[k];
        }
        // harmonics of an electrical frequency within a few bins of zero are not resolved: left out
        if (kind.isCurrent() && rate / 4 >= MIN_ELECTRICAL_BINS * framer.binHz()) {
            for (int h = 0; h < CURRENT_HARMONICS.length; h++) {
                double a = OrderTracking.amplitudeAt(mag2, framer, CURRENT_HARMONICS[h] * rate / 4);
                if (Double.isNaN(a)) {
                    bin.harmonicMissing[h] = true;
                } else {
                    bin.sumHarmonicSquare[h] += a * a;
                }
            }
            bin.harmonicCount++;
        }
    }

    /**
     * Finishes the analysis.
     *
     * @param bandSettings how bands are found
     * @param naturalHz    the natural frequency f_n if known (Hz), or NaN to estimate it from the bands
     * @throws IllegalArgumentException when no segment had a step rate (capture shorter than one segment, sweep law
     *                                  that does not overlap the capture, no pulses)
     */
    public SweepResult finish(BandSettings bandSettings, double naturalHz) {
        if (probe != null && probeFilled > 0) {
            startPulses();
        }
        int n = settings.spectral().segmentLength();
        if (framer.segmentCount() == 0) {
            throw new IllegalArgumentException("the capture has " + fed + " samples, fewer than one analysis segment"
                    + " of " + n + " samples");
        }
        if (bins.isEmpty()) {
            throw new IllegalArgumentException("none of the " + framer.segmentCount() + " segments has a step rate: "
                    + (law != null ? "the sweep law (" + law.durationS() + " s) does not overlap the capture"
                    : "the step-pulse channel has fewer than two rising edges per segment"));
        }
        List<RateBin> binList = new ArrayList<>(bins.values());
        List<ResponsePoint> points = points(binList);
        double[] rates = new double[points.size()];
        double[] levels = new double[points.size()];
        for (int i = 0; i < rates.length; i++) {
            rates[i] = points.get(i).rateFullStepsPerS();
            levels[i] = points.get(i).levelDb();
        }
        double[] base = kind == ResponseChannel.VIBRATION ? BandDetector.baseline(rates, levels,
                bandSettings.baselineHalfWidth(), bandSettings.baselineQuantile()) : null;
        if (base != null) {
            // the levels bands were measured against, kept with the curve so a report can draw them
            double[] enter = BandDetector.entryLevels(rates, levels, base, bandSettings);
            for (int i = 0; i < rates.length; i++) {
                points.set(i, points.get(i).withDetection(base[i], enter[i]));
            }
        }
        List<ResonanceBand> raw = kind == ResponseChannel.VIBRATION
                ? vibrationBands(points, binList, rates, levels, bandSettings)
                : kind == ResponseChannel.CURRENT_CONSTANT_VOLTAGE ? CurrentBands.find(rates, harmonics(binList),
                bandSettings) : List.of();
        String source = "given";
        double fn = naturalHz;
        if (Double.isNaN(fn)) {
            fn = BandClassifier.estimateNaturalHz(raw);
            source = Double.isNaN(fn) ? "none" : "estimated";
        }
        List<ResonanceBand> bands = new ArrayList<>();
        for (ResonanceBand b : raw) {
            bands.add(BandClassifier.classify(b, fn));
        }
        List<WatchPoint> watch = kind == ResponseChannel.VIBRATION && Double.isNaN(bandSettings.absoluteLevel())
                ? WatchList.find(rates, levels, base, bands, fn, bandSettings.thresholdDb())
                : List.of();
        // A phase current is dominated by the drive's own switching pattern, periodic in the step count whatever
        // the rotor does: on a simulated constant-voltage sweep that slipped poles its synchronous share stayed at
        // 0.99, so it cannot say the rotor kept step.
        Stall stall = kind == ResponseChannel.CURRENT_CHOPPER
                ? Stall.notJudged("not judged: a current-regulating chopper holds the phase current to its setting,"
                + " so a slipping rotor barely shows in it; record vibration or sound to see lost steps")
                : kind.isCurrent() ? Stall.notJudged("not judged: a phase current follows the drive's switching"
                + " pattern even while the rotor slips, so it cannot show lost steps; record vibration or sound")
                : SynchronismJudge.judge(sync.finish(), "the vibration");
        return new SweepResult(points, bands, fn, source, law != null ? "law" : "pulses",
                welch.spectrum(SpectrumScaling.DENSITY), spectrogram, framer.segmentCount(), outside,
                fed / sampleRateHz, kind, stall, watch, CurrentBands.note(kind));
    }

    /**
     * The response curve of the segments fed so far, by rising step rate: what a front end draws while a sweep is
     * still streaming. The points of the rate bins still filling may change with the next segments.
     */
    public List<ResponsePoint> responseSoFar() {
        return points(new ArrayList<>(bins.values()));
    }

    private static List<ResponsePoint> points(List<RateBin> binList) {
        List<ResponsePoint> points = new ArrayList<>(binList.size());
        for (RateBin b : binList) {
            double rms = Math.sqrt(b.sumMeanSquare / b.count);
            points.add(new ResponsePoint(b.sumRate / b.count, rms, 20 * Math.log10(Math.max(rms, Double.MIN_NORMAL)),
                    b.order(0), b.order(1), b.order(2), b.order(3), b.count, Double.NaN, Double.NaN));
        }
        return points;
    }

    private List<ResonanceBand> vibrationBands(List<ResponsePoint> points, List<RateBin> binList, double[] rates,
                                               double[] levels, BandSettings bandSettings) {
        List<ResonanceBand> raw = new ArrayList<>();
        for (BandDetector.Span sp : BandDetector.detect(rates, levels, bandSettings)) {
            ResponsePoint peak = points.get(sp.peak());
            raw.add(new ResonanceBand(rates[sp.first()], rates[sp.last()], peak.rateFullStepsPerS(), peak.rms(),
                    peak.levelDb(), sp.excessDb(), mechanicalHz(binList, sp.first(), sp.last()),
                    BandClass.UNCLASSIFIED, 0));
        }
        return raw;
    }

    /** Amplitudes of the tracked current harmonics, [harmonic][point]. */
    private static double[][] harmonics(List<RateBin> binList) {
        double[][] h = new double[CURRENT_HARMONICS.length][binList.size()];
        for (int i = 0; i < binList.size(); i++) {
            for (int k = 0; k < CURRENT_HARMONICS.length; k++) {
                h[k][i] = binList.get(i).harmonic(k);
            }
        }
        return h;
    }

    /** Strongest frequency of the summed spectra of a band's bins, above the lowest few bins, refined by a parabola. */
    private double mechanicalHz(List<RateBin> binList, int first, int last) {
        int nb = binList.get(0).sumMag2.length;
        double[] sum = new double[nb];
        for (int i = first; i <= last; i++) {
            RateBin b = binList.get(i);
            for (int k = 0; k < nb; k++) {
                sum[k] += b.sumMag2[k] / b.count;
            }
        }
        int lowest = settings.spectral().window().mainLobeHalfWidthBins() + 1;
        if (nb - 1 <= lowest + 1) {
            return Double.NaN;
        }
        int best = lowest;
        for (int k = lowest; k < nb - 1; k++) {
            if (sum[k] > sum[best]) {
                best = k;
            }
        }
        double a = Math.log(Math.max(sum[best - 1], Double.MIN_NORMAL));
        double b = Math.log(Math.max(sum[best], Double.MIN_NORMAL));
        double c = Math.log(Math.max(sum[best + 1], Double.MIN_NORMAL));
        double den = a - 2 * b + c;
        double delta = den < 0 ? 0.5 * (a - c) / den : 0;
        return (best + Math.max(-0.5, Math.min(0.5, delta))) * framer.binHz();
    }

    /** Accumulators of one rate bin. */
    private static final class RateBin {
        int count;
        double sumRate;
        double sumMeanSquare;
        final double[] sumOrderSquare = new double[ORDERS.length];
        final boolean[] orderMissing = new boolean[ORDERS.length];
        final float[] sumMag2;
        final double[] sumHarmonicSquare = new double[CURRENT_HARMONICS.length];
        final boolean[] harmonicMissing = new boolean[CURRENT_HARMONICS.length];
        int harmonicCount;

        RateBin(int bins) {
            sumMag2 = new float[bins];
        }

        double order(int o) {
            return orderMissing[o] ? Double.NaN : Math.sqrt(sumOrderSquare[o] / count);
        }

        double harmonic(int h) {
            return harmonicMissing[h] || harmonicCount == 0 ? Double.NaN
                    : Math.sqrt(sumHarmonicSquare[h] / harmonicCount);
        }
    }

    /** For tests: rate bins in use. */
    Map<Integer, ?> rateBins() {
        return bins;
    }
}
