package org.lodestep.cli;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.io.PrintWriter;
import java.net.InetAddress;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;

import org.lodestep.report.ProvenanceBlock;
import org.lodestep.safety.Cautions;
import org.lodestep.workflow.Provenance;
import org.lodestep.sample.InputFormatException;
import org.lodestep.sample.InputLimits;
import org.lodestep.sample.Utf8Text;
import org.lodestep.qa.Parameters;
import org.lodestep.qa.PartSpec;
import org.lodestep.qa.PartSpecReader;
import org.lodestep.qa.RecordStore;
import org.lodestep.qa.StoreException;
import org.lodestep.qa.LotTally;
import org.lodestep.qa.Tally;
import org.lodestep.qa.Verdict;
import org.lodestep.report.Json;
import org.lodestep.report.QaHtml;
import org.lodestep.report.QaText;
import org.lodestep.workflow.Progress;
import org.lodestep.workflow.QaCheck;
import org.lodestep.workflow.SettingsException;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** {@code lodestep qa check}: judge one motor, or a lot of motors scanned one by one, and record each verdict. */
@Command(name = "check",
        mixinStandardHelpOptions = true,
        description = {"Judge a motor against its part spec, print the verdict and record it (append-only).",
                "With --lot and no --serial, reads serial numbers one per line from stdin (a barcode scanner types "
                        + "them) until end of input, with a running tally.",
                "Exit code 0 only when every motor passed every check; 3 when any check failed or could not be judged."},
        footerHeading = "%nExamples:%n",
        footer = {"  lodestep qa check --spec kv4218.toml --serial KV24-00117 \\",
                "      --phase-ohm 2.03,2.05 --ambient-c 22 --insulation a-frame=850 \\",
                "      --insulation b-frame=910 --operator 'M. Ortiz'",
                "  lodestep qa check --spec kv4218.toml --lot L-2607 \\",
                "      --resistance-pattern 'caps/{serial}.csv' < serials.txt",
                "  lodestep qa check --spec kv4218.toml --serial KV24-00117 \\",
                "      --step-response a.csv --step-response b.csv --back-emf emf.csv",
                "  lodestep qa check --spec kv4218.toml --lot L-2607 \\",
                "      --step-response-pattern 'caps/{serial}-step-*.csv' \\",
                "      --back-emf-pattern 'caps/{serial}-emf.csv' < serials.txt",
                "",
                "Safety: insulation testers apply hundreds of volts DC. Disconnect the motor from any driver, test on a "
                        + "non-conductive surface, keep hands off the leads while the tester runs, and discharge the "
                        + "windings afterwards. A step-response test energises the winding and an interrupted coil kicks "
                        + "back: switch off before touching leads. A shaft turned by hand makes voltage at the leads. "
                        + "Local electrical-safety rules and your site's procedures take precedence."})
final class QaCheckCommand implements Callable<Integer> {

    @Option(names = "--spec", required = true, paramLabel = "FILE", description = "Part spec (TOML).")
    Path specFile;

    @Option(names = "--serial", paramLabel = "SN", description = "Serial number of the motor (exactly as labelled).")
    String serial;

    @Option(names = "--lot", paramLabel = "LOT",
            description = "Delivery lot. Without --serial: lot mode, serial numbers from stdin (or --serials).")
    String lot;

    @Option(names = "--serials", paramLabel = "FILE",
            description = "Lot mode: read serial numbers from this file instead of stdin ('-' for stdin).")
    String serialsFile;

    @Mixin
    QaReadings readings = new QaReadings();

    @Option(names = "--ambient-c", paramLabel = "CELSIUS", description = "Ambient temperature at the bench, °C.")
    Double ambientC;

    @Option(names = "--operator", paramLabel = "NAME", description = "Who tests (default: the login name).")
    String operator;

    @Option(names = "--station", paramLabel = "NAME",
            description = "Test station (default: $LODESTEP_STATION, else the host name).")
    String station;

    @Mixin
    QaStoreOption store = new QaStoreOption();

    @Option(names = "--report", paramLabel = "FILE.html",
            description = "Also write a self-contained HTML report: verdict, every check against its limits, the record.")
    Path report;

    @Option(names = "--json", description = "Print the recorded result(s) as JSON instead of text.")
    boolean json;

    @picocli.CommandLine.Spec
    picocli.CommandLine.Model.CommandSpec spec;

    private PartSpec partSpec;
    private Provenance provenance;

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        if (serial == null && lot == null) {
            throw new UsageException("give --serial SN for one motor, or --lot LOT to read serial numbers from stdin");
        }
        if (serial != null && serial.isEmpty()) {
            throw new UsageException("--serial is empty");
        }
        if (serial != null && (serialsFile != null || readings.resistancePattern != null
                || readings.stepResponsePattern != null || readings.backEmfPattern != null)) {
            throw new UsageException("--serials and the --*-pattern options are for lot mode (--lot without --serial)");
        }
        if (serial == null && (readings.resistanceFile != null || !readings.stepResponses.isEmpty()
                || readings.backEmfFile != null)) {
            throw new UsageException("lot mode takes --resistance-pattern, --step-response-pattern and "
                    + "--back-emf-pattern, not one --resistance, --step-response or --back-emf file for every motor");
        }
        positive(readings.stepSupplyV, "--step-supply-v");
        positive(readings.revolutions, "--revolutions");
        if (readings.seriesOhm != null && !(readings.seriesOhm >= 0 && Double.isFinite(readings.seriesOhm))) {
            throw new UsageException("--series-ohm must be 0 or more, got " + readings.seriesOhm);
        }
        partSpec = PartSpecReader.read(specFile);
        provenance = readings.provenance(RunProvenance.of(spec).withInput("spec", specFile));
        if (serialsFile != null && !serialsFile.equals("-")) {
            provenance = provenance.withInput("serials", Path.of(serialsFile));
        }
        // Every input the whole lot shares is read before the first motor, so a bad one stops the run at once.
        List<String> listedSerials = serial == null && serialsFile != null && !serialsFile.equals("-")
                ? serialsFromFile(Path.of(serialsFile)) : null;
        QaCheck.Settings settings = new QaCheck.Settings(partSpec, lot, readings.sources(),
                ambientC == null ? Double.NaN : ambientC, operator(), station(), VersionProvider.version(),
                readings.confirmation());
        try (RecordStore records = store.open()) {
            QaCheck check = new QaCheck(settings, records);
            // the caution once every shared input has been read, and only where an insulation test is part of the work
            if (!json && partSpec.limit(Parameters.INSULATION_RESISTANCE).isPresent() && insulationTested()) {
                out.println(Cautions.insulationTestLine(partSpec.insulationTestVoltageV()));
            }
            if (serial != null) {
                RecordStore.Appended a = check.check(serial, progress());
                if (report != null) {
                    ProvenanceBlock.html(QaHtml.check(serial, List.of(a.record()), partSpec.insulationTestVoltageV(),
                            Map.of()), provenance).write(report);
                }
                if (json) {
                    out.println(ProvenanceBlock.json(Json.write(a), provenance));
                } else {
                    out.print(QaText.check(a.record(), a.created(), records.location()));
                    out.print(ProvenanceBlock.text(provenance));
                }
                out.flush();
                return a.record().submission().verdict() == Verdict.PASS ? ExitCode.OK : ExitCode.FINDING;
            }
            return lot(check, records, out, listedSerials);
        }
    }

    /** Whether this run involves an insulation test: the rig applies it, or the inspector logs or types readings. */
    private boolean insulationTested() {
        return readings.rig != null || !readings.insulation.isEmpty() || readings.meterLogFile != null;
    }

    /** The serial numbers of a list file, read strictly; a file without any is refused before the lot starts. */
    private static List<String> serialsFromFile(Path file) throws IOException, InputFormatException {
        String text = Utf8Text.read(file, "serial numbers, one per line");
        List<String> serials = new ArrayList<>();
        String[] lines = text.split("\r?\n", -1);
        for (int i = 0; i < lines.length; i++) {
            String sn = lines[i].strip();
            if (sn.isEmpty() || sn.startsWith("#")) {
                continue;
            }
            if (sn.length() > InputLimits.MAX_SERIAL_CHARS) {
                throw new InputFormatException(file.toString(), i + 1, null, sn, "is " + sn.length()
                        + " characters long: expected a serial number of at most " + InputLimits.MAX_SERIAL_CHARS);
            }
            serials.add(sn);
        }
        if (serials.isEmpty()) {
            throw new InputFormatException(file.toString(), InputFormatException.NO_LINE, null, null,
                    "has no serial numbers: expected one serial number per line");
        }
        return serials;
    }

    private int lot(QaCheck check, RecordStore records, PrintWriter out, List<String> listedSerials)
            throws IOException, StoreException {
        PrintWriter err = spec.commandLine().getErr();
        LotTally lotTally = new LotTally();
        Tally tally = Tally.NONE;
        List<RecordStore.Appended> results = new ArrayList<>();
        List<Map<String, String>> errors = new ArrayList<>();
        try (BufferedReader in = listedSerials != null
                ? new BufferedReader(new java.io.StringReader(String.join("\n", listedSerials)))
                : new BufferedReader(new InputStreamReader(System.in, StandardCharsets.UTF_8))) {
            if (!json) {
                out.println("lot " + lot + ": scan or type serial numbers, one per line; end of input (Ctrl-D) ends the lot");
                out.flush();
            }
            String line;
            while ((line = in.readLine()) != null) {
                String sn = line.strip();
                if (sn.isEmpty() || sn.startsWith("#")) {
                    continue;
                }
                RecordStore.Appended a;
                try {
                    a = check.check(sn, progress());
                } catch (InputFormatException | UsageException | SettingsException | IOException
                         | org.lodestep.rig.RigException e) {
                    // One unreadable capture must not stop the lot: say so, record nothing for it, go on.
                    String msg = e instanceof java.nio.file.NoSuchFileException ? e.getMessage() + ": no such file"
                            : e.getMessage();
                    err.println("lodestep qa check: serial " + sn.replaceAll("\\p{Cntrl}", "?") + " not recorded: " + msg);
                    err.flush();
                    errors.add(Map.of("serial", sn, "message", msg));
                    tally = lotTally.add(sn, Verdict.INCOMPLETE);
                    continue;
                }
                results.add(a);
                tally = lotTally.add(sn, a.record().submission().verdict());
                if (!json) {
                    out.print(QaText.check(a.record(), a.created(), records.location()));
                    out.println(QaText.tally(tally));
                    out.println();
                    out.flush();
                }
            }
        }
        if (report != null) {
            Map<String, String> notRecorded = new LinkedHashMap<>();
            for (Map<String, String> e : errors) {
                notRecorded.put(e.get("serial"), e.get("message"));
            }
            ProvenanceBlock.html(QaHtml.check("lot " + lot, results.stream().map(RecordStore.Appended::record)
                    .toList(), partSpec.insulationTestVoltageV(), notRecorded), provenance).write(report);
        }
        if (json) {
            Map<String, Object> doc = new LinkedHashMap<>();
            doc.put("lot", lot);
            doc.put("tested", tally.tested());
            doc.put("passed", tally.passed());
            doc.put("failed", tally.failed());
            doc.put("incomplete", tally.incomplete());
            doc.put("results", results);
            doc.put("errors", errors);
            out.println(ProvenanceBlock.json(Json.write(doc), provenance));
        } else {
            out.println("lot " + lot + " done: " + QaText.tally(tally));
            out.print(ProvenanceBlock.text(provenance));
        }
        out.flush();
        return tally.allPassed() ? ExitCode.OK : ExitCode.FINDING;
    }

    /** Rig readings and capture notes as indented lines: on stdout, or on stderr when stdout carries JSON. */
    private Progress progress() {
        PrintWriter log = json ? spec.commandLine().getErr() : spec.commandLine().getOut();
        return new Progress() {
            @Override
            public void note(String message) {
                log.println("  " + message);
                log.flush();
            }
        };
    }

    private static void positive(Double v, String option) {
        if (v != null && !(v > 0 && Double.isFinite(v))) {
            throw new UsageException(option + " must be a positive number, got " + v);
        }
    }

    private String operator() {
        return operator != null ? operator : System.getProperty("user.name", "");
    }

    private String station() {
        if (station != null) {
            return station;
        }
        String env = System.getenv("LODESTEP_STATION");
        if (env != null && !env.isBlank()) {
            return env;
        }
        try {
            return InetAddress.getLocalHost().getHostName();
        } catch (IOException e) {
            return "";
        }
    }
}
