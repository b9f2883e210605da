package org.lodestep.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import java.util.stream.Stream;

import org.lodestep.report.ProvenanceBlock;
import org.lodestep.capture.LeadPairReading;
import org.lodestep.capture.ResistanceCsvReader;
import org.lodestep.capture.ResistanceReadings;
import org.lodestep.report.LeadsHtml;
import org.lodestep.report.LeadsTextReport;
import org.lodestep.wiring.Identification;
import org.lodestep.wiring.LeadPair;
import org.lodestep.workflow.LeadsFromReadings;
import org.lodestep.workflow.LeadsProbe;
import org.lodestep.workflow.LeadsSettings;
import org.lodestep.workflow.Progress;

/**
 * The leads part of {@code lodestep demo}: the Kestrel Lane repair bench sorts stepper motors salvaged from retired
 * lab equipment; each bundled capture in {@code leads/} is identified, and one is re-measured with the guided probe.
 */
final class LeadsDemo implements DemoCommand.Section {

    @Override
    public String title() {
        return "Leads: sorting salvaged motors on the Kestrel Lane bench";
    }

    @Override
    public int run(Path captures, Path outDir, PrintWriter out, PrintWriter err) throws Exception {
        Path dir = captures.resolve("leads");
        List<Path> files;
        try (Stream<Path> s = Files.list(dir)) {
            files = s.filter(p -> p.getFileName().toString().matches(".*\\.(csv|tsv)")).sorted().toList();
        }
        if (files.isEmpty()) {
            throw new IOException(dir + ": no sample captures (*.csv, *.tsv) found");
        }
        out.println(LeadsIdentifyOptions.CAUTION);
        int faulty = 0;
        ResistanceReadings probeTarget = null;
        for (Path f : files) {
            LeadsFromReadings.Motor m = LeadsFromReadings.run(new LeadsFromReadings.Settings(List.of(f), List.of(),
                    LeadsSettings.DEFAULT), Progress.NONE).motors().get(0);
            Identification id = m.identification();
            faulty += id.hasError() ? 1 : 0;
            String title = (m.motor() != null ? m.motor() : f.getFileName().toString());
            LeadsTextReport.writeBrief(out, title, id);
            Path html = outDir.resolve("leads-" + f.getFileName().toString().replaceAll("\\.(csv|tsv)$", "") + ".html");
            ProvenanceBlock.html(LeadsHtml.report(m.motor() != null ? "Motor " + m.motor() : title, f.toString(), id),
                    RunProvenance.ofDemo("leads", "identify", f.toString(), "--report", html.toString())
                            .withInput("readings", f)).write(html);
            out.println("  report: " + html);
            if (probeTarget == null && id.leads().size() == 6 && !id.hasError() && id.determined()) {
                probeTarget = ResistanceCsvReader.read(f);
            }
        }
        out.printf(Locale.ROOT, "%d motors sorted, %d rejected with an error finding (exit code 3 from"
                + " `leads identify`, expected here).%n", files.size(), faulty);
        if (probeTarget != null) {
            guidedRerun(probeTarget, out);
        }
        return ExitCode.OK;
    }

    /** Replays a capture through the guided probe, answering each question from the file. */
    private static void guidedRerun(ResistanceReadings r, PrintWriter out) throws IOException {
        LeadsProbe.Result result = LeadsProbe.run(new LeadsProbe.Settings(r.leads(), LeadsSettings.DEFAULT), q -> {
            OptionalDouble v = OptionalDouble.empty();
            for (LeadPairReading p : r.readings()) {
                if (LeadPair.of(p.leadA(), p.leadB()).equals(q.pair()) && !p.open()) {
                    v = OptionalDouble.of(p.resistanceOhm());
                }
            }
            return new LeadsProbe.Answer.Reading(v);
        }, Progress.NONE);
        out.printf(Locale.ROOT, "Guided probe on %s (`leads probe --leads %d`): %s after %d readings of %d.%n",
                r.motor() != null ? r.motor() : r.source(), r.leads().size(), result.identification().topology()
                        .label(), result.readings(), result.allPairs());
    }
}
