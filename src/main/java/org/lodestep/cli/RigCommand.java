package org.lodestep.cli;

import picocli.CommandLine.Command;

/** {@code lodestep rig}: talk to a bench rig or run the virtual one. */
@Command(name = "rig",
        mixinStandardHelpOptions = true,
        description = "Talk to a bench rig (serial, TCP or the virtual rig): list ports, query, measure, capture, serve, check conformance.")
final class RigCommand implements Runnable {
    @picocli.CommandLine.Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }
}
