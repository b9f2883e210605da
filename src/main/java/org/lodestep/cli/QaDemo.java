package org.lodestep.cli;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.lodestep.report.ProvenanceBlock;
import org.lodestep.qa.PartSpec;
import org.lodestep.qa.PartSpecReader;
import org.lodestep.qa.RecordQuery;
import org.lodestep.qa.RecordStore;
import org.lodestep.qa.RecordStores;
import org.lodestep.qa.LotTally;
import org.lodestep.qa.Tally;
import org.lodestep.qa.Verdict;
import org.lodestep.report.html.OutputFile;
import org.lodestep.report.QaCsv;
import org.lodestep.report.QaHtml;
import org.lodestep.report.QaText;
import org.lodestep.safety.Cautions;
import org.lodestep.workflow.Progress;
import org.lodestep.workflow.QaCertificate;
import org.lodestep.workflow.QaCheck;
import org.lodestep.workflow.QaExport;
import org.lodestep.workflow.QaLotReport;
import org.lodestep.workflow.QaReadingSources;
import org.lodestep.workflow.QaReadingSources.TypedInsulation;

/**
 * Demo section: the incoming-QA desk of an invented instrument works checks a delivered lot of twelve motors of an
 * invented part, re-tests the one that failed insulation after drying it, and prints the lot report and a certificate.
 * It calls the QA workflows directly, as any front end does, and renders through {@code report}.
 */
final class QaDemo implements DemoCommand.Section {

    static final String LOT = "L-2607";
    private static final String OPERATOR = "R. Okafor";
    private static final String STATION = "harrow-fen-2";

    @Override
    public String title() {
        return "Incoming QA: lot " + LOT + " of KV-4218-M motors";
    }

    @Override
    public int run(Path captures, Path outDir, PrintWriter out, PrintWriter err) throws Exception {
        Path qa = captures.resolve("qa");
        Path dir = outDir.resolve("qa");
        Files.createDirectories(dir);
        Path db = dir.resolve("demo-qa.sqlite");
        for (String suffix : List.of("", "-wal", "-shm")) {
            Files.deleteIfExists(Path.of(db + suffix)); // the same story on every run
        }
        PartSpec spec = PartSpecReader.read(qa.resolve("kv-4218-m.toml"));
        out.println("Harrow Fen instrument works (invented) receives lot " + LOT + ": twelve KV-4218-M steppers from"
                + " Kestrel Vale Motion (invented). The inspector scans each serial number; resistance comes from the"
                + " lead-pair CSVs, insulation and inductance from the bench meter log.");
        if (Double.isFinite(spec.insulationTestVoltageV())) {
            out.println(Cautions.insulationTestLine(spec.insulationTestVoltageV()));
        }
        int worst = ExitCode.OK;
        try (RecordStore store = RecordStores.open(db.toString(), Map.of())) {
            worst = expect(worst, lot(spec, qa, dir, store, out), ExitCode.FINDING);

            out.println();
            out.println("KV24-00124 read 62 M\u03A9 phase B to frame. After a night in the drying cabinet it is re-tested:");
            QaReadingSources retest = new QaReadingSources(qa.resolve("KV24-00124.csv"), null, null,
                    List.of(2.79, 2.81), List.of(new TypedInsulation("a-frame", 1320, Double.NaN),
                    new TypedInsulation("b-frame", 1150, Double.NaN), new TypedInsulation("a-b", 1710, Double.NaN)),
                    null, 1.8, null, null, null, null, null, null, null, null, null, null);
            RecordStore.Appended a = new QaCheck(settings(spec, retest, 21), store).check("KV24-00124", Progress.NONE);
            worst = expect(worst, a.record().submission().verdict() == Verdict.PASS ? ExitCode.OK : ExitCode.FINDING,
                    ExitCode.OK);
            out.print(QaText.check(a.record(), a.created(), store.location()));

            out.println();
            out.println("$ lodestep qa report --lot " + LOT);
            RecordQuery lot = new RecordQuery(null, LOT, null, null, null);
            QaLotReport.Result report = QaLotReport.run(lot, store, Progress.NONE);
            String title = "QA report, lot " + LOT;
            ProvenanceBlock.html(QaHtml.lot(title, report.summary()), RunProvenance.ofDemo("qa", "report", "--lot",
                    LOT, "--db", db.toString()).withInput("record store", db))
                    .write(dir.resolve("qa-report-" + LOT + ".html"));
            out.print(QaText.lotReport(title, report.summary()));
            out.println("reports: " + dir.resolve("qa-check-" + LOT + ".html") + ", " + dir.resolve("qa-report-" + LOT
                    + ".html"));

            out.println();
            out.println("$ lodestep qa certificate --serial KV24-00124");
            QaCertificate.Result cert = QaCertificate.run("KV24-00124", null, store, Progress.NONE);
            worst = expect(worst, cert.certifies() ? ExitCode.OK : ExitCode.FINDING, ExitCode.OK);
            out.print(QaText.certificate(cert.history()));

            Path csv = dir.resolve("lot-" + LOT + ".csv");
            QaExport.Result export = QaExport.run(lot, store, Progress.NONE);
            StringWriter text = new StringWriter();
            QaCsv.write(export.records(), text);
            OutputFile.write(csv, text.toString());
            out.println();
            out.println("wrote " + export.rows() + " rows from " + export.records().size() + " records to " + csv);
        }
        out.println("records: " + db);
        out.flush();
        return worst;
    }

    /** The lot as the scanner types it: one check per serial, compact lines for motors that passed. */
    private static int lot(PartSpec spec, Path qa, Path dir, RecordStore store, PrintWriter out) throws Exception {
        QaReadingSources sources = new QaReadingSources(null, qa.resolve("{serial}.csv").toString(), null, null, null,
                null, null, null, qa.resolve("lot-L2607-meter-log.csv"), null, null, null, null, null, null, null, null);
        QaCheck check = new QaCheck(settings(spec, sources, 22), store);
        out.println();
        out.println("$ lodestep qa check --spec kv-4218-m.toml --lot " + LOT + " ... < lot-L2607-serials.txt");
        List<RecordStore.Appended> results = new ArrayList<>();
        LotTally lotTally = new LotTally();
        Tally tally = Tally.NONE;
        for (String line : Files.readAllLines(qa.resolve("lot-L2607-serials.txt"))) {
            String sn = line.strip();
            if (sn.isEmpty() || sn.startsWith("#")) {
                continue;
            }
            RecordStore.Appended a = check.check(sn, Progress.NONE);
            results.add(a);
            tally = lotTally.add(sn, a.record().submission().verdict());
            if (a.record().submission().verdict() == Verdict.PASS) {
                // Compact: the framed serial line and the tally; the full verdict only for motors that did not pass.
                QaText.check(a.record(), a.created(), store.location()).lines().filter(l -> l.startsWith("=   serial"))
                        .map(l -> "PASS  " + l.substring(1, l.length() - 1).strip()).forEach(out::println);
                out.println(QaText.tally(tally));
            } else {
                out.print(QaText.check(a.record(), a.created(), store.location()));
                out.println(QaText.tally(tally));
                out.println();
            }
        }
        ProvenanceBlock.html(QaHtml.check("lot " + LOT, results.stream().map(RecordStore.Appended::record).toList(),
                spec.insulationTestVoltageV(), Map.of()), RunProvenance.ofDemo("qa", "check", "--spec",
                qa.resolve("kv-4218-m.toml").toString(), "--lot", LOT, "--resistance-pattern",
                qa.resolve("{serial}.csv").toString(), "--meter-log", qa.resolve("lot-L2607-meter-log.csv").toString(),
                "--serials", qa.resolve("lot-L2607-serials.txt").toString())
                .withInput("spec", qa.resolve("kv-4218-m.toml"))
                .withInput("meter log", qa.resolve("lot-L2607-meter-log.csv"))
                .withInput("serials", qa.resolve("lot-L2607-serials.txt")))
                .write(dir.resolve("qa-check-" + LOT + ".html"));
        out.println("lot " + LOT + " done: " + QaText.tally(tally));
        return tally.allPassed() ? ExitCode.OK : ExitCode.FINDING;
    }

    private static QaCheck.Settings settings(PartSpec spec, QaReadingSources sources, double ambientC) {
        return new QaCheck.Settings(spec, LOT, sources, ambientC, OPERATOR, STATION, VersionProvider.version(),
                QaCheck.InsulationConfirmation.REFUSE);
    }

    private static int expect(int worst, int code, int expected) {
        return code == expected ? worst : Math.max(worst, code == ExitCode.OK ? ExitCode.INTERNAL : code);
    }
}
