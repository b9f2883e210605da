package org.lodestep.workflow;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Objects;

import org.lodestep.capture.Captures;
import org.lodestep.capture.SweepProfile;
import org.lodestep.resonance.AvoidList;
import org.lodestep.resonance.BandSettings;
import org.lodestep.resonance.RateUnits;
import org.lodestep.resonance.Recommendations;
import org.lodestep.resonance.ResponseChannel;
import org.lodestep.resonance.SweepAnalyzer;
import org.lodestep.resonance.SweepLaw;
import org.lodestep.resonance.SweepResult;
import org.lodestep.resonance.SweepSettings;
import org.lodestep.sample.ArraySampleStream;
import org.lodestep.sample.Channel;
import org.lodestep.sample.InputFormatException;
import org.lodestep.sample.SampleStream;
import org.lodestep.sample.SampledSignal;
import org.lodestep.sample.SweepShape;
import org.lodestep.signal.Detrend;
import org.lodestep.signal.SpectralSettings;
import org.lodestep.signal.Window;

/**
 * Analyses a vibration, sound or phase-current capture taken during a step-rate sweep, from a file or from a rig capture: picks
 * the channels, resolves where the step rate comes from (a recorded step-pulse channel, else the settings' sweep
 * law, else the capture's {@code # sweep=} metadata), streams the samples through {@link SweepAnalyzer}, and turns
 * the bands into an avoid-list in the user's units.
 *
 * <p>Errors: an impossible setting is an {@link IllegalArgumentException} (the caller's input at fault); a capture
 * that cannot give an answer is an {@link InputFormatException} naming the source.
 */
public final class ResonanceSweep {
    /** Frames read per block: large enough to amortise the reader, small enough to keep memory flat. */
    static final int BLOCK_FRAMES = 1 << 16;

    private ResonanceSweep() {
    }

    /**
     * What to analyse and how. Boxed and NaN values mean "not given".
     *
     * @param channel            channel to analyse by name or header, or null for the first that is not the pulse
     *                           channel
     * @param pulseChannel       recorded step-pulse channel, or null; when given it overrides any sweep law
     * @param shape              programmed sweep shape, or null to take it from the capture's metadata
     * @param startFullStepsPerS programmed start rate, or null (metadata)
     * @param endFullStepsPerS   programmed end rate, or null (metadata)
     * @param durationS          programmed duration, s, or null (metadata, else the capture's length)
     * @param microsteps         step pulses per full step, or null (metadata, else 1)
     * @param rotorTeeth         rotor teeth N_r (full steps/rev = 4·N_r)
     * @param travelMmPerRev     axis travel per revolution, mm, or NaN
     * @param naturalHz          natural frequency to classify the bands by, Hz, or NaN to estimate it
     * @param dampingRatio       damping ratio from a ring-down, for the advice, or NaN
     * @param bands              band detection settings
     * @param segmentSamples     spectral segment length, samples, or null for a power of two near 0.1 s
     * @param window             spectral window
     * @param crossingPeriods    oscillation periods allowed to cross a band, for the least crossing acceleration
     * @param margin             fraction each avoided band is widened by on both sides
     * @param currentDrive       for a phase-current channel (unit A), the drive it was recorded under:
     *                           {@link ResponseChannel#CURRENT_CONSTANT_VOLTAGE} or
     *                           {@link ResponseChannel#CURRENT_CHOPPER}; null assumes constant voltage
     */
    public record Settings(String channel, String pulseChannel, SweepShape shape, Double startFullStepsPerS,
                           Double endFullStepsPerS, Double durationS, Integer microsteps, int rotorTeeth,
                           double travelMmPerRev, double naturalHz, double dampingRatio, BandSettings bands,
                           Integer segmentSamples, Window window, double crossingPeriods, double margin,
                           ResponseChannel currentDrive) {
        public Settings {
            Objects.requireNonNull(bands, "bands");
            Objects.requireNonNull(window, "window");
            if (currentDrive == ResponseChannel.VIBRATION) {
                throw new IllegalArgumentException("the current drive must be constant voltage or chopper");
            }
        }

        /** Settings for a vibration channel, or a current channel under an assumed constant-voltage drive. */
        public Settings(String channel, String pulseChannel, SweepShape shape, Double startFullStepsPerS,
                        Double endFullStepsPerS, Double durationS, Integer microsteps, int rotorTeeth,
                        double travelMmPerRev, double naturalHz, double dampingRatio, BandSettings bands,
                        Integer segmentSamples, Window window, double crossingPeriods, double margin) {
            this(channel, pulseChannel, shape, startFullStepsPerS, endFullStepsPerS, durationS, microsteps,
                    rotorTeeth, travelMmPerRev, naturalHz, dampingRatio, bands, segmentSamples, window,
                    crossingPeriods, margin, null);
        }

        /** Everything from the capture and the defaults: 1.8° motor, Hann window, 5 periods to cross, 5 % margin. */
        public static Settings defaults() {
            return new Settings(null, null, null, null, null, null, null, 50, Double.NaN, Double.NaN, Double.NaN,
                    BandSettings.defaults(), null, Window.HANN, 5, 0.05);
        }

        /** These settings with a programmed sweep law. */
        public Settings withLaw(SweepShape shape, double startFullStepsPerS, double endFullStepsPerS,
                                Double durationS) {
            return new Settings(channel, pulseChannel, shape, startFullStepsPerS, endFullStepsPerS, durationS,
                    microsteps, rotorTeeth, travelMmPerRev, naturalHz, dampingRatio, bands, segmentSamples, window,
                    crossingPeriods, margin, currentDrive);
        }
    }

    /**
     * What the analysis found, with what a report needs to show it.
     *
     * @param source      the capture's name (file path or rig address)
     * @param channel     name of the analysed channel
     * @param unit        its unit ("" when none)
     * @param sampleRateHz samples per second
     * @param rateLaw     where the step rate came from, in words ("linear sweep 20 to 400 full steps/s over 20 s")
     * @param units       the user's rate units (microsteps, teeth, travel)
     * @param sweep       response curve, bands, spectra
     * @param avoid       the rates to avoid or cross quickly
     * @param spectrogramColumnRatesFullStepsPerS the step rate at each spectrogram column from the sweep law, or
     *                    null when the rate is known per segment only (step pulses) or there is no spectrogram
     */
    public record Result(String source, String channel, String unit, double sampleRateHz, String rateLaw,
                         RateUnits units, SweepResult sweep, AvoidList avoid,
                         double[] spectrogramColumnRatesFullStepsPerS) {
        public Result {
            Objects.requireNonNull(sweep, "sweep");
            Objects.requireNonNull(avoid, "avoid");
            spectrogramColumnRatesFullStepsPerS = spectrogramColumnRatesFullStepsPerS == null ? null
                    : spectrogramColumnRatesFullStepsPerS.clone();
        }

        @Override
        public double[] spectrogramColumnRatesFullStepsPerS() {
            return spectrogramColumnRatesFullStepsPerS == null ? null : spectrogramColumnRatesFullStepsPerS.clone();
        }
    }

    /** Opens the capture afresh for each pass (a pass may count frames before the analysis). */
    @FunctionalInterface
    interface Source {
        SampleStream open() throws IOException, InputFormatException;
    }

    /** Analyses a capture file (CSV, WAV or rig capture); parsing runs a few blocks ahead on a second thread. */
    public static Result analyse(Path file, Settings settings, Progress progress)
            throws IOException, InputFormatException {
        progress.step("analysing sweep " + file);
        return run(() -> Captures.open(file), true, settings, progress);
    }

    /** Analyses a capture held in memory, for example one just recorded by the rig. */
    public static Result analyse(SampledSignal capture, Settings settings, Progress progress)
            throws IOException, InputFormatException {
        progress.step("analysing sweep " + capture.source());
        return run(() -> ArraySampleStream.of(capture), false, settings, progress);
    }

    private static Result run(Source source, boolean readAhead, Settings set, Progress progress)
            throws IOException, InputFormatException {
        Plan plan;
        try (SampleStream s = source.open()) {
            plan = plan(s, set);
        }
        SweepSettings sweepSettings = sweepSettings(plan.sampleRateHz, set, plan.kind);
        SweepAnalyzer analyzer = plan.law != null
                ? SweepAnalyzer.programmed(sweepSettings, plan.sampleRateHz, plan.law, plan.kind)
                : SweepAnalyzer.fromPulses(sweepSettings, plan.sampleRateHz, plan.units.microsteps(), plan.kind);
        SweepResult result;
        try (SampleStream s = readAhead ? Captures.readAhead(source.open(), BLOCK_FRAMES) : source.open()) {
            long total = s.knownFrameCount();
            double[][] buf = new double[s.channels().size()][BLOCK_FRAMES];
            double[] pulses = plan.pulse >= 0 ? buf[plan.pulse] : null;
            long done = 0;
            int got;
            while ((got = s.read(buf, 0, BLOCK_FRAMES)) >= 0) {
                try {
                    analyzer.feed(buf[plan.vib], pulses, 0, got);
                } catch (IllegalArgumentException e) {
                    throw cannot(s.source(), plan.vibName, e);
                }
                done += got;
                progress.advanced(done, total);
            }
            try {
                result = analyzer.finish(set.bands(), set.naturalHz());
            } catch (IllegalArgumentException e) {
                throw cannot(s.source(), plan.vibName, e);
            }
        }
        AvoidList avoid = Recommendations.avoidList(result.bands(), plan.units, result.naturalFrequencyHz(),
                set.dampingRatio(), set.crossingPeriods(), set.margin());
        return new Result(plan.source, plan.vibName, plan.unit, plan.sampleRateHz, plan.lawText, plan.units, result,
                avoid, columnRates(plan.law, result));
    }

    /** What the first pass settles: channels, rate source, units. */
    private record Plan(String source, int vib, int pulse, String vibName, String unit, double sampleRateHz,
                        RateUnits units, SweepLaw law, String lawText, ResponseChannel kind) {
    }

    /** A channel in amperes is a phase current; anything else is taken as vibration or sound. */
    private static ResponseChannel kind(Channel c, Settings set) {
        if (!c.unit().equalsIgnoreCase("a")) {
            return ResponseChannel.VIBRATION;
        }
        return set.currentDrive() != null ? set.currentDrive() : ResponseChannel.CURRENT_CONSTANT_VOLTAGE;
    }

    private static Plan plan(SampleStream s, Settings set) throws IOException, InputFormatException {
        String source = s.source();
        List<Channel> chans = s.channels();
        int pulse = set.pulseChannel() == null ? -1 : index(chans, set.pulseChannel(), source, "pulse channel");
        int vib = set.channel() != null ? index(chans, set.channel(), source, "channel")
                : firstOtherThan(chans, pulse, source);
        double fs = s.sampleRateHz();
        SweepProfile profile = SweepProfile.fromMetadata(s.metadata(), source);
        int micro = set.microsteps() != null ? set.microsteps()
                : profile != null && profile.microsteps().isPresent() ? profile.microsteps().getAsInt() : 1;
        RateUnits units = new RateUnits(micro, set.rotorTeeth(), set.travelMmPerRev());
        if (pulse >= 0) {
            return new Plan(source, vib, pulse, chans.get(vib).name(), chans.get(vib).unit(), fs, units, null,
                    "from the rising edges of channel " + chans.get(pulse).name() + " at " + micro
                            + (micro == 1 ? " pulse" : " pulses") + " per full step", kind(chans.get(vib), set));
        }
        SweepShape shape = set.shape() != null ? set.shape() : profile == null ? null : profile.shape();
        Double start = set.startFullStepsPerS() != null ? set.startFullStepsPerS()
                : profile == null ? null : profile.startFullStepsPerS();
        Double end = set.endFullStepsPerS() != null ? set.endFullStepsPerS()
                : profile == null ? null : profile.endFullStepsPerS();
        Double duration = set.durationS() != null ? set.durationS()
                : profile != null && profile.durationS().isPresent() ? profile.durationS().getAsDouble() : null;
        if (shape == null || start == null || end == null) {
            throw new InputFormatException(source, InputFormatException.NO_LINE, null, null,
                    "has no sweep law: expected '# sweep=linear|log' with '# sweep_start_full_steps_per_s='"
                            + " and '# sweep_end_full_steps_per_s=' in the file, or the options --sweep,"
                            + " --start and --end, or a step-pulse channel (--pulse-channel)");
        }
        // Without a stated duration the sweep is taken to span the capture: one counting pass finds its length.
        double dur = duration != null ? duration : countFrames(s) / fs;
        SweepLaw law = new SweepLaw(shape, start, end, dur);
        String text = String.format(Locale.ROOT, "%s sweep %s to %s full steps/s over %s s", shape.word(),
                fmt(start), fmt(end), fmt(dur));
        return new Plan(source, vib, -1, chans.get(vib).name(), chans.get(vib).unit(), fs, units, law, text,
                kind(chans.get(vib), set));
    }

    private static SweepSettings sweepSettings(double sampleRateHz, Settings set, ResponseChannel kind) {
        SweepSettings d = kind.isCurrent() ? SweepSettings.forCurrent(sampleRateHz)
                : SweepSettings.forSampleRate(sampleRateHz);
        int n = set.segmentSamples() != null ? set.segmentSamples() : d.spectral().segmentLength();
        return new SweepSettings(new SpectralSettings(n, n / 2, set.window(), Detrend.MEAN), d.rateResolution(),
                d.spectrogramColumns());
    }

    /**
     * An analyzer for a capture still arriving whose rate follows {@code law}, set up as {@link #analyse} sets up
     * the default analysis of channel {@code channel}: what a live response curve is drawn from.
     */
    static SweepAnalyzer live(Channel channel, double sampleRateHz, SweepLaw law) {
        ResponseChannel kind = kind(channel, Settings.defaults());
        return SweepAnalyzer.programmed(sweepSettings(sampleRateHz, Settings.defaults(), kind), sampleRateHz, law,
                kind);
    }

    /** The law's rate at each spectrogram column, so the map can be drawn against step rate. */
    private static double[] columnRates(SweepLaw law, SweepResult r) {
        if (law == null || r.spectrogram() == null) {
            return null;
        }
        double[] rates = new double[r.spectrogram().columnCount()];
        for (int c = 0; c < rates.length; c++) {
            rates[c] = law.rateFullStepsPerSAt(r.spectrogram().columnTimeS(c));
        }
        return rates;
    }

    private static long countFrames(SampleStream s) throws IOException, InputFormatException {
        if (s.knownFrameCount() >= 0) {
            return s.knownFrameCount(); // WAV and rig captures state it: no need to read the data twice
        }
        double[][] buf = new double[s.channels().size()][BLOCK_FRAMES];
        long n = 0;
        int got;
        while ((got = s.read(buf, 0, BLOCK_FRAMES)) >= 0) {
            n += got;
        }
        return n;
    }

    /** The index of the channel called {@code name} (its name or its full header). */
    static int index(List<Channel> chans, String name, String source, String what) throws InputFormatException {
        for (int i = 0; i < chans.size(); i++) {
            if (chans.get(i).name().equals(name) || chans.get(i).header().equals(name)) {
                return i;
            }
        }
        StringBuilder names = new StringBuilder();
        for (Channel c : chans) {
            names.append(names.length() == 0 ? "" : ", ").append(c.name());
        }
        throw new InputFormatException(source, InputFormatException.NO_LINE, what, name,
                "is not a channel of this file; expected one of " + names);
    }

    private static int firstOtherThan(List<Channel> chans, int pulse, String source) throws InputFormatException {
        for (int i = 0; i < chans.size(); i++) {
            if (i != pulse) {
                return i;
            }
        }
        throw new InputFormatException(source, InputFormatException.NO_LINE, null, null,
                "has no channel to analyse besides the pulse channel");
    }

    /** An analysis that the capture cannot support: the input's fault, named with its source and channel. */
    static InputFormatException cannot(String source, String channel, IllegalArgumentException e) {
        return new InputFormatException(source, InputFormatException.NO_LINE, channel, null, e.getMessage());
    }

    private static String fmt(double v) {
        return v == Math.rint(v) ? String.format(Locale.ROOT, "%.0f", v) : String.format(Locale.ROOT, "%.4g", v);
    }
}
