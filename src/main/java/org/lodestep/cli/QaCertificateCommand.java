package org.lodestep.cli;

import java.io.PrintWriter;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.concurrent.Callable;

import org.lodestep.report.ProvenanceBlock;
import org.lodestep.workflow.Provenance;
import org.lodestep.qa.RecordStore;
import org.lodestep.qa.StoredRecord;
import org.lodestep.report.Json;
import org.lodestep.report.html.OutputFile;
import org.lodestep.report.QaText;
import org.lodestep.workflow.Progress;
import org.lodestep.workflow.QaCertificate;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** {@code lodestep qa certificate}: the test certificate of one motor from its records. */
@Command(name = "certificate",
        mixinStandardHelpOptions = true,
        description = {"Print the test certificate of one motor: its latest record in full (spec version and hash, "
                + "values, limits, verdicts, operator, station, times, capture hashes, record hash verified) and its "
                + "earlier records.",
                "Exit code 0 when the latest record passed and is intact, 3 otherwise."},
        footerHeading = "%nExample:%n",
        footer = {"  lodestep qa certificate --serial KV24-00117",
                "  lodestep qa certificate --serial KV24-00117 --out certificates/KV24-00117.txt"})
final class QaCertificateCommand implements Callable<Integer> {

    @Option(names = "--serial", required = true, paramLabel = "SN", description = "Serial number of the motor.")
    String serial;

    @Option(names = "--part", paramLabel = "PART",
            description = "Part number, when the same serial number exists for several parts.")
    String part;

    @Option(names = "--out", paramLabel = "FILE",
            description = "Write the certificate to this file (whole or not at all) instead of printing it.")
    java.nio.file.Path outFile;

    @Mixin
    QaStoreOption store = new QaStoreOption();

    @Option(names = "--json", description = "Print the latest record and the history as JSON.")
    boolean json;

    @picocli.CommandLine.Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        QaCertificate.Result c;
        try (RecordStore rs = store.openExisting()) {
            c = QaCertificate.run(serial, part, rs, Progress.NONE);
        }
        StoredRecord latest = c.latest();
        PrintWriter out = spec.commandLine().getOut();
        String text;
        if (json) {
            Map<String, Object> doc = new LinkedHashMap<>();
            doc.put("serial", serial);
            doc.put("latest", latest);
            doc.put("history", c.earlier());
            text = ProvenanceBlock.json(Json.write(doc), store.provenance(RunProvenance.of(spec)))
                    + System.lineSeparator();
        } else {
            text = QaText.certificate(c.history()) + ProvenanceBlock.text(store.provenance(RunProvenance.of(spec)));
        }
        if (outFile != null) {
            OutputFile.write(outFile, text);
            out.println("wrote the certificate of " + serial.replaceAll("\\p{Cntrl}", "?") + " (record #" + latest.id()
                    + ", " + latest.submission().verdict() + ") to " + outFile);
        } else {
            out.print(text);
        }
        out.flush();
        return c.certifies() ? ExitCode.OK : ExitCode.FINDING;
    }
}
