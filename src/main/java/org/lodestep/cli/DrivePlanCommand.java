package org.lodestep.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;

import org.lodestep.report.ProvenanceBlock;
import org.lodestep.workflow.Provenance;
import org.lodestep.drive.PlanningException;
import org.lodestep.drive.ProfileShape;
import org.lodestep.report.DriveHtml;
import org.lodestep.report.DriveJson;
import org.lodestep.report.DriveText;
import org.lodestep.report.html.OutputFile;
import org.lodestep.workflow.DrivePlan;
import org.lodestep.workflow.Progress;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** {@code lodestep drive plan}: a profile to the target and back that respects the torque and crosses the bands. */
@Command(name = "plan",
        mixinStandardHelpOptions = true,
        description = {
            "Plan a move from standstill to the target speed and back (trapezoidal, or S-curve with a jerk limit)"
                + " whose acceleration never asks for more than the torque with margin at any speed, never dwells"
                + " in a band of the avoid-list, and crosses each band at no less than its crossing acceleration;"
                + " export it as a step-rate table (CSV and JSON).",
            "Exit code 3 when no profile meets the constraints (the line says why and what to change), or when"
                + " --simulate finds the planned profile losing steps."},
        footerHeading = "%nExamples:%n",
        footer = {
            "  lodestep drive plan --card card.json --rotor-inertia-kgm2 5.4e-6 --supply-v 36 --current-a 1.2 \\",
            "      --microsteps 16 --travel-mm-per-rev 40 --load-mass-kg 1.5 --target-mm-per-s 250 \\",
            "      --avoid-list avoid.json --shape s-curve --table profile.csv"})
final class DrivePlanCommand implements Callable<Integer> {
    @Mixin
    DriveOptions options;

    @Option(names = "--avoid-list", paramLabel = "FILE.json",
            description = "Avoid-list JSON written by 'resonance sweep --avoid-list'.")
    Path avoidList;

    @Option(names = "--shape", paramLabel = "SHAPE", defaultValue = "trapezoidal",
            description = "trapezoidal or s-curve (default: ${DEFAULT-VALUE}).")
    String shape;

    @Option(names = "--jerk", paramLabel = "FULL_STEPS_S3",
            description = "S-curve jerk limit, full steps/s³ (default: the ramp to the base acceleration gains a"
                    + " tenth of the target rate).")
    Double jerk;

    @Option(names = "--max-acceleration", paramLabel = "FULL_STEPS_S2",
            description = "Your own acceleration limit, full steps/s² (default: the torque's).")
    Double maxAcceleration;

    @Option(names = "--cruise-s", paramLabel = "S", defaultValue = "0.5",
            description = "Time at the target speed, s (default: ${DEFAULT-VALUE}).")
    double cruiseS;

    @Option(names = "--table-step-s", paramLabel = "S", defaultValue = "0.001",
            description = "Time step of the step-rate table, s (default: ${DEFAULT-VALUE}).")
    double tableStepS;

    @Option(names = "--table", paramLabel = "FILE.csv", description = "Write the step-rate table as CSV.")
    Path tableCsv;

    @Option(names = "--table-json", paramLabel = "FILE.json", description = "Write the step-rate table as JSON.")
    Path tableJson;

    @Option(names = "--simulate",
            description = "Also play the table on the virtual rig (phase circuits with back-EMF, this drive and load)"
                    + " beside a naive constant-acceleration profile to the same peak, and count lost steps.")
    boolean simulate;

    @Option(names = "--json", description = "Print JSON instead of text.")
    boolean json;

    @Option(names = "--report", paramLabel = "FILE.html",
            description = "Also write a self-contained HTML report: torque curve with the bands, and the profile.")
    Path report;

    @picocli.CommandLine.Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        ProfileShape s = switch (shape.toLowerCase(java.util.Locale.ROOT)) {
            case "trapezoidal", "trapezoid" -> ProfileShape.TRAPEZOIDAL;
            case "s-curve", "s", "scurve" -> ProfileShape.S_CURVE;
            default -> throw new UsageException("--shape: '" + shape + "' is not a profile shape: expected"
                    + " trapezoidal or s-curve");
        };
        if (jerk != null && s != ProfileShape.S_CURVE) {
            throw new UsageException("--jerk applies to --shape s-curve only");
        }
        DrivePlan.Settings settings = new DrivePlan.Settings(options.settings(false), avoidList, s,
                maxAcceleration == null ? Double.POSITIVE_INFINITY : maxAcceleration,
                jerk == null ? Double.NaN : jerk, cruiseS, tableStepS, simulate);
        DrivePlan.Result r;
        try {
            r = DriveOptions.usage(() -> DrivePlan.run(settings, Progress.NONE));
        } catch (PlanningException e) {
            err.println(spec.qualifiedName() + ": no profile: " + e.getMessage());
            err.flush();
            return ExitCode.FINDING;
        }
        Provenance provenance = options.provenance(spec);
        if (avoidList != null) {
            provenance = provenance.withInput("avoid-list", avoidList);
        }
        if (tableCsv != null) {
            OutputFile.write(tableCsv, r.table().csv());
        }
        if (tableJson != null) {
            OutputFile.write(tableJson, ProvenanceBlock.json(DriveJson.table(r.table()), provenance)
                    + System.lineSeparator());
        }
        if (report != null) {
            ProvenanceBlock.html(DriveHtml.plan(r), provenance).write(report);
        }
        if (json) {
            out.println(ProvenanceBlock.json(DriveJson.plan(r), provenance));
        } else {
            DriveText.plan(out, r);
            if (tableCsv != null) {
                out.println("step-rate table: " + tableCsv);
            }
            out.print(ProvenanceBlock.text(provenance));
        }
        out.flush();
        return r.simulation() != null && r.simulation().planned().lostFullSteps() != 0
                ? ExitCode.FINDING : ExitCode.OK;
    }
}
