package org.lodestep.cli;

import java.io.Console;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;

import org.lodestep.report.Json;
import org.lodestep.report.RigText;
import org.lodestep.rig.InsulationReading;
import org.lodestep.rig.ResistanceReading;
import org.lodestep.rig.RigCapture;
import org.lodestep.rig.RigClient;

import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code lodestep rig measure ADDR KIND}: one kind of bench measurement through the rig. */
@Command(name = "measure", mixinStandardHelpOptions = true,
        description = {"Measure through a rig: four-wire lead-pair resistance, insulation resistance lead to frame "
                + "(arm and confirm), a coil current step response, or back-EMF while you turn the shaft by hand.",
                "KIND is resistance, insulation, step-response or back-emf."},
        footer = {"%nExamples:",
                "  lodestep rig measure sim:salvage-8 resistance                 (all 28 pairs)",
                "  lodestep rig measure sim:salvage-8 resistance --pair 1-2 --pair 3-4",
                "  lodestep rig measure sim:faulty-8 insulation --volts 500 --yes-i-have-read-the-caution",
                "  lodestep rig measure sim:bench-4 step-response --pair 1-2 --volts 2 --out step.csv",
                "  lodestep rig measure sim:bench-4 back-emf --pair 1-2 --pair 3-4 --seconds 2 --out emf.csv",
                "%nThe insulation test applies high voltage; it prints a caution and needs",
                "--yes-i-have-read-the-caution, or typing ARM at the prompt on a terminal."})
final class RigMeasureCommand implements Callable<Integer> {
    enum Kind { RESISTANCE, INSULATION, STEP_RESPONSE, BACK_EMF }

    @Parameters(index = "0", paramLabel = "ADDR", description = RigCli.ADDRESS_HELP)
    String address;

    @Parameters(index = "1", paramLabel = "KIND", description = "resistance, insulation, step-response or back-emf.")
    String kind;

    @Option(names = "--pair", paramLabel = "A-B", description = "Lead pair (relay positions from 1); repeat for "
            + "several. resistance: default all pairs; step-response: exactly one; back-emf: one channel per pair "
            + "(default 1-2).")
    List<String> pairTexts = new ArrayList<>();

    @Option(names = "--lead", paramLabel = "N", description = "insulation: lead to test against the frame; repeat for "
            + "several (default: every lead).")
    List<Integer> leads = new ArrayList<>();

    @Option(names = "--volts", paramLabel = "V", description = "insulation: DC test voltage, 100, 250 or 500 V "
            + "(default 500); step-response: drive voltage in V (default 2).")
    Double volts;

    @Option(names = "--seconds", paramLabel = "S", description = "insulation: dwell before the reading, s (default "
            + "60); back-emf: record length, s (default 2).")
    Double seconds;

    @Option(names = "--ms", paramLabel = "MS", defaultValue = "20",
            description = "step-response: record length, ms (default ${DEFAULT-VALUE}).")
    double ms;

    @Option(names = "--rate", paramLabel = "HZ", description = "Sample rate, Hz (step-response default 50000, "
            + "back-emf default 20000).")
    Double rateHz;

    @Option(names = "--out", paramLabel = "FILE.csv", description = "step-response and back-emf: save the capture "
            + "(canonical CSV plus a .json sidecar), written whole or not at all.")
    Path out;

    @Option(names = "--yes-i-have-read-the-caution", description = "Confirm the insulation test's caution without a "
            + "prompt (for scripts).")
    boolean confirmed;

    @Option(names = "--quiet", description = "No progress bar.")
    boolean quiet;

    @Option(names = "--json", description = "Print JSON instead of text.")
    boolean json;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        Kind k;
        try {
            k = Kind.valueOf(kind.replace('-', '_').toUpperCase(Locale.ROOT));
        } catch (IllegalArgumentException e) {
            throw new UsageException("KIND '" + kind + "' is not resistance, insulation, step-response or back-emf");
        }
        PrintWriter o = spec.commandLine().getOut();
        List<int[]> pairs = RigCli.pairs(pairTexts, "--pair");
        if (out != null) {
            if (k != Kind.STEP_RESPONSE && k != Kind.BACK_EMF) {
                throw new UsageException("--out saves step-response and back-emf captures only");
            }
            RigCaptureFiles.checkTarget(out);
        }
        // cautions go to stderr with --json, so standard output stays one JSON document
        PrintWriter caution = json ? spec.commandLine().getErr() : o;
        if (k == Kind.INSULATION) {
            int v = volts == null ? 500 : (int) Math.round(volts);
            caution.printf(RigCautions.INSULATION + "%n", v);
            caution.flush();
            if (!confirmed && !confirmAtConsole(v)) {
                throw new UsageException("insulation test not confirmed: read the caution, then add "
                        + "--yes-i-have-read-the-caution (or type ARM at the prompt)");
            }
        } else if (k == Kind.STEP_RESPONSE) {
            caution.printf(RigCautions.ENERGISED + "%n", volts == null ? 2.0 : volts);
        } else if (k == Kind.BACK_EMF) {
            caution.println(RigCautions.HAND_TURN);
        }
        try (RigClient c = RigCli.connect(address)) {
            List<String> labels = c.info().labels();
            switch (k) {
                case RESISTANCE -> {
                    List<int[]> todo = pairs;
                    if (todo.isEmpty()) {
                        todo = new ArrayList<>();
                        for (int a = 1; a <= c.info().leads(); a++) {
                            for (int b = a + 1; b <= c.info().leads(); b++) {
                                todo.add(new int[] {a, b});
                            }
                        }
                    }
                    List<ResistanceReading> rs = new ArrayList<>();
                    for (int[] p : todo) {
                        rs.add(c.resistance(p[0], p[1]));
                    }
                    o.print(json ? Json.write(rs) + "\n" : RigText.resistances(rs, labels));
                }
                case INSULATION -> {
                    int v = volts == null ? 500 : (int) Math.round(volts);
                    List<Integer> which = leads;
                    if (which.isEmpty()) {
                        which = new ArrayList<>();
                        for (int a = 1; a <= c.info().leads(); a++) {
                            which.add(a);
                        }
                    }
                    List<InsulationReading> rs = new ArrayList<>();
                    for (int lead : which) {
                        rs.add(c.insulation(lead, v, seconds == null ? 60 : seconds));
                    }
                    o.print(json ? Json.write(rs) + "\n" : RigText.insulation(rs, labels));
                }
                case STEP_RESPONSE -> {
                    if (pairs.size() != 1) {
                        throw new UsageException("step-response needs exactly one --pair A-B");
                    }
                    RigCapture cap;
                    try (RigCli.Bar bar = new RigCli.Bar("step", spec.commandLine().getErr(), quiet)) {
                        cap = c.stepResponse(pairs.get(0)[0], pairs.get(0)[1], volts == null ? 2.0 : volts, ms,
                                rateHz == null ? 50_000 : rateHz, bar);
                    }
                    report(o, cap, null);
                }
                case BACK_EMF -> {
                    List<int[]> ps = pairs.isEmpty() ? List.of(new int[] {1, 2}) : pairs;
                    RigCapture cap;
                    try (RigCli.Bar bar = new RigCli.Bar("back-emf", spec.commandLine().getErr(), quiet)) {
                        cap = c.backEmf(ps, seconds == null ? 2.0 : seconds, rateHz == null ? 20_000 : rateHz, bar);
                    }
                    report(o, cap, null);
                }
                default -> throw new IllegalStateException(k.toString());
            }
        }
        o.flush();
        return ExitCode.OK;
    }

    private void report(PrintWriter o, RigCapture cap, org.lodestep.rig.SweepPlan plan) throws Exception {
        if (json) {
            o.println(Json.write(cap.metadata()));
        } else {
            o.print(RigText.capture(cap));
        }
        if (out != null) {
            Path saved = RigCaptureFiles.save(cap, out, plan);
            (json ? spec.commandLine().getErr() : o).println("saved " + saved);
        }
    }

    private boolean confirmAtConsole(int v) {
        Console console = System.console();
        if (console == null) {
            return false;
        }
        String answer = console.readLine("Type ARM to apply %d V, anything else to cancel: ", v);
        return answer != null && answer.trim().equals("ARM");
    }
}
