package org.lodestep.cli;

import java.io.PrintWriter;
import java.util.concurrent.Callable;

import org.lodestep.report.Json;
import org.lodestep.report.ProvenanceBlock;
import org.lodestep.report.RigText;
import org.lodestep.rig.RigInfo;
import org.lodestep.workflow.Progress;
import org.lodestep.workflow.Provenance;
import org.lodestep.workflow.RigDescribe;

import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code lodestep rig info ADDR}: handshake and capability listing; {@code sim:} alone lists the scenarios. */
@Command(name = "info", mixinStandardHelpOptions = true,
        description = "Connect to a rig and show its identity, firmware, lead count and what it can measure. "
                + "With the address sim: alone, list the virtual rig's scenarios.",
        footer = {"%nExamples:%n  lodestep rig info sim:%n  lodestep rig info sim:salvage-8%n"
                + "  lodestep rig info serial:/dev/ttyUSB0?baud=921600"})
final class RigInfoCommand implements Callable<Integer> {
    @Parameters(index = "0", paramLabel = "ADDR", description = RigCli.ADDRESS_HELP)
    String address;

    @Option(names = "--json", description = "Print JSON instead of text.")
    boolean json;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        if (address.equals("sim:")) {
            var scenarios = RigDescribe.scenarios();
            // The tool's own catalogue, keyed by scenario name: no run or input to trace, so no provenance.
            out.print(json ? Json.write(scenarios) + "\n" : RigText.scenarios(scenarios));
        } else {
            RigInfo info = WorkflowCall.run(() -> RigDescribe.info(address, Progress.NONE));
            Provenance p = RunProvenance.of(spec).withRig(RunProvenance.rig(info));
            out.print(json ? ProvenanceBlock.json(Json.write(info), p) + "\n" : RigText.info(info)
                    + ProvenanceBlock.text(p));
        }
        out.flush();
        return ExitCode.OK;
    }
}
