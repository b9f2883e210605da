package org.lodestep.cli;

import java.io.PrintWriter;
import java.nio.file.Files;
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
        Path captures = locate(this.captures);
        Files.createDirectories(outDir);
        out.println("Lodestep demo: sample captures from " + captures + ", outputs to " + outDir);
        List<Section> sections = List.of(
                new LeadsDemo(),
                new RigDemo(),
                new MotorDemo(),
                new ResonanceDemo(),
                new DriveDemo(),
                new QaDemo());
        int worst = ExitCode.OK;
        for (Section s : sections) {
            out.println();
            out.println("=== " + s.title() + " ===");
            worst = Math.max(worst, s.run(captures, outDir, out, err));
        }
        out.println();
        out.println("Demo finished; its outputs are in " + outDir.toAbsolutePath().normalize());
        List<Path> reports;
        try (java.util.stream.Stream<Path> files = Files.walk(outDir)) {
            reports = files.filter(p -> p.getFileName().toString().endsWith(".html")).sorted().toList();
        }
        if (!reports.isEmpty()) {
            out.println("HTML reports (open in any browser):");
            reports.forEach(p -> out.println("  " + p));
        }
        out.println("Bench station in a browser (leads probe, motor card, QA desk, records, sweeps):");
        out.println("  ./lodestep station --specs " + captures.resolve("qa") + " --captures " + captures.resolve("qa"));
        out.flush();
        return worst;
    }

    /**
     * The sample-captures folder: as given when it exists, else beside the checkout the jar was built in
     * ({@code target/lodestep.jar}), so the demo works from any working directory.
     */
    private static Path locate(Path given) {
        if (Files.isDirectory(given) || given.isAbsolute()) {
            if (!Files.isDirectory(given)) {
                throw new UsageException(given + ": no such folder (give --captures DIR)");
            }
            return given;
        }
        try {
            Path jar = Path.of(DemoCommand.class.getProtectionDomain().getCodeSource().getLocation().toURI());
            Path checkout = jar.getParent() == null ? null : jar.getParent().getParent();
            if (checkout != null && Files.isDirectory(checkout.resolve(given))) {
                return checkout.resolve(given);
            }
        } catch (java.net.URISyntaxException | SecurityException | IllegalArgumentException e) {
            // fall through to the message below
        }
        throw new UsageException(given + ": no such folder here or in the Lodestep checkout (give --captures DIR)");
    }
}
