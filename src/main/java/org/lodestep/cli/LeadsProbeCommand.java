package org.lodestep.cli;

import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.concurrent.Callable;

import org.lodestep.sample.InputFormatException;
import org.lodestep.capture.LeadPairArgument;
import org.lodestep.capture.LeadPairReading;
import org.lodestep.report.LeadsJsonView;
import org.lodestep.report.LeadsTextReport;
import org.lodestep.wiring.Identification;
import org.lodestep.wiring.LeadPair;
import org.lodestep.wiring.ProbeSession;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** {@code lodestep leads probe}: asks for one lead pair at a time until the answer is certain. */
@Command(name = "probe",
        mixinStandardHelpOptions = true,
        description = {"Guided measurement: asks for one lead pair at a time, in an order that settles the layout "
                + "with few readings, and stops as soon as the answer is certain.",
            "Answer each prompt with the meter reading in ohms (e.g. 2.4, 2,4, 850m, 1.2k), OL for open circuit, "
                + "'undo' to withdraw the last reading, 'A-B=VALUE' to enter another pair, or 'quit'. "
                + "Works with answers piped on standard input or from --answers."},
        footerHeading = "%nExamples:%n",
        footer = {"  lodestep leads probe --leads 6 --labels red,blue,black,green,white,yellow",
            "  printf '2.4\\nOL\\n...' | lodestep leads probe --leads 4",
            "Exit code 3 when the motor has an error-severity finding."})
final class LeadsProbeCommand implements Callable<Integer> {

    @Option(names = "--leads", paramLabel = "N", description = "Number of leads (2 to 64); labels 1..N unless "
            + "--labels is given.")
    Integer leadCount;

    @Option(names = "--labels", paramLabel = "LABEL", split = ",",
            description = "Lead labels (wire colours or terminal numbers), comma separated.")
    List<String> labels;

    @Option(names = "--answers", paramLabel = "FILE",
            description = "Read the answers from FILE instead of standard input (one per line).")
    Path answers;

    @Mixin
    LeadsIdentifyOptions options;

    @picocli.CommandLine.Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        List<String> leads = leads();
        ProbeSession session = new ProbeSession(leads, options.settings(OptionalDouble.empty()));
        PrintWriter out = spec.commandLine().getOut();
        // Prompts go to stderr in JSON mode so that standard output stays one JSON document.
        PrintWriter prompts = options.json ? spec.commandLine().getErr() : out;
        int all = leads.size() * (leads.size() - 1) / 2;
        prompts.printf(Locale.ROOT, "Probing %d leads (%s); up to %d pairs.%n%s%n", leads.size(), String.join(", ",
                leads), all, LeadsTextReport.CAUTION);
        boolean scripted = answers != null || System.console() == null;
        try (BufferedReader in = answers != null ? Files.newBufferedReader(answers, StandardCharsets.UTF_8)
                : new BufferedReader(new InputStreamReader(System.in, StandardCharsets.UTF_8))) {
            boolean ended = false;
            while (!session.determined()) {
                Optional<LeadPair> next = session.nextPair();
                if (next.isEmpty()) {
                    break;
                }
                LeadPair p = next.get();
                // In the user's label order (red-blue as listed), not the pair's canonical order.
                String shown = leads.indexOf(p.a()) < leads.indexOf(p.b()) ? p.a() + "-" + p.b() : p.b() + "-" + p.a();
                prompts.printf(Locale.ROOT, "Reading %d: measure %s (ohms, OL, undo, quit): ",
                        session.readingCount() + 1, shown);
                prompts.flush();
                String line = in.readLine();
                if (line == null) {
                    prompts.println();
                    prompts.println("Input ended before the answer was certain.");
                    ended = true;
                    break;
                }
                if (scripted) {
                    prompts.println(line);
                }
                if (!answer(session, p, line.strip(), prompts)) {
                    ended = true;
                    break;
                }
            }
            Identification id = session.result();
            int taken = session.readingCount();
            if (options.json) {
                out.println(LeadsJsonView.write(List.of(LeadsJsonView.of("probe", null, id,
                        new LeadsJsonView.ProbeJson(taken, all)))));
            } else {
                out.println();
                out.printf(Locale.ROOT, "Took %d readings of %d (N(N-1)/2 for %d leads)%s.%n", taken, all,
                        leads.size(), ended ? ", stopped early" : "");
                LeadsTextReport.write(out, "Probed motor", id);
            }
            out.flush();
            return id.hasError() ? ExitCode.FINDING : ExitCode.OK;
        }
    }

    /** Handles one answer; false when the user quits. */
    private static boolean answer(ProbeSession session, LeadPair asked, String line, PrintWriter prompts) {
        String lower = line.toLowerCase(Locale.ROOT);
        if (lower.equals("quit") || lower.equals("q") || lower.equals("exit")) {
            return false;
        }
        if (lower.equals("undo") || lower.equals("u")) {
            prompts.println(session.undo() ? "  withdrew the last reading" : "  nothing to undo");
            return true;
        }
        if (line.indexOf('=') > 0) {
            try {
                LeadPairReading r = LeadPairArgument.parse(line, "answer");
                session.record(LeadPair.of(r.leadA(), r.leadB()),
                        r.open() ? OptionalDouble.empty() : OptionalDouble.of(r.resistanceOhm()));
            } catch (InputFormatException | IllegalArgumentException e) {
                prompts.println("  not recorded: " + e.getMessage());
            }
            return true;
        }
        OptionalDouble v = LeadPairArgument.parseValue(line);
        if (v.isEmpty()) {
            prompts.println("  '" + line + "' is not a reading: expected ohms (e.g. 2.4), OL for open, undo or quit");
            return true;
        }
        double ohms = v.getAsDouble();
        session.record(asked, Double.isInfinite(ohms) ? OptionalDouble.empty() : OptionalDouble.of(ohms));
        return true;
    }

    private List<String> leads() {
        if (labels != null && !labels.isEmpty()) {
            List<String> l = labels.stream().map(String::strip).toList();
            if (leadCount != null && leadCount != l.size()) {
                throw new UsageException("--leads " + leadCount + " but --labels gives " + l.size() + " labels");
            }
            if (l.stream().anyMatch(String::isEmpty) || l.stream().distinct().count() != l.size()) {
                throw new UsageException("--labels " + String.join(",", l) + ": expected distinct, non-empty labels");
            }
            return l;
        }
        if (leadCount == null) {
            throw new UsageException("give --leads N or --labels A,B,...");
        }
        if (leadCount < 2 || leadCount > 64) {
            throw new UsageException("--leads " + leadCount + ": expected 2 to 64");
        }
        List<String> l = new ArrayList<>();
        for (int i = 1; i <= leadCount; i++) {
            l.add(Integer.toString(i));
        }
        return l;
    }
}
