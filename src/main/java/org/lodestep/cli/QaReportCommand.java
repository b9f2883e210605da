package org.lodestep.cli;

import java.io.PrintWriter;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.concurrent.Callable;

import org.lodestep.report.ProvenanceBlock;
import org.lodestep.workflow.Provenance;
import org.lodestep.qa.RecordStore;
import org.lodestep.report.Json;
import org.lodestep.report.QaHtml;
import org.lodestep.report.QaText;
import org.lodestep.workflow.Progress;
import org.lodestep.workflow.QaLotReport;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** {@code lodestep qa report}: counts, yield and capability of a lot, a part or a date range. */
@Command(name = "report",
        mixinStandardHelpOptions = true,
        description = {"Summarise recorded checks: counts, first-pass and final yield, and for each parameter mean, "
                + "standard deviation, min, max, Cp/Cpk and Pp/Ppk against the spec limits, individuals and "
                + "moving-range control limits with the points outside them, and a text histogram.",
                "Each motor counts once, by its latest record; re-tests are counted separately."},
        footerHeading = "%nExamples:%n",
        footer = {"  lodestep qa report --lot L-2607", "  lodestep qa report --part KV-4218-M --from 2026-06-01 --json"})
final class QaReportCommand implements Callable<Integer> {

    @Mixin
    QaFilterOptions filter = new QaFilterOptions();

    @Mixin
    QaStoreOption store = new QaStoreOption();

    @Option(names = "--report", paramLabel = "FILE.html",
            description = "Also write a self-contained HTML report: yield, and per parameter the statistics, a histogram"
                    + " against the spec limits and the individuals and moving-range charts.")
    java.nio.file.Path report;

    @Option(names = "--json", description = "Print the summary as JSON.")
    boolean json;

    @picocli.CommandLine.Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        QaLotReport.Result r;
        try (RecordStore rs = store.openExisting()) {
            r = QaLotReport.run(filter.query(), rs, Progress.NONE);
        }
        Provenance provenance = store.provenance(RunProvenance.of(spec));
        if (report != null) {
            ProvenanceBlock.html(QaHtml.lot(filter.title(), r.summary()), provenance).write(report);
        }
        if (json) {
            Map<String, Object> doc = new LinkedHashMap<>();
            doc.put("lot", filter.lot);
            doc.put("part", filter.part);
            doc.put("from", filter.from);
            doc.put("to", filter.to);
            doc.put("summary", r.summary());
            out.println(ProvenanceBlock.json(Json.write(doc), provenance));
        } else {
            out.print(QaText.lotReport(filter.title(), r.summary()));
            out.print(ProvenanceBlock.text(provenance));
        }
        out.flush();
        return ExitCode.OK;
    }
}
