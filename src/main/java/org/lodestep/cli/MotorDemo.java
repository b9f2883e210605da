package org.lodestep.cli;

import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.lodestep.report.ProvenanceBlock;
import org.lodestep.wiring.Connection;
import org.lodestep.motor.MotorCard;
import org.lodestep.report.MotorCardText;
import org.lodestep.report.MotorHtml;
import org.lodestep.report.MotorJson;
import org.lodestep.report.html.OutputFile;
import org.lodestep.rig.RigClient;
import org.lodestep.workflow.MotorCardSettings;
import org.lodestep.workflow.MotorFromFiles;
import org.lodestep.workflow.MotorOnRig;
import org.lodestep.workflow.Progress;

/**
 * Demo section: a salvaged 8-lead motor with taped lead numbers is identified from its resistance matrix, one step
 * response per coil, one series step response and a hand-turned back-EMF capture (files in
 * {@code sample-captures/motor/}); then a shuffled 8-lead motor on the virtual rig is measured end to end. Both run
 * the same workflows as {@code motor identify}.
 */
final class MotorDemo implements DemoCommand.Section {

    @Override
    public String title() {
        return "Motor identification: a salvaged 8-lead motor (HX-5718-08, leads taped 1 to 8)";
    }

    @Override
    public int run(Path captures, Path outDir, PrintWriter out, PrintWriter err) throws Exception {
        Path dir = captures.resolve("motor");
        Path resistance = dir.resolve("resistance.csv");
        Path backEmf = dir.resolve("back-emf.csv");
        List<Path> steps;
        try (var files = Files.list(dir)) {
            steps = files.filter(f -> f.getFileName().toString().startsWith("step-")).sorted().toList();
        }
        List<String> args = new ArrayList<>(List.of("motor", "identify", "--resistance", resistance.toString()));
        steps.forEach(p -> args.addAll(List.of("--step-response", p.toString())));
        args.addAll(List.of("--back-emf", backEmf.toString(), "--supply-v", "24", "--phase-current-a", "1.2",
                "--inertia-kgm2", "5.4e-6"));
        out.println("$ lodestep " + String.join(" ", args));
        MotorFromFiles.Result r = MotorFromFiles.run(new MotorFromFiles.Settings(resistance, steps, backEmf, null,
                null, null, null, new MotorCardSettings(null, 1.2, 24.0, 5.4e-6), true), Progress.NONE);
        MotorCard card = r.card();
        Files.createDirectories(outDir);
        Path html = outDir.resolve("motor-card.html");
        List<MotorHtml.Trace> traces = r.traces().stream()
                .map(t -> new MotorHtml.Trace(t.source(), t.timeS(), t.currentA())).toList();
        org.lodestep.workflow.Provenance provenance = RunProvenance.ofDemo(args.toArray(String[]::new))
                .withInput("resistance", resistance).withInputs("step response", steps).withInput("back-EMF", backEmf);
        ProvenanceBlock.html(MotorHtml.report(resistance.toString(), card, traces, r.emf(),
                MotorOptionHints.INSTANCE), provenance).write(html);
        printCard(out, card);
        out.print(ProvenanceBlock.text(provenance));
        out.println("report: " + html);
        Path json = outDir.resolve("motor-card.json");
        OutputFile.write(json, ProvenanceBlock.json(MotorJson.write(card, MotorOptionHints.INSTANCE), provenance)
                + System.lineSeparator());
        out.println("(the same card as JSON: " + json + ")");
        int code = card.hasError() ? ExitCode.FINDING : ExitCode.OK;

        // The same job on the virtual rig: a shuffled 8-lead motor with colour-coded leads, measured end to end.
        // Its simulated hand turns the shaft 3 revolutions (2.5 s at up to 90 rpm), as a technician would count them.
        out.println();
        out.println("$ lodestep motor identify --rig sim:salvage-8 --revolutions 3 --connection parallel "
                + "--supply-v 24");
        MotorIdentifyCommand.SAFETY.forEach(out::println);
        out.println();
        MotorCard onRig;
        try (RigClient c = RigCli.connect("sim:salvage-8")) {
            onRig = MotorOnRig.run(c, new MotorOnRig.Settings(3.0, new MotorCardSettings(Connection.PARALLEL, null,
                    24.0, null)), new MotorIdentifyCommand.RigLog(out)).card();
        }
        printCard(out, onRig);
        return Math.max(code, onRig.hasError() ? ExitCode.FINDING : ExitCode.OK);
    }

    private static void printCard(PrintWriter out, MotorCard card) {
        out.print(MotorCardText.render(card, MotorOptionHints.INSTANCE));
        out.println();
        MotorIdentifyCommand.SAFETY.forEach(out::println);
        out.flush();
    }
}
