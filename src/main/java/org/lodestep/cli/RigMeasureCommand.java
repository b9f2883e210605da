package org.lodestep.cli;

import java.io.Console;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;

import org.lodestep.report.Json;
import org.lodestep.report.ProvenanceBlock;
import org.lodestep.report.RigText;
import org.lodestep.safety.Cautions;
import org.lodestep.safety.Hazard;
import org.lodestep.workflow.Provenance;
import org.lodestep.workflow.RigCaptureFile;
import org.lodestep.workflow.RigMeasure;

import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code lodestep rig measure ADDR KIND}: one kind of bench measurement through the rig. */
@Command(name = "measure", mixinStandardHelpOptions = true,
        description = {"Measure through a rig: four-wire lead-pair resistance, insulation resistance lead to frame "
                + "(arm and confirm), a coil current step response, or back-EMF while you turn the shaft by hand.",
                "KIND is resistance, insulation, step-response or back-emf."},
        footer = {"%nExamples:",
                "  lodestep rig measure sim:salvage-8 resistance                 (all 28 pairs)",
                "  lodestep rig measure sim:salvage-8 resistance --pair 1-2 --pair 3-4",
                "  lodestep rig measure sim:faulty-8 insulation --volts 500 --yes-i-have-read-the-caution",
                "  lodestep rig measure sim:bench-4 step-response --pair 1-2 --volts 2 --out step.csv",
                "  lodestep rig measure sim:bench-4 back-emf --pair 1-2 --pair 3-4 --seconds 2 --out emf.csv",
                "%nThe insulation test applies high voltage; it prints a caution and needs",
                "--yes-i-have-read-the-caution, or typing ARM at the prompt on a terminal."})
final class RigMeasureCommand implements Callable<Integer> {
    @Parameters(index = "0", paramLabel = "ADDR", description = RigCli.ADDRESS_HELP)
    String address;

    @Parameters(index = "1", paramLabel = "KIND", description = "resistance, insulation, step-response or back-emf.")
    String kind;

    @Option(names = "--pair", paramLabel = "A-B", description = "Lead pair (relay positions from 1); repeat for "
            + "several. resistance: default all pairs; step-response: exactly one; back-emf: one channel per pair "
            + "(default 1-2).")
    List<String> pairTexts = new ArrayList<>();

    @Option(names = "--lead", paramLabel = "N", description = "insulation: lead to test against the frame; repeat for "
            + "several (default: every lead).")
    List<Integer> leads = new ArrayList<>();

    @Option(names = "--volts", paramLabel = "V", description = "insulation: DC test voltage, 100, 250 or 500 V "
            + "(default 500); step-response: drive voltage in V (default 2).")
    Double volts;

    @Option(names = "--seconds", paramLabel = "S", description = "insulation: dwell before the reading, s (default "
            + "60); back-emf: record length, s (default 2).")
    Double seconds;

    @Option(names = "--ms", paramLabel = "MS", defaultValue = "20",
            description = "step-response: record length, ms (default ${DEFAULT-VALUE}).")
    double ms;

    @Option(names = "--rate", paramLabel = "HZ", description = "Sample rate, Hz (step-response default 50000, "
            + "back-emf default 20000).")
    Double rateHz;

    @Option(names = "--out", paramLabel = "FILE.csv", description = "step-response and back-emf: save the capture "
            + "(canonical CSV plus a .json sidecar), written whole or not at all.")
    Path out;

    @Option(names = "--yes-i-have-read-the-caution", description = "Confirm the insulation test's caution without a "
            + "prompt (for scripts).")
    boolean confirmed;

    @Option(names = "--quiet", description = "No progress bar.")
    boolean quiet;

    @Option(names = "--json", description = "Print JSON instead of text.")
    boolean json;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        RigMeasure.Kind k;
        try {
            k = RigMeasure.Kind.valueOf(kind.replace('-', '_').toUpperCase(Locale.ROOT));
        } catch (IllegalArgumentException e) {
            throw new UsageException("KIND '" + kind + "' is not resistance, insulation, step-response or back-emf");
        }
        PrintWriter o = spec.commandLine().getOut();
        List<RigMeasure.LeadPair> pairs = new ArrayList<>();
        for (int[] p : RigCli.pairs(pairTexts, "--pair")) {
            pairs.add(new RigMeasure.LeadPair(p[0], p[1]));
        }
        if (out != null && k != RigMeasure.Kind.STEP_RESPONSE && k != RigMeasure.Kind.BACK_EMF) {
            throw new UsageException("--out saves step-response and back-emf captures only");
        }
        if (k == RigMeasure.Kind.STEP_RESPONSE && pairs.size() != 1) {
            throw new UsageException("step-response needs exactly one --pair A-B");
        }
        RigMeasure.Settings settings = WorkflowCall.run(() -> {
            RigMeasure.Settings s = new RigMeasure.Settings(address, k, pairs, leads, volts, seconds, ms, rateHz, out,
                    VersionProvider.version());
            if (out != null) {
                RigCaptureFile.checkTarget(out); // before any caution: nothing is energised for an unwritable file
            }
            return s;
        });
        // cautions go to stderr with --json, so standard output stays one JSON document
        PrintWriter caution = json ? spec.commandLine().getErr() : o;
        if (k == RigMeasure.Kind.INSULATION) {
            int v = settings.insulationVolts();
            caution.println(Cautions.beforeRigAction("insulation test", "the rig applies " + v + " V DC between the"
                    + " chosen lead and the motor frame, and discharges the winding before it answers.",
                    Hazard.INSULATION_TEST));
            caution.flush();
            if (!confirmed && !confirmAtConsole(v)) {
                throw new UsageException("insulation test not confirmed: read the caution, then add "
                        + "--yes-i-have-read-the-caution (or type ARM at the prompt)");
            }
        } else if (k == RigMeasure.Kind.STEP_RESPONSE) {
            caution.println(Cautions.beforeRigAction("energised winding", String.format(Locale.ROOT,
                    "the rig drives up to %.3g V through the winding between the chosen leads: hands off the leads"
                    + " while the test runs.", settings.stepVolts()),
                    Hazard.ENERGISED_WINDING));
        } else if (k == RigMeasure.Kind.BACK_EMF) {
            caution.println(Cautions.beforeRigAction("hand turn", "you turn the shaft while the rig records the"
                    + " voltage at the leads.", Hazard.TURNED_SHAFT));
        }
        RigMeasure.Result r;
        // a bar for streamed captures only; readings come one by one and print as a table
        boolean streams = k == RigMeasure.Kind.STEP_RESPONSE || k == RigMeasure.Kind.BACK_EMF;
        try (RigCli.Bar bar = new RigCli.Bar(k == RigMeasure.Kind.BACK_EMF ? "back-emf" : "step",
                spec.commandLine().getErr(), quiet || !streams)) {
            r = WorkflowCall.run(() -> RigMeasure.run(settings, bar));
        }
        // Readings name the rig that took them, as a capture's metadata does for a capture.
        Provenance provenance = streams
                ? RunProvenance.withCaptureRig(RunProvenance.of(spec), r.capture().metadata())
                : RunProvenance.of(spec).withRig(RunProvenance.rig(r.rig()));
        switch (k) {
            case RESISTANCE -> o.print(json ? ProvenanceBlock.json(Json.write(r.resistances()), provenance) + "\n"
                    : RigText.resistances(r.resistances(), r.rig().labels()) + ProvenanceBlock.text(provenance));
            case INSULATION -> o.print(json ? ProvenanceBlock.json(Json.write(r.insulation()), provenance) + "\n"
                    : RigText.insulation(r.insulation(), r.rig().labels()) + ProvenanceBlock.text(provenance));
            default -> {
                if (json) {
                    o.println(ProvenanceBlock.json(Json.write(r.capture().metadata()), provenance));
                } else {
                    o.print(RigText.capture(r.capture()));
                    o.print(ProvenanceBlock.text(provenance));
                }
                if (r.saved() != null) {
                    (json ? spec.commandLine().getErr() : o).println("saved " + r.saved());
                }
            }
        }
        o.flush();
        return ExitCode.OK;
    }

    private boolean confirmAtConsole(int v) {
        Console console = System.console();
        if (console == null) {
            return false;
        }
        String answer = console.readLine("Type ARM to apply %d V, anything else to cancel: ", v);
        return answer != null && answer.trim().equals("ARM");
    }
}
