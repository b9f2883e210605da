package org.lodestep.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.concurrent.Callable;

import org.lodestep.report.ProvenanceBlock;
import org.lodestep.workflow.Provenance;
import org.lodestep.qa.RecordStore;
import org.lodestep.report.Json;
import org.lodestep.report.html.OutputFile;
import org.lodestep.report.QaCsv;
import org.lodestep.workflow.Progress;
import org.lodestep.workflow.QaExport;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** {@code lodestep qa export}: recorded checks as CSV, one row per check result. */
@Command(name = "export",
        mixinStandardHelpOptions = true,
        description = {"Write recorded checks as CSV (one row per check result, SI units, every record's SHA-256).",
                "The file is written whole or not at all."},
        footerHeading = "%nExample:%n",
        footer = "  lodestep qa export --lot L-2607 --out L-2607.csv")
final class QaExportCommand implements Callable<Integer> {

    @Option(names = "--out", required = true, paramLabel = "FILE.csv", description = "CSV file to write.")
    Path outFile;

    @Mixin
    QaFilterOptions filter = new QaFilterOptions();

    @Mixin
    QaStoreOption store = new QaStoreOption();

    @Option(names = "--json", description = "Print what was written as JSON.")
    boolean json;

    @picocli.CommandLine.Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        QaExport.Result r;
        try (RecordStore rs = store.openExisting()) {
            r = QaExport.run(filter.query(), rs, Progress.NONE);
        }
        java.io.StringWriter csv = new java.io.StringWriter();
        QaCsv.write(r.records(), csv);
        OutputFile.write(outFile, csv.toString());
        int rows = r.rows();
        int records = r.records().size();
        PrintWriter out = spec.commandLine().getOut();
        if (json) {
            Map<String, Object> doc = new LinkedHashMap<>();
            doc.put("out", outFile.toString());
            doc.put("records", records);
            doc.put("rows", rows);
            out.println(ProvenanceBlock.json(Json.write(doc), store.provenance(RunProvenance.of(spec))));
        } else {
            out.println("wrote " + rows + " rows from " + records + " records to " + outFile);
        }
        out.flush();
        return ExitCode.OK;
    }

}
