package org.lodestep.cli;

import picocli.CommandLine.Command;

/** {@code lodestep motor}: full identification of an unlabeled motor. */
@Command(name = "motor",
        mixinStandardHelpOptions = true,
        description = "Identify an unlabeled motor: inductance, phasing, polarity, step angle, constants, motor card.")
final class MotorCommand implements Runnable {
    @picocli.CommandLine.Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }
}
