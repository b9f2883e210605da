package org.lodestep.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * Demo section: the incoming-QA desk of an invented instrument works checks a delivered lot of twelve motors of an
 * invented part, re-tests the one that failed insulation after drying it, and prints the lot report and a certificate.
 */
final class QaDemo implements DemoCommand.Section {

    static final String LOT = "L-2607";

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
        String spec = qa.resolve("kv-4218-m.toml").toString();
        out.println("Harrow Fen instrument works (invented) receives lot " + LOT + ": twelve KV-4218-M steppers from"
                + " Kestrel Vale Motion (invented). The inspector scans each serial number; resistance comes from the"
                + " lead-pair CSVs, insulation and inductance from the bench meter log.");
        out.println("Safety: the insulation tester applies 500 V DC. Motor disconnected from any driver, hands off the"
                + " leads while it runs, windings discharged afterwards; local rules take precedence.");
        int worst = ExitCode.OK;

        Result lot = run(err, "qa", "check", "--spec", spec, "--lot", LOT,
                "--serials", qa.resolve("lot-L2607-serials.txt").toString(),
                "--resistance-pattern", qa.resolve("{serial}.csv").toString(),
                "--meter-log", qa.resolve("lot-L2607-meter-log.csv").toString(),
                "--ambient-c", "22", "--operator", "R. Okafor", "--station", "harrow-fen-2", "--db", db.toString(),
                "--report", dir.resolve("qa-check-" + LOT + ".html").toString());
        worst = expect(worst, lot.code, ExitCode.FINDING);
        out.println();
        out.println("$ lodestep qa check --spec kv-4218-m.toml --lot " + LOT + " ... < lot-L2607-serials.txt");
        for (String block : lot.text.split("\\R\\R")) {
            // Compact: every motor's one-line tally, and the full verdict only for motors that did not pass.
            List<String> lines = block.lines().toList();
            boolean passed = lines.stream().anyMatch(l -> l.startsWith("===="));
            if (!passed && lines.size() > 3) {
                lines.forEach(out::println);
                out.println();
            } else {
                lines.stream().filter(l -> l.startsWith("tally") || l.startsWith("lot ") || l.startsWith("=   serial"))
                        .map(l -> l.startsWith("=") ? "PASS  " + l.substring(1, l.length() - 1).strip() : l)
                        .forEach(out::println);
            }
        }

        out.println();
        out.println("KV24-00124 read 62 Mohm phase B to frame. After a night in the drying cabinet it is re-tested:");
        Result retest = run(err, "qa", "check", "--spec", spec, "--serial", "KV24-00124", "--lot", LOT,
                "--resistance", qa.resolve("KV24-00124.csv").toString(),
                "--insulation", "a-frame=1320", "--insulation", "b-frame=1150", "--insulation", "a-b=1710",
                "--inductance-mh", "2.79,2.81", "--step-angle-deg", "1.8", "--ambient-c", "21",
                "--operator", "R. Okafor", "--station", "harrow-fen-2", "--db", db.toString());
        worst = expect(worst, retest.code, ExitCode.OK);
        out.print(retest.text);

        out.println();
        out.println("$ lodestep qa report --lot " + LOT);
        Result report = run(err, "qa", "report", "--lot", LOT, "--db", db.toString(),
                "--report", dir.resolve("qa-report-" + LOT + ".html").toString());
        worst = expect(worst, report.code, ExitCode.OK);
        out.print(report.text);
        out.println("reports: " + dir.resolve("qa-check-" + LOT + ".html") + ", " + dir.resolve("qa-report-" + LOT
                + ".html"));

        out.println();
        out.println("$ lodestep qa certificate --serial KV24-00124");
        Result cert = run(err, "qa", "certificate", "--serial", "KV24-00124", "--db", db.toString());
        worst = expect(worst, cert.code, ExitCode.OK);
        out.print(cert.text);

        Path csv = dir.resolve("lot-" + LOT + ".csv");
        Result export = run(err, "qa", "export", "--lot", LOT, "--out", csv.toString(), "--db", db.toString());
        worst = expect(worst, export.code, ExitCode.OK);
        out.println();
        out.print(export.text);
        out.println("records: " + db);
        out.flush();
        return worst;
    }

    private record Result(int code, String text) {
    }

    private static Result run(PrintWriter err, String... args) throws IOException {
        StringWriter text = new StringWriter();
        List<String> a = new ArrayList<>(List.of(args));
        int code = Main.run(new PrintWriter(text, true), err, a.toArray(String[]::new));
        return new Result(code, text.toString());
    }

    private static int expect(int worst, int code, int expected) {
        return code == expected ? worst : Math.max(worst, code == ExitCode.OK ? ExitCode.INTERNAL : code);
    }
}
