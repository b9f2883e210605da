package org.lodestep.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;

import org.lodestep.report.ProvenanceBlock;
import org.lodestep.workflow.Provenance;
import org.lodestep.report.ResonanceHtml;
import org.lodestep.report.ResonanceJson;
import org.lodestep.report.ResonanceText;
import org.lodestep.workflow.Progress;
import org.lodestep.workflow.ResonanceRingdown;

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
        ResonanceRingdown.Result r = WorkflowCall.run(() -> ResonanceRingdown.fit(file,
                new ResonanceRingdown.Settings(channel, fromS, toS), Progress.NONE));
        Provenance provenance = RunProvenance.of(spec).withInput("ring-down", file);
        if (report != null) {
            ProvenanceBlock.html(ResonanceHtml.ringDown(r), provenance).write(report);
        }
        if (json) {
            out.println(ProvenanceBlock.json(ResonanceJson.ringDown(r), provenance));
        } else {
            ResonanceText.ringDown(out, r);
            out.print(ProvenanceBlock.text(provenance));
        }
        out.flush();
        return ExitCode.OK;
    }
}
