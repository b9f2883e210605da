package org.lodestep.cli;

import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.lodestep.report.OutputFile;

/**
 * Demo section: a salvaged 8-lead motor with taped lead numbers is identified from its resistance matrix, one step
 * response per coil, one series step response and a hand-turned back-EMF capture (files in
 * {@code sample-captures/motor/}); then a shuffled 8-lead motor on the virtual rig is measured end to end.
 */
final class MotorDemo implements DemoCommand.Section {

    @Override
    public String title() {
        return "Motor identification: a salvaged 8-lead motor (HX-5718-08, leads taped 1 to 8)";
    }

    @Override
    public int run(Path captures, Path outDir, PrintWriter out, PrintWriter err) throws Exception {
        Path dir = captures.resolve("motor");
        List<String> args = new ArrayList<>(List.of("motor", "identify",
                "--resistance", dir.resolve("resistance.csv").toString()));
        try (var files = Files.list(dir)) {
            for (Path p : files.filter(f -> f.getFileName().toString().startsWith("step-")).sorted().toList()) {
                args.add("--step-response");
                args.add(p.toString());
            }
        }
        args.addAll(List.of("--back-emf", dir.resolve("back-emf.csv").toString(), "--supply-v", "24",
                "--phase-current-a", "1.2", "--inertia-kgm2", "5.4e-6"));
        out.println("$ lodestep " + String.join(" ", args));
        Files.createDirectories(outDir);
        Path html = outDir.resolve("motor-card.html");
        List<String> withReport = new ArrayList<>(args);
        withReport.addAll(List.of("--report", html.toString()));
        int code = Main.run(out, err, withReport.toArray(String[]::new));
        out.println("report: " + html);
        Files.createDirectories(outDir);
        List<String> jsonArgs = new ArrayList<>(args);
        jsonArgs.add("--json");
        java.io.StringWriter json = new java.io.StringWriter();
        try (PrintWriter jw = new PrintWriter(json)) {
            code = Math.max(code, Main.run(jw, err, jsonArgs.toArray(String[]::new)));
        }
        Path card = outDir.resolve("motor-card.json");
        OutputFile.write(card, json.toString());
        out.println("(the same card as JSON: " + card + ")");

        // The same job on the virtual rig: a shuffled 8-lead motor with colour-coded leads, measured end to end.
        // Its simulated hand turns the shaft 3 revolutions (2.5 s at up to 90 rpm), as a technician would count them.
        out.println();
        String[] rigArgs = {"motor", "identify", "--rig", "sim:salvage-8", "--revolutions", "3", "--connection",
            "parallel", "--supply-v", "24"};
        out.println("$ lodestep " + String.join(" ", rigArgs));
        code = Math.max(code, Main.run(out, err, rigArgs));
        return code;
    }
}
