package org.lodestep.cli;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.lodestep.report.html.OutputFile;

/**
 * Demo section: the salvaged HX-5718-08 motor (its card from the sample captures of the motor section) is to drive
 * the invented Harrow &amp; Vane HV-420 Y belt gantry (carriage 2.0 kg, cable-chain drag 0.11 N·m, 40 mm per
 * revolution, 16 microsteps), whose avoid-list comes from the resonance section's sample sweep. Will it reach
 * 450 mm/s with margin on 24 V, and on 48 V; then a profile through the bands, played on the virtual rig.
 */
final class DriveDemo implements DemoCommand.Section {

    @Override
    public String title() {
        return "Drive: will the HX-5718-08 reach 450 mm/s on the HV-420 Y gantry, and a profile through its bands";
    }

    @Override
    public int run(Path captures, Path outDir, PrintWriter out, PrintWriter err) throws Exception {
        Path dir = outDir.resolve("drive");
        Files.createDirectories(dir);
        Path motor = captures.resolve("motor");
        List<String> identify = new ArrayList<>(List.of("motor", "identify",
                "--resistance", motor.resolve("resistance.csv").toString()));
        try (var files = Files.list(motor)) {
            for (Path p : files.filter(f -> f.getFileName().toString().startsWith("step-")).sorted().toList()) {
                identify.add("--step-response");
                identify.add(p.toString());
            }
        }
        identify.addAll(List.of("--back-emf", motor.resolve("back-emf.csv").toString(), "--supply-v", "24",
                "--phase-current-a", "1.2", "--json"));
        Path card = dir.resolve("hx-5718-08-card.json");
        int worst = quiet(card, err, identify);
        out.println("1. The motor card of the salvaged HX-5718-08 (bipolar series), as 'motor identify --json'"
                + " writes it: " + card);
        Path avoid = dir.resolve("hv420-y-avoid-list.json");
        StringWriter sink = new StringWriter();
        try (PrintWriter pw = new PrintWriter(sink)) {
            worst = Math.max(worst, Main.run(pw, err, "resonance", "sweep",
                    captures.resolve("resonance").resolve("belt-axis-sweep.csv").toString(), "--microsteps", "16",
                    "--travel-mm-per-rev", "40", "--natural-hz", "116", "--damping-ratio", "0.084",
                    "--avoid-list", avoid.toString()));
        }
        out.println("2. The gantry's avoid-list from its sweep: " + avoid);
        List<String> axis = List.of("--card", card.toString(), "--rotor-inertia-kgm2", "5.4e-6", "--current-a",
                "1.2", "--microsteps", "16", "--travel-mm-per-rev", "40", "--load-mass-kg", "2.0",
                "--friction-torque-nm", "0.11", "--target-mm-per-s", "450");
        out.println();
        out.println("3. On the 24 V supply the motor had: reached, but with less than the 30 % margin (exit 3 is"
                + " this story's expected answer); the suggestions say what would do.");
        List<String> curve24 = new ArrayList<>(List.of("drive", "curve"));
        curve24.addAll(axis);
        curve24.addAll(List.of("--supply-v", "24", "--report", dir.resolve("drive-curve-24v.html").toString()));
        int code = step(out, err, curve24);
        if (code != ExitCode.FINDING) {
            worst = Math.max(worst, code == ExitCode.OK ? ExitCode.INTERNAL : code);
        }
        out.println();
        out.println("4. On a 48 V supply (within the driver's rating):");
        List<String> curve48 = new ArrayList<>(List.of("drive", "curve"));
        curve48.addAll(axis);
        curve48.addAll(List.of("--supply-v", "48", "--report", dir.resolve("drive-curve-48v.html").toString()));
        worst = Math.max(worst, step(out, err, curve48));
        out.println();
        out.println("5. An S-curve profile to 450 mm/s and back through the gantry's bands, exported for the"
                + " controller, and played on the virtual rig beside a naive constant acceleration.");
        List<String> plan = new ArrayList<>(List.of("drive", "plan"));
        plan.addAll(axis);
        plan.addAll(List.of("--supply-v", "48", "--avoid-list", avoid.toString(), "--shape", "s-curve",
                "--cruise-s", "0.3", "--table", dir.resolve("hv420-y-profile.csv").toString(), "--table-json",
                dir.resolve("hv420-y-profile.json").toString(), "--simulate", "--report",
                dir.resolve("drive-plan.html").toString()));
        worst = Math.max(worst, step(out, err, plan));
        return worst;
    }

    private static int step(PrintWriter out, PrintWriter err, List<String> args) {
        out.println("$ lodestep " + String.join(" ", args));
        return Main.run(out, err, args.toArray(String[]::new));
    }

    /** Runs a command whose standard output is a document to keep, written whole. */
    private static int quiet(Path file, PrintWriter err, List<String> args) throws java.io.IOException {
        StringWriter json = new StringWriter();
        int code;
        try (PrintWriter jw = new PrintWriter(json)) {
            code = Main.run(jw, err, args.toArray(String[]::new));
        }
        OutputFile.write(file, json.toString());
        return code;
    }
}
