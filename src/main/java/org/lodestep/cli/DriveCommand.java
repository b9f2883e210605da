package org.lodestep.cli;

import picocli.CommandLine.Command;

/** {@code lodestep drive}: will the motor reach its speed, and a profile that crosses the bands safely. */
@Command(name = "drive",
        mixinStandardHelpOptions = true,
        description = "Pull-out torque against speed on a given driver and supply, whether a load reaches its speed"
                + " with margin, and motion profiles that cross resonance bands fast enough.")
final class DriveCommand implements Runnable {
    @picocli.CommandLine.Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }
}
