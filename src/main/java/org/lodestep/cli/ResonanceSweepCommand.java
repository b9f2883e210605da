package org.lodestep.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;

import org.lodestep.capture.Captures;
import org.lodestep.sample.Channel;
import org.lodestep.sample.InputFormatException;
import org.lodestep.sample.SampleStream;
import org.lodestep.capture.SweepProfile;
import org.lodestep.report.OutputFile;
import org.lodestep.report.ResonanceHtml;
import org.lodestep.report.ResonanceJson;
import org.lodestep.report.ResonanceText;
import org.lodestep.resonance.AvoidList;
import org.lodestep.resonance.BandSettings;
import org.lodestep.resonance.RateUnits;
import org.lodestep.resonance.Recommendations;
import org.lodestep.resonance.SweepAnalyzer;
import org.lodestep.resonance.SweepLaw;
import org.lodestep.resonance.SweepResult;
import org.lodestep.resonance.SweepSettings;
import org.lodestep.signal.Detrend;
import org.lodestep.signal.SpectralSettings;
import org.lodestep.signal.Window;

import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code lodestep resonance sweep}: bands of a step-rate sweep capture, in the user's units, with advice. */
@Command(name = "sweep",
        mixinStandardHelpOptions = true,
        description = {
            "Find the step-rate bands where the motor and its load resonate, from a vibration or sound capture"
                + " (CSV, WAV or rig capture) taken during a step-rate sweep.",
            "The step rate comes from a recorded step-pulse channel when --pulse-channel is given, else from the"
                + " options --sweep/--start/--end/--duration, else from the file's '# sweep=' metadata.",
            "Rates are full steps per second unless a name says pulses."},
        footerHeading = "%nExamples:%n",
        footer = {
            "  lodestep resonance sweep sweep.csv --microsteps 8 --travel-mm-per-rev 40",
            "  lodestep resonance sweep phone.wav --sweep log --start 40 --end 800 --json",
            "  lodestep resonance sweep rig.csv --pulse-channel step --avoid-list a.json",
            "",
            "Safety: a sweep moves the axis through its whole speed range; clear the",
            "travel, fit the guards, keep the emergency stop in reach; follow local codes."})
final class ResonanceSweepCommand implements Callable<Integer> {
    private static final int BLOCK_FRAMES = 1 << 16;

    @Parameters(index = "0", paramLabel = "FILE", description = "Capture: time-series CSV, WAV, or rig capture.")
    Path file;

    @Option(names = "--channel", paramLabel = "NAME",
            description = "Channel to analyse (default: the first channel that is not the pulse channel).")
    String channel;

    @Option(names = "--pulse-channel", paramLabel = "NAME",
            description = "Recorded step-pulse channel: rising edges give the step rate (overrides any sweep law).")
    String pulseChannel;

    @Option(names = "--sweep", paramLabel = "LAW", description = "Programmed sweep law: linear or log.")
    SweepLaw.Shape shape;

    @Option(names = "--start", paramLabel = "RATE", description = "Sweep start rate, full steps/s.")
    Double start;

    @Option(names = "--end", paramLabel = "RATE", description = "Sweep end rate, full steps/s.")
    Double end;

    @Option(names = "--duration", paramLabel = "S",
            description = "Sweep duration, s (default: the file's sweep_duration_s, else the capture length).")
    Double duration;

    @Option(names = "--microsteps", paramLabel = "N",
            description = "Step pulses per full step at the driver (default: the file's microsteps, else 1).")
    Integer microsteps;

    @Option(names = "--rotor-teeth", paramLabel = "N", defaultValue = "50",
            description = "Rotor teeth; full steps/rev = 4 × teeth (default: ${DEFAULT-VALUE}, a 1.8° motor).")
    int rotorTeeth;

    @Option(names = "--travel-mm-per-rev", paramLabel = "MM",
            description = "Axis travel per motor revolution, mm (adds mm/s to every rate).")
    Double travelMmPerRev;

    @Option(names = "--natural-hz", paramLabel = "HZ",
            description = "Natural frequency f_n, Hz (from a ring-down or prediction) to classify the bands;"
                    + " default: estimated from the bands.")
    Double naturalHz;

    @Option(names = "--damping-ratio", paramLabel = "ZETA",
            description = "Damping ratio from a ring-down, for the advice.")
    Double dampingRatio;

    @Option(names = "--threshold-db", paramLabel = "DB", defaultValue = "3",
            description = "A band opens this far over the running baseline, dB (default: ${DEFAULT-VALUE}).")
    double thresholdDb;

    @Option(names = "--absolute-level", paramLabel = "RMS",
            description = "Instead: a band opens above this RMS level, in the channel's unit.")
    Double absoluteLevel;

    @Option(names = "--hysteresis-db", paramLabel = "DB", defaultValue = "1.5",
            description = "A band closes this far below its opening level, dB (default: ${DEFAULT-VALUE}).")
    double hysteresisDb;

    @Option(names = "--merge-gap", paramLabel = "FRACTION", defaultValue = "0.05",
            description = "Bands closer than this fraction of the rate are merged (default: ${DEFAULT-VALUE}).")
    double mergeGap;

    @Option(names = "--edge-drop-db", paramLabel = "DB", defaultValue = "3",
            description = "A band's edges are where the level is this far below its peak, dB (default: ${DEFAULT-VALUE},"
                    + " the half-power points).")
    double edgeDropDb;

    @Option(names = "--segment", paramLabel = "SAMPLES",
            description = "Spectral segment length, samples (default: a power of two near 0.1 s).")
    Integer segment;

    @Option(names = "--window", paramLabel = "WINDOW", defaultValue = "HANN",
            description = "Spectral window: ${COMPLETION-CANDIDATES} (default: ${DEFAULT-VALUE}).")
    Window window;

    @Option(names = "--crossing-periods", paramLabel = "N", defaultValue = "5",
            description = "Oscillation periods allowed to cross a band, for the minimum acceleration"
                    + " (default: ${DEFAULT-VALUE}).")
    double crossingPeriods;

    @Option(names = "--margin", paramLabel = "FRACTION", defaultValue = "0.05",
            description = "Widen each avoided band by this fraction on both sides (default: ${DEFAULT-VALUE}).")
    double margin;

    @Option(names = "--avoid-list", paramLabel = "FILE.json", description = "Also write the avoid-list as JSON.")
    Path avoidListFile;

    @Option(names = "--response", description = "Include the response curve in the JSON output.")
    boolean response;

    @Option(names = "--json", description = "Print JSON instead of text.")
    boolean json;

    @Option(names = "--report", paramLabel = "FILE.html",
            description = "Also write a self-contained HTML report: response curve with the bands shaded, spectrogram"
                    + " against step rate, rates to avoid.")
    Path report;

    @picocli.CommandLine.Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        String source = file.toString();
        int vib;
        int pulse;
        SweepLaw law;
        RateUnits units;
        double sampleRateHz;
        String unit;
        String vibName;
        String lawText;
        try (SampleStream s = Captures.open(file)) {
            List<Channel> chans = s.channels();
            pulse = pulseChannel == null ? -1 : index(chans, pulseChannel, source, "--pulse-channel");
            vib = channel != null ? index(chans, channel, source, "--channel") : firstOtherThan(chans, pulse, source);
            unit = chans.get(vib).unit();
            vibName = chans.get(vib).name();
            sampleRateHz = s.sampleRateHz();
            SweepProfile profile = SweepProfile.fromMetadata(s.metadata(), source);
            int micro = microsteps != null ? microsteps
                    : profile != null && profile.microsteps().isPresent() ? profile.microsteps().getAsInt() : 1;
            units = units(micro);
            if (pulse >= 0) {
                law = null;
                lawText = "from the rising edges of channel " + chans.get(pulse).name() + " at " + micro
                        + (micro == 1 ? " pulse" : " pulses") + " per full step";
            } else {
                SweepLaw.Shape sh = shape != null ? shape : profile == null ? null
                        : profile.law() == SweepProfile.Law.LINEAR ? SweepLaw.Shape.LINEAR : SweepLaw.Shape.LOG;
                Double st = start != null ? start : profile == null ? null : profile.startFullStepsPerS();
                Double en = end != null ? end : profile == null ? null : profile.endFullStepsPerS();
                Double du = duration != null ? duration
                        : profile != null && profile.durationS().isPresent() ? profile.durationS().getAsDouble() : null;
                if (sh == null || st == null || en == null) {
                    throw new InputFormatException(source, InputFormatException.NO_LINE, null, null,
                            "has no sweep law: expected '# sweep=linear|log' with '# sweep_start_full_steps_per_s='"
                                    + " and '# sweep_end_full_steps_per_s=' in the file, or the options --sweep,"
                                    + " --start and --end, or a step-pulse channel (--pulse-channel)");
                }
                // Without a stated duration the sweep is taken to span the capture: one counting pass finds its length.
                double dur = du != null ? du : countFrames(s) / sampleRateHz;
                law = usage(() -> new SweepLaw(sh, st, en, dur));
                lawText = String.format(Locale.ROOT, "%s sweep %s to %s full steps/s over %s s",
                        sh.name().toLowerCase(Locale.ROOT), fmt(st), fmt(en), fmt(dur));
            }
        }
        SweepSettings settings = settings(sampleRateHz);
        BandSettings d = BandSettings.defaults();
        BandSettings bands = usage(() -> new BandSettings(thresholdDb,
                absoluteLevel == null ? Double.NaN : absoluteLevel, hysteresisDb, d.baselineHalfWidth(),
                d.baselineQuantile(), mergeGap, d.minPoints(), edgeDropDb));
        SweepAnalyzer analyzer = law != null ? SweepAnalyzer.programmed(settings, sampleRateHz, law)
                : usage(() -> SweepAnalyzer.fromPulses(settings, sampleRateHz, units.microsteps()));
        SweepResult result;
        // Parsing runs on a second thread, a few blocks ahead of the spectra.
        try (SampleStream s = Captures.readAhead(Captures.open(file), BLOCK_FRAMES)) {
            double[][] buf = new double[s.channels().size()][BLOCK_FRAMES];
            double[] pulses = pulse >= 0 ? buf[pulse] : null;
            int got;
            while ((got = s.read(buf, 0, BLOCK_FRAMES)) >= 0) {
                int n = got;
                analysis(() -> {
                    analyzer.feed(buf[vib], pulses, 0, n);
                    return null;
                }, source, vibName);
            }
            result = analysis(() -> analyzer.finish(bands, naturalHz == null ? Double.NaN : naturalHz), source,
                    vibName);
        }
        AvoidList avoid = usage(() -> Recommendations.avoidList(result.bands(), units, result.naturalFrequencyHz(),
                dampingRatio == null ? Double.NaN : dampingRatio, crossingPeriods, margin));
        if (avoidListFile != null) {
            OutputFile.write(avoidListFile, ResonanceJson.avoidList(avoid) + System.lineSeparator());
        }
        ResonanceText.SweepHeader header = new ResonanceText.SweepHeader(source, vibName, unit,
                sampleRateHz, lawText);
        if (report != null) {
            double[] columnRates = null;
            if (law != null && result.spectrogram() != null) {
                columnRates = new double[result.spectrogram().columnCount()];
                for (int c = 0; c < columnRates.length; c++) {
                    columnRates[c] = law.rateFullStepsPerSAt(result.spectrogram().columnTimeS(c));
                }
            }
            ResonanceHtml.sweep(header, result, units, avoid, columnRates).write(report);
        }
        if (json) {
            out.println(ResonanceJson.sweep(header, result, units, avoid, response));
        } else {
            ResonanceText.sweep(out, header, result, units, avoid);
            if (avoidListFile != null) {
                out.println();
                out.println("Avoid-list written to " + avoidListFile);
            }
        }
        out.flush();
        return ExitCode.OK;
    }

    private SweepSettings settings(double sampleRateHz) {
        SweepSettings d = SweepSettings.forSampleRate(sampleRateHz);
        int n = segment != null ? segment : d.spectral().segmentLength();
        return usage(() -> new SweepSettings(new SpectralSettings(n, n / 2, window, Detrend.MEAN),
                d.rateResolution(), d.spectrogramColumns()));
    }

    private RateUnits units(int micro) {
        return usage(() -> new RateUnits(micro, rotorTeeth, travelMmPerRev == null ? Double.NaN : travelMmPerRev));
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

    static int index(List<Channel> chans, String name, String source, String option) throws InputFormatException {
        for (int i = 0; i < chans.size(); i++) {
            if (chans.get(i).name().equals(name) || chans.get(i).header().equals(name)) {
                return i;
            }
        }
        throw new InputFormatException(source, InputFormatException.NO_LINE, option, name,
                "is not a channel of this file; expected one of " + names(chans));
    }

    static int firstOtherThan(List<Channel> chans, int pulse, String source) throws InputFormatException {
        for (int i = 0; i < chans.size(); i++) {
            if (i != pulse) {
                return i;
            }
        }
        throw new InputFormatException(source, InputFormatException.NO_LINE, null, null,
                "has no channel to analyse besides the pulse channel");
    }

    static String names(List<Channel> chans) {
        StringBuilder b = new StringBuilder();
        for (Channel c : chans) {
            b.append(b.length() == 0 ? "" : ", ").append(c.name());
        }
        return b.toString();
    }

    private static String fmt(double v) {
        return v == Math.rint(v) ? String.format(Locale.ROOT, "%.0f", v) : String.format(Locale.ROOT, "%.4g", v);
    }

    /** Runs a constructor or engine call whose IllegalArgumentException is the user's option at fault. */
    static <T> T usage(java.util.function.Supplier<T> s) {
        try {
            return s.get();
        } catch (IllegalArgumentException e) {
            throw new UsageException(e.getMessage());
        }
    }

    /** Runs an analysis whose IllegalArgumentException means the input cannot give an answer. */
    static <T> T analysis(java.util.function.Supplier<T> s, String source, String column) throws InputFormatException {
        try {
            return s.get();
        } catch (IllegalArgumentException e) {
            throw new InputFormatException(source, InputFormatException.NO_LINE, column, null, e.getMessage());
        }
    }
}
