package org.lodestep.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;

import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/**
 * {@code lodestep demo}: runs every analysis on the bundled sample captures and the virtual rig, in a scenario of our
 * own, so a new user sees what the tool does without hardware.
 */
@Command(name = "demo",
        mixinStandardHelpOptions = true,
        description = "Run every analysis on the bundled sample captures and the virtual rig.")
final class DemoCommand implements Callable<Integer> {

    @Option(names = "--captures", paramLabel = "DIR", defaultValue = "sample-captures",
            description = "Folder of sample captures (default: ${DEFAULT-VALUE}).")
    Path captures;

    @Option(names = "--out", paramLabel = "DIR", defaultValue = "demo-output",
            description = "Folder the demo writes its reports and records to (default: ${DEFAULT-VALUE}).")
    Path outDir;

    @picocli.CommandLine.Spec
    picocli.CommandLine.Model.CommandSpec spec;

    /** One part of the demo: a short story and the commands that tell it. */
    interface Section {
        String title();

        /** Runs the section; returns a worst exit code of the commands it ran that is not expected by the story. */
        int run(Path captures, Path outDir, PrintWriter out, PrintWriter err) throws Exception;
    }

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        List<Section> sections = List.of(
                new LeadsDemo(),
                new RigDemo(),
                new ResonanceDemo());
        int worst = ExitCode.OK;
        for (Section s : sections) {
            out.println();
            out.println("=== " + s.title() + " ===");
            worst = Math.max(worst, s.run(captures, outDir, out, err));
        }
        out.flush();
        return worst;
    }
}
