package org.lodestep.cli;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import java.util.concurrent.Callable;

import org.lodestep.sample.InputFormatException;
import org.lodestep.capture.LeadPairArgument;
import org.lodestep.capture.LeadPairReading;
import org.lodestep.report.IdentifyProgressText;
import org.lodestep.report.LeadsJsonView;
import org.lodestep.report.LeadsTextReport;
import org.lodestep.report.ProvenanceBlock;
import org.lodestep.workflow.Provenance;
import org.lodestep.wiring.Identification;
import org.lodestep.workflow.LeadsProbe;
import org.lodestep.workflow.Progress;

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
        LeadsProbe.Settings settings = new LeadsProbe.Settings(leads(), options.settings());
        List<String> leads = settings.leads();
        PrintWriter out = spec.commandLine().getOut();
        // Prompts go to stderr in JSON mode so that standard output stays one JSON document.
        PrintWriter prompts = options.json ? spec.commandLine().getErr() : out;
        int all = settings.allPairs();
        prompts.printf(Locale.ROOT, "Probing %d leads (%s); up to %d pairs.%n%s%n", leads.size(), String.join(", ",
                leads), all, LeadsIdentifyOptions.CAUTION);
        boolean scripted = answers != null || System.console() == null;
        try (BufferedReader in = answers != null ? Files.newBufferedReader(answers, StandardCharsets.UTF_8)
                : new BufferedReader(new InputStreamReader(System.in, StandardCharsets.UTF_8))) {
            LeadsProbe.Result r = WorkflowCall.run(() -> LeadsProbe.run(settings, new Prompt(in, prompts, scripted),
                    Progress.NONE));
            Identification id = r.identification();
            Provenance provenance = RunProvenance.of(spec);
            if (answers != null) {
                provenance = provenance.withInput("answers", answers);
            }
            if (options.json) {
                out.println(ProvenanceBlock.json(LeadsJsonView.write(List.of(LeadsJsonView.of("probe", null, id,
                        new LeadsJsonView.ProbeJson(r.readings(), all)))), provenance));
            } else {
                out.println();
                out.println(IdentifyProgressText.probeDone(r.readings(), all, leads.size(), r.stopped() != null));
                LeadsTextReport.write(out, "Probed motor", id);
                out.print(ProvenanceBlock.text(provenance));
            }
            out.flush();
            return ExitCode.ofIdentification(id.hasError(), id.determined());
        }
    }

    /** Puts each question as a prompt line and reads the answer typed (or piped) in reply. */
    private record Prompt(BufferedReader in, PrintWriter prompts, boolean scripted) implements LeadsProbe.Meter {

        @Override
        public LeadsProbe.Answer ask(LeadsProbe.Question q) throws IOException {
            while (true) {
                prompts.printf(Locale.ROOT, "Reading %d: measure %s-%s (ohms, OL, undo, quit): ", q.number(),
                        q.first(), q.second());
                prompts.flush();
                String line = in.readLine();
                if (line == null) {
                    prompts.println();
                    prompts.println("Input ended before the answer was certain.");
                    return new LeadsProbe.Answer.Stop(LeadsProbe.StopReason.END_OF_ANSWERS);
                }
                if (scripted) {
                    prompts.println(line);
                }
                LeadsProbe.Answer a = parse(line.strip());
                if (a != null) {
                    return a;
                }
            }
        }

        @Override
        public void undone(boolean withdrew) {
            prompts.println(withdrew ? "  withdrew the last reading" : "  nothing to undo");
        }

        @Override
        public void refused(String reason) {
            prompts.println("  not recorded: " + reason);
        }

        /** The answer a line gives; null (after saying why) when it is none and the question is put again. */
        private LeadsProbe.Answer parse(String line) {
            String lower = line.toLowerCase(Locale.ROOT);
            if (lower.equals("quit") || lower.equals("q") || lower.equals("exit")) {
                return new LeadsProbe.Answer.Stop(LeadsProbe.StopReason.QUIT);
            }
            if (lower.equals("undo") || lower.equals("u")) {
                return new LeadsProbe.Answer.Undo();
            }
            if (line.indexOf('=') > 0) {
                try {
                    LeadPairReading r = LeadPairArgument.parse(line, "answer");
                    return new LeadsProbe.Answer.OtherPair(r.leadA(), r.leadB(),
                            r.open() ? OptionalDouble.empty() : OptionalDouble.of(r.resistanceOhm()));
                } catch (InputFormatException | IllegalArgumentException e) {
                    refused(e.getMessage());
                    return null;
                }
            }
            OptionalDouble v = LeadPairArgument.parseValue(line);
            if (v.isEmpty()) {
                prompts.println("  '" + line + "' is not a reading: expected ohms (e.g. 2.4), OL for open, undo or "
                        + "quit");
                return null;
            }
            return new LeadsProbe.Answer.Reading(v);
        }
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
