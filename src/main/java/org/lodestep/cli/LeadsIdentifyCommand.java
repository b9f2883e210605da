package org.lodestep.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;

import org.lodestep.capture.LeadPairArgument;
import org.lodestep.capture.LeadPairReading;
import org.lodestep.report.LeadsHtml;
import org.lodestep.report.ProvenanceBlock;
import org.lodestep.workflow.Provenance;
import org.lodestep.report.LeadsJsonView;
import org.lodestep.report.LeadsTextReport;
import org.lodestep.workflow.LeadsFromReadings;
import org.lodestep.workflow.Progress;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code lodestep leads identify}: windings, taps, findings and driver connections from resistance files. */
@Command(name = "identify",
        mixinStandardHelpOptions = true,
        description = {"Identify windings, centre taps, faults and driver connections from lead-pair resistances.",
            "Each FILE is one motor: a pair list (header lead_a,lead_b,resistance_ohm) or a square matrix. "
                + "Missing pairs are fine while the answer is determined; otherwise the pairs to measure next are "
                + "listed."},
        footerHeading = "%nExamples:%n",
        footer = {"  lodestep leads identify sample-captures/leads/kl-03-microscope-stage-6lead.tsv",
            "  lodestep leads identify --pair red-blue=2.4 --pair green-black=2.4 --pair red-green=OL",
            "  lodestep leads identify --json --ambient-c 31 motor.csv",
            "  lodestep leads identify --rig sim:salvage-8          (the rig measures, in the order needed)",
            "Exit code 3 when a motor has an error-severity finding (e.g. open-winding)."})
final class LeadsIdentifyCommand implements Callable<Integer> {

    @Parameters(paramLabel = "FILE", arity = "0..*", description = "CSV files of lead-pair resistances, one motor each.")
    List<Path> files = new ArrayList<>();

    @Option(names = "--pair", paramLabel = "A-B=OHMS",
            description = "A reading on the command line, repeatable: " + LeadPairArgument.FORM
                    + ". With one FILE, adds to (or replaces) its readings.")
    List<String> pairs = new ArrayList<>();

    @Option(names = "--rig", paramLabel = "ADDR",
            description = "Measure through a bench rig instead of reading files: the rig takes the pairs in the "
                    + "order the identification asks for them. " + RigCli.ADDRESS_HELP)
    String rig;

    @Option(names = "--report", paramLabel = "FILE.html",
            description = "Also write a self-contained HTML report of the motor: a wiring diagram for each driver"
                    + " connection, windings, findings and readings (one FILE only).")
    Path report;

    @Mixin
    LeadsIdentifyOptions options;

    @picocli.CommandLine.Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        if (report != null && (rig != null || files.size() > 1)) {
            throw new UsageException("--report writes the report of one motor: give one FILE (without --rig)");
        }
        if (rig != null) {
            if (!files.isEmpty() || !pairs.isEmpty()) {
                throw new UsageException("--rig measures the motor itself: give no FILE or --pair with it");
            }
            PrintWriter out = spec.commandLine().getOut();
            return RigLeadsIdentify.run(RunProvenance.of(spec), rig, options.settings(), options.json, out,
                    options.json ? spec.commandLine().getErr() : out);
        }
        if (files.isEmpty() && pairs.isEmpty()) {
            throw new UsageException("give at least one FILE or --pair (see --help)");
        }
        if (files.size() > 1 && !pairs.isEmpty()) {
            throw new UsageException("--pair adds to one FILE; with several files, put the readings in the files");
        }
        List<LeadPairReading> extra = new ArrayList<>();
        for (String p : pairs) {
            extra.add(LeadPairArgument.parse(p, "--pair"));
        }
        LeadsFromReadings.Result result = WorkflowCall.run(() -> LeadsFromReadings.run(
                new LeadsFromReadings.Settings(files, extra, options.settings()), Progress.NONE));
        PrintWriter out = spec.commandLine().getOut();
        Provenance provenance = RunProvenance.of(spec).withInputs("readings", files);
        List<LeadsJsonView.MotorJson> json = new ArrayList<>();
        for (LeadsFromReadings.Motor m : result.motors()) {
            String source = m.source() != null ? m.source() : "--pair";
            String title = m.motor() != null ? "Motor " + m.motor() + " (" + source + ")"
                    : m.source() == null ? "Readings from --pair" : source;
            if (report != null) {
                ProvenanceBlock.html(LeadsHtml.report(m.motor() != null ? "Motor " + m.motor() : title, m.source(),
                        m.identification()), provenance).write(report);
            }
            if (options.json) {
                json.add(LeadsJsonView.of(source, m.motor(), m.identification(), null));
            } else {
                LeadsTextReport.write(out, title, m.identification());
                out.println();
            }
        }
        if (options.json) {
            out.println(ProvenanceBlock.json(LeadsJsonView.write(json), provenance));
        } else {
            out.println(LeadsIdentifyOptions.CAUTION);
            out.print(ProvenanceBlock.text(provenance));
        }
        out.flush();
        return ExitCode.ofIdentification(result.hasError(),
                result.motors().stream().allMatch(m -> m.identification().determined()));
    }
}
