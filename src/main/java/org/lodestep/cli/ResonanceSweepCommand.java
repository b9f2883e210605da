package org.lodestep.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;

import org.lodestep.report.ProvenanceBlock;
import org.lodestep.workflow.Provenance;
import org.lodestep.report.html.OutputFile;
import org.lodestep.report.ResonanceHtml;
import org.lodestep.report.ResonanceJson;
import org.lodestep.report.ResonanceText;
import org.lodestep.resonance.BandSettings;
import org.lodestep.resonance.ResponseChannel;
import org.lodestep.sample.SweepShape;
import org.lodestep.workflow.Progress;
import org.lodestep.workflow.ResonanceSweep;
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
            "A channel in amperes is read as a phase current (constant-voltage drive unless --drive chopper): bands"
                + " then come from the current's harmonics, weaker evidence than an accelerometer's.",
            "The first line says whether the rotor kept synchronism; exit code 3 when it lost it.",
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
    @Parameters(index = "0", paramLabel = "FILE", description = "Capture: time-series CSV, WAV, or rig capture.")
    Path file;

    @Option(names = "--channel", paramLabel = "NAME",
            description = "Channel to analyse (default: the first channel that is not the pulse channel).")
    String channel;

    @Option(names = "--pulse-channel", paramLabel = "NAME",
            description = "Recorded step-pulse channel: rising edges give the step rate (overrides any sweep law).")
    String pulseChannel;

    @Option(names = "--sweep", paramLabel = "LAW", description = "Programmed sweep law: linear or log.")
    SweepShape shape;

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

    @Option(names = "--drive", paramLabel = "DRIVE",
            description = "For a phase-current channel (unit A): the drive it was recorded under, voltage"
                    + " (constant-voltage, the default) or chopper (current-regulating: bands are not reported).")
    String drive;

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
        ResonanceSweep.Settings settings = WorkflowCall.run(this::settings);
        ResonanceSweep.Result r = WorkflowCall.run(() -> ResonanceSweep.analyse(file, settings, Progress.NONE));
        Provenance provenance = RunProvenance.of(spec).withInput("sweep", file);
        if (avoidListFile != null) {
            OutputFile.write(avoidListFile, ProvenanceBlock.json(ResonanceJson.avoidList(r.avoid()), provenance)
                    + System.lineSeparator());
        }
        ResonanceText.SweepHeader header = new ResonanceText.SweepHeader(r.source(), r.channel(), r.unit(),
                r.sampleRateHz(), r.rateLaw());
        if (report != null) {
            ProvenanceBlock.html(ResonanceHtml.sweep(header, r.sweep(), r.units(), r.avoid(),
                    r.spectrogramColumnRatesFullStepsPerS()), provenance).write(report);
        }
        if (json) {
            out.println(ProvenanceBlock.json(ResonanceJson.sweep(header, r.sweep(), r.units(), r.avoid(), response),
                    provenance));
        } else {
            ResonanceText.sweep(out, header, r.sweep(), r.units(), r.avoid());
            if (avoidListFile != null) {
                out.println();
                out.println("Avoid-list written to " + avoidListFile);
            }
            out.print(ProvenanceBlock.text(provenance));
        }
        out.flush();
        // a rotor that slipped lost position: an error-severity finding
        return r.sweep().stall().lostSynchronism() ? ExitCode.FINDING : ExitCode.OK;
    }

    private ResonanceSweep.Settings settings() {
        BandSettings d = BandSettings.defaults();
        BandSettings bands = new BandSettings(thresholdDb, absoluteLevel == null ? Double.NaN : absoluteLevel,
                hysteresisDb, d.baselineHalfWidth(), d.baselineQuantile(), mergeGap, d.minPoints(), edgeDropDb);
        return new ResonanceSweep.Settings(channel, pulseChannel, shape, start, end, duration, microsteps, rotorTeeth,
                travelMmPerRev == null ? Double.NaN : travelMmPerRev, naturalHz == null ? Double.NaN : naturalHz,
                dampingRatio == null ? Double.NaN : dampingRatio, bands, segment, window, crossingPeriods, margin,
                currentDrive());
    }

    private ResponseChannel currentDrive() {
        if (drive == null) {
            return null;
        }
        return switch (drive.toLowerCase(java.util.Locale.ROOT)) {
            case "voltage" -> ResponseChannel.CURRENT_CONSTANT_VOLTAGE;
            case "chopper" -> ResponseChannel.CURRENT_CHOPPER;
            default -> throw new IllegalArgumentException("--drive must be voltage or chopper, got '" + drive + "'");
        };
    }
}
