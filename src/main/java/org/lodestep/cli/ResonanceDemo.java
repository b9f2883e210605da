package org.lodestep.cli;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * The resonance part of {@code lodestep demo}: Harrow &amp; Vane Motion Works commissions the Y belt axis of its HV-420
 * engraver frame. A ring-down gives the natural frequency, the prediction from the motor's data agrees with it and
 * infers the load inertia, an accelerometer sweep finds the bands, and a phone recording of a second sweep confirms
 * them; the avoid-list is written for the machine's controller (16 microsteps, 40 mm per revolution). Last, the same
 * sweep is recorded from the virtual rig's gantry axis and analysed.
 */
final class ResonanceDemo implements DemoCommand.Section {

    @Override
    public String title() {
        return "Resonance: commissioning the Harrow & Vane HV-420 Y belt axis";
    }

    @Override
    public int run(Path captures, Path outDir, PrintWriter out, PrintWriter err) throws Exception {
        Path dir = captures.resolve("resonance");
        Files.createDirectories(outDir);
        Path avoid = outDir.resolve("hv420-y-avoid-list.json");
        int worst = ExitCode.OK;
        out.println("1. Single full step, encoder on the axis: ring-down fit.");
        Path ringdownHtml = outDir.resolve("resonance-ringdown.html");
        worst = Math.max(worst, step(out, err, "resonance", "ringdown", dir.resolve("belt-axis-ringdown.csv")
                .toString(), "--report", ringdownHtml.toString()));
        out.println("report: " + ringdownHtml);
        out.println();
        out.println("2. The motor's data (0.45 N·m holding, rotor 5.4e-6 kg·m²) against the measured 116 Hz:"
                + " load inertia.");
        worst = Math.max(worst, step(out, err, "resonance", "predict", "--holding-torque-nm", "0.45",
                "--inertia-kgm2", "5.4e-6", "--measured-natural-hz", "116", "--microsteps", "16",
                "--travel-mm-per-rev", "40"));
        out.println();
        out.println("3. Accelerometer sweep at full step, 30 to 400 full steps/s, advice in the controller's units.");
        worst = Math.max(worst, step(out, err, "resonance", "sweep", dir.resolve("belt-axis-sweep.csv").toString(),
                "--microsteps", "16", "--travel-mm-per-rev", "40", "--natural-hz", "116", "--damping-ratio", "0.084",
                "--avoid-list", avoid.toString(), "--report", outDir.resolve("resonance-sweep.html").toString()));
        out.println("report: " + outDir.resolve("resonance-sweep.html"));
        out.println();
        out.println("4. A phone on the frame during a log sweep, 40 to 600 full steps/s over 24 s (no metadata in the"
                + " recording, so the law is given).");
        StringWriter phone = new StringWriter();
        PrintWriter pw = new PrintWriter(phone);
        int code = Main.run(pw, err, "resonance", "sweep", dir.resolve("belt-axis-phone.wav").toString(),
                "--sweep", "log", "--start", "40", "--end", "600", "--duration", "24", "--natural-hz", "116");
        pw.flush();
        // Only the band table: the advice and cautions were printed with the accelerometer sweep.
        boolean inBands = false;
        for (String line : phone.toString().split("\\R")) {
            if (line.startsWith("Bands") || line.startsWith("No band")) {
                inBands = true;
            } else if (line.isBlank() && inBands) {
                break;
            }
            if (inBands) {
                out.println(line);
            }
        }
        worst = Math.max(worst, code);
        out.println();
        out.println("5. The same procedure on the virtual rig's gantry axis (scenario gantry-axis, f_n = 100 Hz by its"
                + " model): record a sweep, then find its bands.");
        Path gantry = outDir.resolve("gantry-axis-sweep.csv");
        Files.deleteIfExists(gantry);
        Files.deleteIfExists(outDir.resolve("gantry-axis-sweep.json"));
        worst = Math.max(worst, step(out, err, "rig", "capture", "sim:gantry-axis", "sweep", "--from", "20", "--to",
                "400", "--seconds", "20", "--out", gantry.toString(), "--quiet"));
        StringWriter rig = new StringWriter();
        PrintWriter rw = new PrintWriter(rig);
        out.println("$ lodestep resonance sweep " + gantry);
        int lost = Main.run(rw, err, "resonance", "sweep", gantry.toString());
        rw.flush();
        printUntilRecommendations(rig.toString(), out);
        if (lost == ExitCode.FINDING) {
            // the gantry axis is lightly damped (ζ = 0.05): full stepping slips poles below f_n, as it should
            out.println("(exit code 3 from `resonance sweep`: the lightly damped gantry axis lost synchronism at full"
                    + " step, expected here.)");
        } else {
            worst = Math.max(worst, lost);
        }
        out.println();
        out.println("Avoid-list for the controller written to " + avoid);
        return worst;
    }

    /** The sweep's answer, header and band table; the cautions were printed once already, so they are left out. */
    private static void printUntilRecommendations(String text, PrintWriter out) {
        boolean safety = false;
        for (String line : text.split("\\R")) {
            safety = line.startsWith("Safety") || safety && !line.isBlank();
            if (!safety) {
                out.println(line);
            }
        }
    }

    private static int step(PrintWriter out, PrintWriter err, String... args) {
        out.println("$ lodestep " + String.join(" ", args));
        return Main.run(out, err, args);
    }
}
