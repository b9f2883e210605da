package org.lodestep.cli;

import picocli.CommandLine.Command;

/** {@code lodestep leads}: which leads form windings, where the taps are, how to wire the motor. */
@Command(name = "leads",
        mixinStandardHelpOptions = true,
        description = "Identify windings, centre taps and driver connections from lead-pair resistances.")
final class LeadsCommand implements Runnable {
    @picocli.CommandLine.Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }
}
