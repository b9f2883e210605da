package org.lodestep.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.concurrent.Callable;

import org.lodestep.capture.Captures;
import org.lodestep.sample.InputFormatException;
import org.lodestep.sample.SampledSignal;
import org.lodestep.report.ResonanceHtml;
import org.lodestep.report.ResonanceJson;
import org.lodestep.report.ResonanceText;
import org.lodestep.resonance.RingDownFit;
import org.lodestep.resonance.RingDownResult;

import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code lodestep resonance ringdown}: natural frequency and damping from a single-step response. */
@Command(name = "ringdown",
        mixinStandardHelpOptions = true,
        description = {
            "Fit a damped sinusoid to a single-step (or tap) response capture: natural frequency, damped frequency,"
                + " damping ratio and fit quality (R²).",
            "The fit starts at the largest excursion and ends where the oscillation has decayed into the noise."},
        footerHeading = "%nExamples:%n",
        footer = {
            "  lodestep resonance ringdown single-step.csv",
            "  lodestep resonance ringdown single-step.csv --channel accel --from-s 0.1 --to-s 0.3 --json",
            "",
            "Safety: the motor is energised during a step test; keep hands off the shaft and load."})
final class ResonanceRingdownCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "FILE", description = "Capture of the response: CSV, WAV or rig capture.")
    Path file;

    @Option(names = "--channel", paramLabel = "NAME", description = "Channel to fit (default: the first).")
    String channel;

    @Option(names = "--from-s", paramLabel = "S", description = "Ignore samples before this time, s.")
    Double fromS;

    @Option(names = "--to-s", paramLabel = "S", description = "Ignore samples after this time, s.")
    Double toS;

    @Option(names = "--json", description = "Print JSON instead of text.")
    boolean json;

    @Option(names = "--report", paramLabel = "FILE.html",
            description = "Also write a self-contained HTML report: the fitted decay drawn over the data.")
    Path report;

    @picocli.CommandLine.Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        String source = file.toString();
        SampledSignal sig = Captures.readAll(file);
        if (sig.channels().isEmpty()) {
            throw new InputFormatException(source, InputFormatException.NO_LINE, null, null, "has no data channels");
        }
        int c = channel == null ? 0 : ResonanceSweepCommand.index(sig.channels(), channel, source, "--channel");
        String name = sig.channels().get(c).name();
        double[] x = sig.channel(c);
        double fs = sig.sampleRateHz();
        int from = fromS == null ? 0 : (int) Math.max(0, Math.ceil((fromS - sig.startTimeS()) * fs));
        int to = toS == null ? x.length : (int) Math.min(x.length, Math.floor((toS - sig.startTimeS()) * fs) + 1);
        if (to <= from) {
            throw new UsageException("--from-s/--to-s select no samples of " + source + " (it runs from "
                    + sig.startTimeS() + " s for " + x.length / fs + " s)");
        }
        double[] part = Arrays.copyOfRange(x, from, to);
        double t0 = sig.startTimeS() + from / fs;
        RingDownResult r = ResonanceSweepCommand.analysis(() -> RingDownFit.fit(part, fs, t0), source, name);
        if (report != null) {
            double[] t = new double[part.length];
            for (int i = 0; i < t.length; i++) {
                t[i] = t0 + i / fs;
            }
            ResonanceHtml.ringDown(source, name, sig.channels().get(c).unit(), t, part, r).write(report);
        }
        if (json) {
            out.println(ResonanceJson.ringDown(source, name, r));
        } else {
            ResonanceText.ringDown(out, source, name, r);
        }
        out.flush();
        return ExitCode.OK;
    }
}
