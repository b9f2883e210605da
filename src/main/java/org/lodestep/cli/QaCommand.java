package org.lodestep.cli;

import picocli.CommandLine.Command;

/** {@code lodestep qa}: incoming inspection against part specs, with traceable records. */
@Command(name = "qa",
        mixinStandardHelpOptions = true,
        description = "Incoming inspection: check motors against part specs, keep traceable records, report lot statistics.")
final class QaCommand implements Runnable {
    @picocli.CommandLine.Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }
}
