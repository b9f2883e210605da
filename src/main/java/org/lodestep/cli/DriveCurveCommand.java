package org.lodestep.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;

import org.lodestep.report.ProvenanceBlock;
import org.lodestep.workflow.Provenance;
import org.lodestep.drive.SpeedAnswer;
import org.lodestep.report.DriveHtml;
import org.lodestep.report.DriveJson;
import org.lodestep.report.DriveText;
import org.lodestep.workflow.DriveCurve;
import org.lodestep.workflow.Progress;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** {@code lodestep drive curve}: the torque curve, and with a target the answer whether the load reaches it. */
@Command(name = "curve",
        mixinStandardHelpOptions = true,
        description = {
            "Pull-out torque against speed of a motor on a chopper or constant-voltage drive (steady-state phasor"
                + " model with back-EMF, current and supply limits), and with a target speed and a load: reachable"
                + " or not, the margin at the target, the highest speed with the margin, and what to change.",
            "Exit code 3 when the target is not reached with the margin."},
        footerHeading = "%nExamples:%n",
        footer = {
            "  lodestep drive curve --card card.json --rotor-inertia-kgm2 5.4e-6 --supply-v 36 --current-a 1.2",
            "  lodestep drive curve --phase-resistance-ohm 2.4 --phase-inductance-h 8e-3 --kt-nm-per-a 0.18 \\",
            "      --rotor-inertia-kgm2 5.4e-6 --supply-v 24 --current-a 1.2 --microsteps 16 \\",
            "      --travel-mm-per-rev 40 --load-mass-kg 1.5 --friction-torque-nm 0.03 --target-mm-per-s 250"})
final class DriveCurveCommand implements Callable<Integer> {
    @Mixin
    DriveOptions options;

    @Option(names = "--simulate",
            description = "Also measure the curve on the virtual rig's dynamometer (phase circuits with back-EMF, this"
                    + " drive) at eight rates around the corner, beside the prediction.")
    boolean simulate;

    @Option(names = "--json", description = "Print JSON instead of text.")
    boolean json;

    @Option(names = "--report", paramLabel = "FILE.html",
            description = "Also write a self-contained HTML report: torque curve, load line, operating point.")
    Path report;

    @picocli.CommandLine.Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        DriveCurve.Settings s = options.settings(simulate);
        DriveCurve.Result r = DriveOptions.usage(() -> DriveCurve.run(s, Progress.NONE));
        Provenance provenance = options.provenance(spec);
        if (report != null) {
            ProvenanceBlock.html(DriveHtml.curve(r), provenance).write(report);
        }
        if (json) {
            out.println(ProvenanceBlock.json(DriveJson.curve(r), provenance));
        } else {
            DriveText.curve(out, r);
            out.print(ProvenanceBlock.text(provenance));
        }
        out.flush();
        return r.answer() != null && r.answer().verdict() != SpeedAnswer.Verdict.REACHABLE
                ? ExitCode.FINDING : ExitCode.OK;
    }
}
