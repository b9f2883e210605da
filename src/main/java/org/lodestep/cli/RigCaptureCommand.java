package org.lodestep.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;

import org.lodestep.drive.DriveMode;
import org.lodestep.report.Json;
import org.lodestep.report.ProvenanceBlock;
import org.lodestep.report.RigText;
import org.lodestep.rig.SweepPlan;
import org.lodestep.safety.Cautions;
import org.lodestep.workflow.RigCaptureFile;
import org.lodestep.workflow.RigSweepCapture;

import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code lodestep rig capture ADDR sweep --out FILE}: a step-rate sweep recorded to a capture file. */
@Command(name = "capture", mixinStandardHelpOptions = true,
        description = {"Drive a step-rate sweep through the rig (its step/direction output into your driver) while "
                + "recording vibration (accel, g), phase current (A) and the step marker (V), and save the capture: "
                + "a canonical CSV (time_s,accel_g,current_a,step_v) and a JSON sidecar with rig identity, firmware, "
                + "sweep profile, motor serial or scenario, and the CSV's SHA-256. Written whole or not at all.",
                "KIND is sweep."},
        footer = {"%nExamples:",
                "  lodestep rig capture sim:gantry-axis sweep --from 20 --to 400 --seconds 20 --out sweep.csv",
                "  lodestep rig capture serial:/dev/ttyUSB0 sweep --from 50 --to 1500 --microsteps 16 --out s.csv",
                "%nThe axis moves: the command prints the moving-axis caution first."})
final class RigCaptureCommand implements Callable<Integer> {
    @Parameters(index = "0", paramLabel = "ADDR", description = RigCli.ADDRESS_HELP)
    String address;

    @Parameters(index = "1", paramLabel = "KIND", description = "sweep.")
    String kind;

    @Option(names = "--from", paramLabel = "RATE", defaultValue = "20",
            description = "Start rate, full steps/s (default ${DEFAULT-VALUE}).")
    double from;

    @Option(names = "--to", paramLabel = "RATE", defaultValue = "400",
            description = "End rate, full steps/s (default ${DEFAULT-VALUE}); the rate changes linearly.")
    double to;

    @Option(names = "--seconds", paramLabel = "S", defaultValue = "20",
            description = "Sweep duration, s (default ${DEFAULT-VALUE}).")
    double seconds;

    @Option(names = "--microsteps", paramLabel = "M", defaultValue = "1",
            description = "Step pulses per full step set on your driver: 1 (full step), 2, 4, ... 256 "
                    + "(default ${DEFAULT-VALUE}).")
    int microsteps;

    @Option(names = "--rate", paramLabel = "HZ", defaultValue = "5000",
            description = "Sample rate, Hz (default ${DEFAULT-VALUE}).")
    double rateHz;

    @Option(names = "--out", paramLabel = "FILE.csv", required = true,
            description = "Capture file to write (must not exist); the sidecar goes beside it as .json.")
    Path out;

    @Option(names = "--drive", paramLabel = "DRIVE",
            description = "Drive the motor from the rig's own drive and record both phase currents: voltage"
                    + " (constant-voltage H-bridge, full or half steps) or chopper (current-regulating).")
    String drive;

    @Option(names = "--supply-v", paramLabel = "V", defaultValue = "0",
            description = "Supply of the rig's drive, V (default: rated current × phase resistance for voltage,"
                    + " the rig's chopper supply otherwise).")
    double supplyV;

    @Option(names = "--quiet", description = "No progress bar (it is also off when stderr is not a terminal).")
    boolean quiet;

    @Option(names = "--json", description = "Print the capture's provenance as JSON instead of a text summary.")
    boolean json;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        if (!kind.equals("sweep")) {
            throw new UsageException("KIND '" + kind + "' is not sweep (step responses and back-EMF: rig measure "
                    + "... --out FILE)");
        }
        RigSweepCapture.Settings settings = WorkflowCall.run(() -> {
            DriveMode mode = drive == null ? null : switch (drive.toLowerCase(java.util.Locale.ROOT)) {
                case "voltage" -> DriveMode.CONSTANT_VOLTAGE;
                case "chopper" -> DriveMode.CHOPPER;
                default -> throw new IllegalArgumentException("--drive must be voltage or chopper, got '" + drive
                        + "'");
            };
            RigSweepCapture.Settings s = new RigSweepCapture.Settings(address,
                    new SweepPlan(from, to, seconds, microsteps, rateHz), out, VersionProvider.version(), mode,
                    supplyV);
            RigCaptureFile.checkTarget(out); // before the caution: nothing moves for a file that cannot be written
            return s;
        });
        PrintWriter o = spec.commandLine().getOut();
        // with --json the caution goes to stderr, so standard output stays one JSON document
        PrintWriter caution = json ? spec.commandLine().getErr() : o;
        caution.println(Cautions.beforeRigAction("moving axis", String.format(Locale.ROOT,
                "the rig steps your driver up to %.0f full steps/s; the shaft and any load turn.", Math.max(from, to)),
                Cautions.motion()));
        caution.flush();
        RigSweepCapture.Result r;
        try (RigCli.Bar bar = new RigCli.Bar("sweep", spec.commandLine().getErr(), quiet)) {
            r = WorkflowCall.run(() -> RigSweepCapture.run(settings, bar));
        }
        if (json) {
            o.println(ProvenanceBlock.json(Json.write(r.capture().metadata()),
                    RunProvenance.withCaptureRig(RunProvenance.of(spec), r.capture().metadata())));
            spec.commandLine().getErr().println("saved " + r.saved());
        } else {
            o.print(RigText.capture(r.capture()));
            o.println("saved " + r.saved());
            o.print(ProvenanceBlock.text(RunProvenance.withCaptureRig(RunProvenance.of(spec), r.capture().metadata())));
        }
        o.flush();
        return ExitCode.OK;
    }
}
