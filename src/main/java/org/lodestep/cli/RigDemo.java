package org.lodestep.cli;

import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * The demo's bench-rig part: the Kestrel Lane workshop's virtual rig queries a salvaged motor, measures its leads,
 * identifies its leads, checks a returned motor's insulation and records a gantry sweep. Registered in {@link DemoCommand}'s sections.
 */
final class RigDemo implements DemoCommand.Section {

    @Override
    public String title() {
        return "Bench rig (the virtual rig, no hardware needed)";
    }

    @Override
    public int run(Path captures, Path outDir, PrintWriter out, PrintWriter err) throws Exception {
        Path dir = outDir.resolve("rig");
        Files.createDirectories(dir);
        Path sweep = dir.resolve("gantry-sweep.csv");
        // the demo's own output from an earlier run: a capture is never overwritten, so clear it first
        Files.deleteIfExists(sweep);
        Files.deleteIfExists(dir.resolve("gantry-sweep.json"));
        List<String[]> steps = new ArrayList<>();
        steps.add(new String[] {"A salvaged plotter motor with 8 unlabelled leads is clipped to the rig.",
            "rig", "info", "sim:salvage-8"});
        steps.add(new String[] {"Four-wire resistance of all 28 lead pairs through the relay matrix.",
            "rig", "measure", "sim:salvage-8", "resistance"});
        steps.add(new String[] {"The same motor identified by the rig alone: it measures only the pairs the "
                + "identification asks for.", "leads", "identify", "--rig", "sim:salvage-8"});
        steps.add(new String[] {"A returned motor's insulation, lead 1 to frame, at 500 V (confirmed for the demo).",
            "rig", "measure", "sim:faulty-8", "insulation", "--lead", "1", "--volts", "500",
            "--yes-i-have-read-the-caution"});
        steps.add(new String[] {"The engraver's gantry axis, swept from 40 to 200 full steps/s while recording.",
            "rig", "capture", "sim:gantry-axis", "sweep", "--from", "40", "--to", "200", "--seconds", "8",
            "--quiet", "--out", sweep.toString()});
        int worst = ExitCode.OK;
        for (String[] s : steps) {
            out.println();
            out.println(s[0]);
            String[] args = java.util.Arrays.copyOfRange(s, 1, s.length);
            out.println("$ lodestep " + String.join(" ", args));
            out.flush();
            int code = Main.run(out, err, args);
            worst = Math.max(worst, code);
        }
        return worst;
    }
}
