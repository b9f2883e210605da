package org.lodestep.cli;

import picocli.CommandLine.Command;

/** {@code lodestep resonance}: find resonant step rates and what to do about them. */
@Command(name = "resonance",
        mixinStandardHelpOptions = true,
        description = "Find the step rates where a motor and its load resonate, and the rates to avoid.")
final class ResonanceCommand implements Runnable {
    @picocli.CommandLine.Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }
}
