package org.lodestep.cli;

import java.io.PrintWriter;
import java.util.List;
import java.util.concurrent.Callable;

import org.lodestep.rig.Scenarios;
import org.lodestep.rig.Transports;

import picocli.CommandLine.Command;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code lodestep rig ports}: the serial ports a rig could be on, and the virtual rig's addresses. */
@Command(name = "ports", mixinStandardHelpOptions = true,
        description = "List serial ports (where a bench rig may be plugged in) and the virtual rig's sim: addresses.",
        footer = {"%nExample:%n  lodestep rig ports"})
final class RigPortsCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        List<String[]> ports = Transports.serialPorts();
        if (ports.isEmpty()) {
            out.println("No serial ports found.");
        } else {
            out.println("Serial ports:");
            for (String[] p : ports) {
                out.printf("  %-28s %s%n", p[0], p[1]);
            }
        }
        out.println("Virtual rig: " + String.join(", ", Scenarios.all().keySet().stream().map(s -> "sim:" + s)
                .toList()));
        out.flush();
        return ExitCode.OK;
    }
}
