package org.lodestep.cli;

import java.io.Console;
import java.io.PrintWriter;
import java.util.concurrent.Callable;

import org.lodestep.report.ConformanceText;
import org.lodestep.report.Json;
import org.lodestep.report.ProvenanceBlock;
import org.lodestep.rig.RigConformance;
import org.lodestep.safety.Cautions;
import org.lodestep.safety.Hazard;
import org.lodestep.workflow.Progress;
import org.lodestep.workflow.RigConformanceCheck;

import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code lodestep rig conformance ADDR}: the conformance kit for firmware authors. */
@Command(name = "conformance", mixinStandardHelpOptions = true,
        description = {"Check a rig's firmware against firmware-protocol.md: framing, CRC, frame timeout, every "
                + "command and error, duplicates, re-requests, STOP and SAFE mid-stream, the insulation arm, dwell "
                + "and abort, and the watchdog. Prints a pass/fail table naming the section of each check; exit 3 "
                + "when any check fails.",
                "It applies the rig's lowest insulation test voltage to lead 1 several times and runs a slow sweep, "
                + "so it asks for the same confirmation as an insulation test."},
        footer = {"%nExamples:",
                "  lodestep rig conformance serial:/dev/ttyACM0 --yes-i-have-read-the-caution",
                "  lodestep rig conformance 'sim:bench-4?realtime=1' --yes-i-have-read-the-caution"})
final class RigConformanceCommand implements Callable<Integer> {
    @Parameters(index = "0", paramLabel = "ADDR", description = RigCli.ADDRESS_HELP)
    String address;

    @Option(names = "--quick", description = "Leave out the slow checks (the arm's 10 s expiry, the watchdog "
            + "during a dwell).")
    boolean quick;

    @Option(names = "--yes-i-have-read-the-caution", description = "Confirm the caution without the ARM prompt "
            + "(for scripts).")
    boolean confirmed;

    @Option(names = "--json", description = "Print the table as JSON.")
    boolean json;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        PrintWriter caution = json ? err : out;
        caution.println(Cautions.beforeRigAction("conformance run", "the checks apply the rig's lowest insulation test"
                + " voltage (typically 100 V DC) between lead 1 and the motor frame several times, a few seconds each,"
                + " and run a slow sweep (10 to 20 full steps/s) that turns the shaft. Better still, test with a dummy"
                + " load of resistors on the rig's clips.", Hazard.INSULATION_TEST, Hazard.MOVING_AXIS));
        caution.flush();
        if (!confirmed && !confirmAtConsole()) {
            throw new UsageException("conformance run not confirmed: read the caution, then add "
                    + "--yes-i-have-read-the-caution (or type ARM at the prompt)");
        }
        RigConformance.Report r = RigConformanceCheck.run(new RigConformanceCheck.Settings(address, !quick),
                new Progress() {
                    @Override
                    public void step(String step) {
                        if (!json) {
                            err.println("checking: " + step);
                            err.flush();
                        }
                    }
                });
        out.print(json ? ProvenanceBlock.json(Json.write(r), RunProvenance.of(spec)) + "\n"
                : ConformanceText.table(r) + ProvenanceBlock.text(RunProvenance.of(spec)));
        out.flush();
        return r.passed() ? ExitCode.OK : ExitCode.FINDING;
    }

    private static boolean confirmAtConsole() {
        Console console = System.console();
        if (console == null) {
            return false;
        }
        String answer = console.readLine("Type ARM to start the checks, anything else to cancel: ");
        return answer != null && answer.trim().equals("ARM");
    }
}
