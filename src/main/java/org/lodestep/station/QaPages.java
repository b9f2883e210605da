package org.lodestep.station;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.stream.Stream;

import org.lodestep.qa.CheckResult;
import org.lodestep.qa.PartSpec;
import org.lodestep.qa.PartSpecReader;
import org.lodestep.qa.RecordStore;
import org.lodestep.qa.StoredRecord;
import org.lodestep.qa.Tally;
import org.lodestep.qa.Verdict;
import org.lodestep.report.QaHtml;
import org.lodestep.report.QaText;
import org.lodestep.report.html.Status;
import org.lodestep.rig.RigException;
import org.lodestep.safety.Cautions;
import org.lodestep.sample.InputFormatException;
import org.lodestep.workflow.Progress;
import org.lodestep.workflow.QaCertificate;
import org.lodestep.workflow.QaCheck;
import org.lodestep.workflow.QaReadingSources;
import org.lodestep.workflow.SettingsException;

import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;
import io.javalin.http.HttpStatus;
import io.javalin.http.NotFoundResponse;
import io.javalin.http.UploadedFile;

/**
 * The QA station: start a run (part spec, lot, where readings come from), scan serial numbers, read a big verdict
 * per motor with the running tally, re-test, open a motor's certificate. Each scan calls {@link QaCheck} on the
 * station's worker, as {@code qa check} does on the command line; the insulation test through the rig needs the
 * page's own single-use arming after the caution.
 */
final class QaPages {
    private final Desk desk;
    private final Map<String, QaRun> runs = new ConcurrentHashMap<>();

    QaPages(Desk desk) {
        this.desk = desk;
    }

    void routes(RoutesConfig r) {
        r.get("/qa", ctx -> ctx.html(desk.page("QA station", "/qa", startForm(null))));
        r.post("/qa/runs", this::start);
        r.get("/qa/runs/{id}", ctx -> ctx.html(desk.page("QA run", "/qa", runPage(run(ctx)))));
        r.get("/qa/runs/{id}/panel", ctx -> ctx.html(panel(run(ctx))));
        r.post("/api/qa/runs/{id}/arm", this::arm);
        r.post("/api/qa/runs/{id}/scan", this::scan);
        r.get("/qa/certificate", this::certificate);
        r.get("/qa/certificate.html", this::certificatePrint);
    }

    private QaRun run(Context ctx) {
        QaRun run = runs.get(ctx.pathParam("id"));
        if (run == null) {
            throw new NotFoundResponse("no such QA run (the station was restarted?): start a new one");
        }
        return run;
    }

    // ---- starting a run ----

    private List<String> files(Path dir, String suffix) {
        if (dir == null || !Files.isDirectory(dir)) {
            return List.of();
        }
        try (Stream<Path> s = Files.list(dir)) {
            return s.map(p -> p.getFileName().toString()).filter(n -> n.toLowerCase(Locale.ROOT).endsWith(suffix))
                    .sorted().toList();
        } catch (IOException e) {
            return List.of();
        }
    }

    private String startForm(String problem) {
        StringBuilder sb = new StringBuilder("<h1>QA station</h1>");
        if (problem != null) {
            sb.append("<p class=\"problem\" role=\"alert\">").append(Layout.symbol(Status.FAIL)).append(" ")
                    .append(Layout.esc(problem)).append("</p>");
        }
        sb.append("<form method=\"post\" action=\"/qa/runs\" enctype=\"multipart/form-data\" class=\"stack\">")
                .append(Layout.formKeyField(desk.access.formKey()))
                .append("<fieldset><legend>Part spec</legend>");
        List<String> specs = files(desk.settings.specs(), ".toml");
        if (!specs.isEmpty()) {
            sb.append("<label for=\"spec\">Spec from the station's folder</label><select id=\"spec\" name=\"spec\">");
            for (String s : specs) {
                sb.append("<option>").append(Layout.esc(s)).append("</option>");
            }
            sb.append("</select>");
        }
        sb.append("<label for=\"spec_file\">").append(specs.isEmpty() ? "Spec file (TOML)" : "or upload a spec (TOML)")
                .append("</label><input type=\"file\" id=\"spec_file\" name=\"spec_file\" accept=\".toml\">")
                .append("</fieldset><fieldset><legend>Run</legend>")
                .append("<label for=\"lot\">Lot</label><input id=\"lot\" name=\"lot\" autocomplete=\"off\">")
                .append("<label for=\"operator\">Inspector</label><input id=\"operator\" name=\"operator\">")
                .append("<label for=\"ambient\">Ambient, \u00b0C</label><input id=\"ambient\" name=\"ambient_c\" "
                        + "inputmode=\"decimal\">")
                .append("</fieldset><fieldset><legend>Readings from</legend>");
        boolean captures = desk.settings.captures() != null && Files.isDirectory(desk.settings.captures());
        sb.append("<label class=\"choice\"><input type=\"radio\" name=\"source\" value=\"rig\"")
                .append(captures ? "" : " checked").append("> the bench rig <code>")
                .append(Layout.esc(desk.settings.rig())).append("</code>: lead-pair resistance, then insulation "
                        + "(armed per motor)</label>");
        if (captures) {
            sb.append("<label class=\"choice\"><input type=\"radio\" name=\"source\" value=\"captures\" checked> "
                    + "the capture folder: each motor's lead-pair CSV <code>SERIAL.csv</code></label>")
                    .append("<label for=\"meter_log\">Meter log (inductance, insulation)</label>")
                    .append("<select id=\"meter_log\" name=\"meter_log\"><option value=\"\">none</option>");
            for (String f : files(desk.settings.captures(), ".csv")) {
                if (f.toLowerCase(Locale.ROOT).contains("meter")) {
                    sb.append("<option>").append(Layout.esc(f)).append("</option>");
                }
            }
            sb.append("</select>");
        }
        sb.append("<label class=\"choice\"><input type=\"radio\" name=\"source\" value=\"typed\"> typed at the meter "
                + "for each motor: phase resistances, inductances, insulation (no rig)</label>");
        sb.append("</fieldset><button type=\"submit\" class=\"primary\">Start the run</button></form>");
        return sb.toString();
    }

    private void start(Context ctx) {
        try {
            QaRun run = newRun(ctx);
            runs.put(run.id, run);
            ctx.redirect("/qa/runs/" + run.id, HttpStatus.SEE_OTHER);
        } catch (InputFormatException | IllegalArgumentException | IOException e) {
            ctx.status(HttpStatus.BAD_REQUEST);
            ctx.html(desk.page("QA station", "/qa", startForm(Problems.of(e).message())));
        }
    }

    private QaRun newRun(Context ctx) throws IOException, InputFormatException {
        PartSpec spec;
        String specName;
        UploadedFile up = ctx.uploadedFile("spec_file");
        if (up != null && up.size() > 0) {
            specName = Uploads.safeName(up.filename());
            spec = PartSpecReader.parse(specName, Uploads.bytes(up));
        } else {
            specName = ctx.formParam("spec");
            if (specName == null || !files(desk.settings.specs(), ".toml").contains(specName)) {
                throw new SettingsException("choose a part spec from the list or upload one");
            }
            spec = PartSpecReader.read(desk.settings.specs().resolve(specName));
        }
        String source = ctx.formParam("source");
        QaReadingSources readings;
        String sourceText;
        if ("captures".equals(source) && desk.settings.captures() != null) {
            Path dir = desk.settings.captures();
            String log = ctx.formParam("meter_log");
            Path meterLog = null;
            if (log != null && !log.isEmpty()) {
                if (!files(dir, ".csv").contains(log)) {
                    throw new SettingsException("meter log '" + log + "' is not in the capture folder");
                }
                meterLog = dir.resolve(log);
            }
            readings = new QaReadingSources(null, dir.resolve("{serial}.csv").toString(), null, null, null, null,
                    null, null, meterLog, null, null, null, null, null, null, null, null);
            sourceText = "capture folder " + dir + (meterLog == null ? "" : ", meter log " + log);
        } else if ("typed".equals(source)) {
            readings = QaReadingSources.none(); // each scan brings its own typed values
            sourceText = "readings typed at the meter";
        } else if ("rig".equals(source)) {
            readings = new QaReadingSources(null, null, null, null, null, null, null, desk.settings.rig(), null,
                    null, null, null, null, null, null, null, null);
            sourceText = "bench rig " + desk.settings.rig();
        } else {
            throw new SettingsException("choose where the readings come from");
        }
        double ambient = Forms.optionalNumber(ctx.formParam("ambient_c"), "ambient temperature", "\u00b0C");
        QaCheck.Settings settings = new QaCheck.Settings(spec, ctx.formParam("lot"), readings, ambient,
                ctx.formParam("operator"), "bench station", desk.settings.toolVersion(), null);
        boolean rigInsulation = readings.rigAddress() != null && settings.insulationTest();
        return new QaRun(Access.random(), settings, specName, sourceText, rigInsulation, "typed".equals(source));
    }

    // ---- the run page ----

    private String runPage(QaRun run) {
        PartSpec spec = run.settings.spec();
        StringBuilder sb = new StringBuilder("<div data-page=\"qa-run\" data-run=\"").append(Layout.esc(run.id))
                .append(run.typed ? "\" data-typed=\"true" : "").append("\"><h1 class=\"sr-only\">QA run</h1><p class=\"context\">Part <strong>")
                .append(Layout.esc(spec.partNumber())).append("</strong> rev ").append(Layout.esc(spec.revision()))
                .append(" \u00b7 spec ").append(Layout.esc(run.specName)).append(" v").append(spec.specVersion())
                .append(run.settings.lot().isEmpty() ? "" : " \u00b7 lot <strong>" + Layout.esc(run.settings.lot())
                        + "</strong>")
                .append(" \u00b7 ").append(Layout.esc(run.sourceText)).append("</p>");
        if (run.rigInsulation) {
            double v = spec.insulationTestVoltageV();
            sb.append(Layout.caution("High voltage: insulation test", List.of(Cautions.insulationTestLine(v))))
                    .append("<div class=\"arm\"><button type=\"button\" id=\"arm\" data-volts=\"")
                    .append(Math.round(v)).append("\">Arm the ").append(Math.round(v))
                    .append(" V insulation test for the next motor</button> <span id=\"arm-state\" role=\"status\" "
                            + "aria-live=\"assertive\">Not armed: the rig will not apply the test voltage.</span></div>");
        }
        sb.append("<form id=\"scan-form\" class=\"scan\" autocomplete=\"off\"").append(run.typed ? " data-typed=\"true\""
                        : "").append("><label for=\"serial\">Scan or type the serial number, then Enter")
                .append(run.typed ? ", each reading, Enter (the last Enter records)" : "")
                .append("</label><input id=\"serial\" name=\"serial\" autofocus spellcheck=\"false\" maxlength=\"80\" "
                        + "required>")
                .append(run.typed ? typedFields(spec) : "")
                .append("<button type=\"submit\">Check</button></form>")
                .append(Layout.progressArea("scan-progress"))
                // one live region that stays in the page, so a screen reader speaks each new verdict
                .append("<p id=\"announce\" class=\"sr-only\" role=\"status\" aria-live=\"assertive\"></p>")
                .append("<div id=\"panel\">").append(panel(run)).append("</div></div>");
        return sb.toString();
    }

    /** The meter readings an inspector types per motor, in the meter's units; insulation OL above the range. */
    private static final String[][] TYPED = {
        {"phase_a_ohm", "Phase A, \u03a9"}, {"phase_b_ohm", "Phase B, \u03a9"},
        {"inductance_a_mh", "Inductance A, mH"}, {"inductance_b_mh", "Inductance B, mH"},
        {"insulation_a_frame_mohm", "Insulation A\u2013frame, M\u03a9"},
        {"insulation_b_frame_mohm", "Insulation B\u2013frame, M\u03a9"},
        {"step_angle_deg", "Step angle, \u00b0"}};

    private static String typedFields(PartSpec spec) {
        StringBuilder sb = new StringBuilder("<fieldset class=\"grid typed\"><legend>Meter readings");
        if (!Double.isNaN(spec.insulationTestVoltageV())) {
            sb.append(" (insulation at ").append(Math.round(spec.insulationTestVoltageV())).append(" V DC, OL = over "
                    + "range)");
        }
        sb.append("</legend>");
        for (String[] f : TYPED) {
            sb.append("<label>").append(Layout.esc(f[1])).append(" <input id=\"").append(f[0]).append("\" name=\"")
                    .append(f[0]).append("\" inputmode=\"decimal\" spellcheck=\"false\" maxlength=\"24\"></label>");
        }
        return sb.append("</fieldset>").toString();
    }

    /** The typed readings of one motor as the workflow takes them (meter units; it converts to SI). */
    private static QaReadingSources typedReadings(Context ctx) {
        List<Double> phases = pair(ctx, "phase_a_ohm", "phase_b_ohm", "phase resistance", "\u03a9");
        List<Double> inductances = pair(ctx, "inductance_a_mh", "inductance_b_mh", "inductance", "mH");
        List<QaReadingSources.TypedInsulation> insulation = new java.util.ArrayList<>();
        for (String[] f : new String[][] {{"insulation_a_frame_mohm", "A-frame"}, {"insulation_b_frame_mohm",
            "B-frame"}}) {
            String t = Forms.optional(ctx.formParam(f[0]));
            if (t != null) {
                double mohm = t.equalsIgnoreCase("OL") ? Double.POSITIVE_INFINITY
                        : Forms.optionalNumber(t, "insulation " + f[1], "M\u03a9 (or OL above the range)");
                insulation.add(new QaReadingSources.TypedInsulation(f[1], mohm, Double.NaN));
            }
        }
        double step = Forms.optionalNumber(ctx.formParam("step_angle_deg"), "step angle", "\u00b0");
        return new QaReadingSources(null, null, phases, inductances, insulation, null,
                Double.isNaN(step) ? null : step, null, null, null, null, null, null, null, null, null, null);
    }

    /** Phase A then B; B alone is refused, since the list is phase A first. */
    private static List<Double> pair(Context ctx, String a, String b, String what, String unit) {
        double va = Forms.optionalNumber(ctx.formParam(a), what + " A", unit);
        double vb = Forms.optionalNumber(ctx.formParam(b), what + " B", unit);
        if (Double.isNaN(va) && !Double.isNaN(vb)) {
            throw new SettingsException(what + ": phase B without phase A; type phase A first");
        }
        return Double.isNaN(va) ? List.of() : Double.isNaN(vb) ? List.of(va) : List.of(va, vb);
    }

    /** The big verdict of the latest motor, the tally and the motors of the run, newest first. */
    String panel(QaRun run) {
        List<QaRun.Row> rows = run.rows();
        StringBuilder sb = new StringBuilder();
        if (rows.isEmpty()) {
            sb.append("<section id=\"verdict\" class=\"verdict none\" aria-live=\"polite\"><p class=\"big\">Ready"
                    + "</p><p>Scan the first motor.</p></section>");
        } else {
            sb.append(verdict(rows.get(rows.size() - 1)));
        }
        Tally t = run.tally();
        sb.append("<p id=\"tally\" class=\"tally\" role=\"status\">").append(Layout.esc(QaText.tally(t))).append("</p>");
        if (!rows.isEmpty()) {
            sb.append("<table class=\"rows\"><caption>Motors of this run, newest first</caption><thead><tr>"
                    + "<th scope=\"col\">Serial</th><th scope=\"col\">Verdict</th><th scope=\"col\">Record</th>"
                    + "<th scope=\"col\">Actions</th></tr></thead><tbody>");
            for (int i = rows.size() - 1; i >= 0; i--) {
                QaRun.Row row = rows.get(i);
                sb.append("<tr><td>").append(Layout.esc(row.serial())).append("</td><td>").append(badge(row.verdict()))
                        .append("</td><td>").append(recordText(row)).append("</td><td>")
                        .append("<button type=\"button\" class=\"retest\" data-serial=\"").append(Layout.esc(row.serial()))
                        .append("\">Re-test</button>");
                if (row.record() != null) {
                    sb.append(" <a href=\"").append(certificateLink(row.serial(), row.record())).append("\">Certificate</a>");
                }
                sb.append("</td></tr>");
            }
            sb.append("</tbody></table>");
        }
        return sb.toString();
    }

    private static String recordText(QaRun.Row row) {
        if (row.record() == null) {
            return "not recorded: " + Layout.esc(row.notRecorded());
        }
        StoredRecord r = row.record();
        return "#" + r.id() + (r.retestOf() == null ? "" : ", re-test of #" + r.retestOf())
                + (row.created() ? "" : " (same readings as before: not recorded again)");
    }

    static String certificateLink(String serial, StoredRecord r) {
        return "/qa/certificate?serial=" + Forms.url(serial) + "&amp;part=" + Forms.url(r.submission().partNumber());
    }

    static String badge(Verdict v) {
        Status s = status(v);
        return "<span class=\"badge " + v.name().toLowerCase(Locale.ROOT) + "\">" + Layout.symbol(s) + " " + v.name()
                + "</span>";
    }

    /** The verdict's look: the same symbols as the reports. */
    static Status status(Verdict v) {
        return switch (v) {
            case PASS -> Status.PASS;
            case FAIL -> Status.FAIL;
            case INCOMPLETE -> Status.WARN;
        };
    }

    private static String verdict(QaRun.Row row) {
        Verdict v = row.verdict();
        StringBuilder sb = new StringBuilder("<section id=\"verdict\" class=\"verdict ")
                .append(v.name().toLowerCase(Locale.ROOT)).append("\" aria-live=\"assertive\"><p class=\"big\">")
                .append(Layout.symbol(status(v))).append(' ').append(row.record() == null ? "NOT RECORDED" : v.name())
                .append("</p><p class=\"serial\">").append(Layout.esc(row.serial())).append("</p>");
        if (row.record() == null) {
            sb.append("<p>").append(Layout.esc(row.notRecorded())).append("</p>");
        } else {
            List<CheckResult> off = row.record().submission().checks().stream()
                    .filter(c -> c.verdict() != Verdict.PASS).toList();
            if (!off.isEmpty()) {
                sb.append("<ul class=\"off\">");
                for (CheckResult c : off) {
                    // which check, the value against the limit it crossed, by how much
                    sb.append("<li>").append(badge(c.verdict())).append(' ').append(Layout.esc(QaText.reason(c)))
                            .append("</li>");
                }
                sb.append("</ul>");
            }
        }
        return sb.append("</section>").toString();
    }

    // ---- arming and scanning ----

    private void arm(Context ctx) {
        QaRun run = run(ctx);
        if (!run.rigInsulation) {
            throw new SettingsException("this run has no insulation test through the rig");
        }
        String key = run.arm(System.currentTimeMillis());
        Desk.json(ctx, Map.of("arm", key, "volts", Math.round(run.settings.spec().insulationTestVoltageV()),
                "valid_s", QaRun.ARM_VALID_MS / 1000));
    }

    private void scan(Context ctx) {
        QaRun run = run(ctx);
        String serial = ctx.formParam("serial");
        serial = serial == null ? "" : serial.strip();
        if (serial.isEmpty()) {
            throw new SettingsException("the serial number is empty");
        }
        if (serial.length() > 80 || serial.chars().anyMatch(Character::isISOControl)) {
            throw new SettingsException("a serial number is at most 80 printable characters");
        }
        // The arming is taken now, by this request: only the page that armed holds the key, and only once.
        boolean armed = run.rigInsulation && run.takeArm(ctx.formParam("arm"), System.currentTimeMillis());
        String sn = serial;
        QaCheck.Settings s = run.settings;
        QaReadingSources readings = run.typed ? typedReadings(ctx) : s.readings();
        QaCheck.Settings perMotor = new QaCheck.Settings(s.spec(), s.lot(), readings, s.ambientC(), s.operator(),
                s.station(), s.toolVersion(), volts -> armed);
        Tasks.Task task = desk.tasks.submit(progress -> check(run, perMotor, sn, progress));
        Desk.json(ctx, Map.of("task", task.id));
    }

    private Map<String, Object> check(QaRun run, QaCheck.Settings settings, String serial, Progress progress)
            throws Exception {
        RecordStore.Appended a;
        try (RecordStore store = desk.openStore()) {
            a = new QaCheck(settings, store).check(serial, progress);
        } catch (InputFormatException | IllegalArgumentException | IOException | RigException e) {
            // As on the command line: the motor counts as incomplete, nothing is recorded, the lot goes on.
            run.add(new QaRun.Row(serial, null, false, Problems.of(e).message()));
            throw e;
        }
        run.add(new QaRun.Row(serial, a.record(), a.created(), null));
        return Map.of("verdict", a.record().submission().verdict().name(), "record", a.record().id());
    }

    // ---- certificates ----

    private QaCertificate.Result certificateOf(Context ctx) throws Exception {
        String serial = ctx.queryParam("serial");
        if (serial == null || serial.isBlank()) {
            throw new SettingsException("give the serial number of the motor");
        }
        String part = ctx.queryParam("part");
        try (RecordStore store = desk.openStore()) {
            return QaCertificate.run(serial.strip(), part == null || part.isBlank() ? null : part, store,
                    Progress.NONE);
        }
    }

    private void certificate(Context ctx) throws Exception {
        QaCertificate.Result c = certificateOf(ctx);
        StoredRecord latest = c.latest();
        Status st = c.certifies() ? Status.PASS : Status.FAIL;
        String main = "<h1>Certificate: " + Layout.esc(c.serial()) + "</h1><section class=\"verdict "
                + (c.certifies() ? "pass" : "fail") + "\"><p class=\"big\">" + Layout.symbol(st) + " "
                + (c.certifies() ? "CERTIFIED" : "NOT CERTIFIED") + "</p><p>latest record #" + latest.id() + ": "
                + latest.submission().verdict().name() + (latest.intact() ? "" : ", record body does not match its SHA-256")
                + "</p></section><p><a href=\"/qa/certificate.html?serial=" + Forms.url(c.serial()) + "&amp;part="
                + Forms.url(latest.submission().partNumber()) + "\">Print view</a></p><pre class=\"text\">"
                + Layout.esc(QaText.certificate(c.history())) + "</pre>";
        ctx.html(desk.page("Certificate " + c.serial(), "/records", main));
    }

    private void certificatePrint(Context ctx) throws Exception {
        QaCertificate.Result c = certificateOf(ctx);
        double volts = c.latest().submission().measurements().insulation().stream()
                .mapToDouble(r -> r.testVoltageV()).findFirst().orElse(Double.NaN);
        ctx.html(org.lodestep.report.ProvenanceBlock.html(QaHtml.check(c.serial(), c.history(), volts, Map.of()),
                desk.provenance()).html());
    }
}
