package org.lodestep.station;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDateTime;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

import org.lodestep.report.ResonanceHtml;
import org.lodestep.report.ResonanceSafety;
import org.lodestep.report.ResonanceText;
import org.lodestep.rig.SweepPlan;
import org.lodestep.workflow.Progress;
import org.lodestep.workflow.ResonanceSweep;
import org.lodestep.workflow.RigSweepCapture;
import org.lodestep.workflow.SettingsException;

import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;
import io.javalin.http.NotFoundResponse;

/**
 * Sweep: a step-rate sweep through the rig once the moving-axis caution is acknowledged, with live progress, then
 * the response curve, the resonance bands and the avoid-list ({@link RigSweepCapture}, then {@link ResonanceSweep}
 * on the saved capture, as {@code rig capture} and {@code resonance sweep} do on the command line).
 */
final class SweepPages {
    private static final int KEEP = 16;
    private static final DateTimeFormatter STAMP = DateTimeFormatter.ofPattern("yyyyMMdd-HHmmss");

    private final Desk desk;
    private final Map<String, String> reports = new ConcurrentHashMap<>();

    SweepPages(Desk desk) {
        this.desk = desk;
    }

    void routes(RoutesConfig r) {
        r.get("/sweep", ctx -> ctx.html(desk.page("Sweep", "/sweep", form())));
        r.post("/api/sweep", this::start);
        r.post("/api/sweep/upload", this::upload);
        r.get("/sweep/reports/{id}", ctx -> {
            String html = reports.get(ctx.pathParam("id"));
            if (html == null) {
                throw new NotFoundResponse("no such sweep report (the station keeps the last " + KEEP + ")");
            }
            ctx.html(html);
        });
    }

    private String rigDefault() {
        String rig = desk.settings.rig();
        return rig.startsWith("sim:") && !rig.equals("sim:gantry-axis") ? "sim:gantry-axis" : rig;
    }

    private String form() {
        return "<h1>Sweep</h1>"
                + Layout.caution("Moving axis", ResonanceSafety.lines())
                + "<form id=\"sweep-form\" class=\"stack\">"
                + "<label class=\"choice ack\"><input type=\"checkbox\" id=\"ack\" name=\"ack\" value=\"yes\"> I have read "
                + "the caution: the travel is clear, the guards are on and the emergency stop is within reach</label>"
                + "<fieldset class=\"grid\"><legend>Sweep</legend>"
                + field("rig", "Rig", rigDefault(), "")
                + field("from", "From, full steps/s", "40", "decimal")
                + field("to", "To, full steps/s", "200", "decimal")
                + field("seconds", "Duration, s", "8", "decimal")
                + field("microsteps", "Microsteps (driver setting)", "1", "numeric") + "</fieldset>"
                + "<button type=\"submit\" class=\"primary\" id=\"sweep-start\">Start the sweep</button></form>"
                + "<form id=\"upload-form\" class=\"stack\" enctype=\"multipart/form-data\"><fieldset><legend>Or "
                + "analyse a recorded sweep</legend><label for=\"capture\">Capture file (CSV, WAV or rig capture, with its "
                + "sweep law in the file)</label><input type=\"file\" id=\"capture\" name=\"capture\" "
                + "accept=\".csv,.wav\"><button type=\"submit\" id=\"upload-start\">Analyse</button></fieldset></form>"
                + Layout.progressArea("sweep-progress")
                + "<div id=\"sweep-result\" aria-live=\"polite\"></div>";
    }

    private static String field(String name, String label, String value, String inputMode) {
        return "<label>" + Layout.esc(label) + " <input id=\"" + name + "\" name=\"" + name + "\" value=\""
                + Layout.esc(value) + "\"" + (inputMode.isEmpty() ? " spellcheck=\"false\"" : " inputmode=\"" + inputMode
                + "\"") + "></label>";
    }

    private void start(Context ctx) throws Exception {
        if (!"yes".equals(ctx.formParam("ack"))) {
            throw new SettingsException("acknowledge the moving-axis caution first: nothing was moved");
        }
        String rig = Forms.optional(ctx.formParam("rig"));
        rig = rig == null ? rigDefault() : rig;
        // The browser may pick a virtual-rig scenario; real hardware is only the one the station was started with.
        if (!rig.startsWith("sim:") && !rig.equals(desk.settings.rig())) {
            throw new SettingsException("rig '" + rig + "': this station drives only " + desk.settings.rig()
                    + " (or a virtual rig, sim:SCENARIO)");
        }
        double from = Forms.number(ctx.formParam("from"), "from", "full steps/s", 40);
        double to = Forms.number(ctx.formParam("to"), "to", "full steps/s", 200);
        double seconds = Forms.number(ctx.formParam("seconds"), "duration", "s", 8);
        double micro = Forms.number(ctx.formParam("microsteps"), "microsteps", "", 1);
        if (micro != Math.rint(micro) || micro < 1 || micro > 256) {
            throw new SettingsException("microsteps " + ctx.formParam("microsteps") + " is not a whole number 1 to 256");
        }
        SweepPlan plan = new SweepPlan(from, to, seconds, (int) micro, 5000);
        Path dir = desk.settings.out().resolve("sweeps");
        Files.createDirectories(dir);
        String name = "sweep-" + LocalDateTime.now(ZoneOffset.UTC).format(STAMP) + "-" + Access.random().substring(0, 6)
                + ".csv";
        RigSweepCapture.Settings settings = new RigSweepCapture.Settings(rig, plan, dir.resolve(name),
                desk.settings.toolVersion());
        Tasks.Task task = desk.tasks.submit(progress -> sweep(settings, progress));
        Desk.json(ctx, Map.of("task", task.id));
    }

    /** An uploaded capture, analysed by the same reader and workflow as {@code resonance sweep FILE}. */
    private void upload(Context ctx) throws Exception {
        io.javalin.http.UploadedFile up = ctx.uploadedFile("capture");
        if (up == null || up.size() == 0) {
            throw new SettingsException("choose a capture file to analyse");
        }
        // a folder of its own per upload, so the reader's messages name the file as the user knows it
        Path folder = desk.settings.out().resolve("uploads").resolve(Access.random().substring(0, 12));
        Files.createDirectories(folder);
        Path file = folder.resolve(Uploads.safeName(up.filename()).replace('/', '_'));
        Files.write(file, Uploads.bytes(up));
        Tasks.Task task = desk.tasks.submit(progress -> {
            ResonanceSweep.Result r = ResonanceSweep.analyse(file, ResonanceSweep.Settings.defaults(), progress);
            return result(r, "Uploaded capture " + Uploads.safeName(up.filename()),
                    desk.provenance().withInput("sweep", file));
        });
        Desk.json(ctx, Map.of("task", task.id));
    }

    private Map<String, Object> sweep(RigSweepCapture.Settings settings, Progress progress) throws Exception {
        RigSweepCapture.Result cap = RigSweepCapture.run(settings, progress);
        // the saved capture carries its sweep law, as `resonance sweep FILE` reads it after `rig capture`
        ResonanceSweep.Result r = ResonanceSweep.analyse(cap.saved(), ResonanceSweep.Settings.defaults(), progress);
        return result(r, "Capture saved to " + cap.saved(), desk.provenance().withInput("sweep", cap.saved())
                .withRig(desk.settings.rig()));
    }

    private Map<String, Object> result(ResonanceSweep.Result r, String origin,
                                       org.lodestep.workflow.Provenance provenance) {
        ResonanceText.SweepHeader header = new ResonanceText.SweepHeader(r.source(), r.channel(), r.unit(),
                r.sampleRateHz(), r.rateLaw());
        String id = Access.random();
        if (reports.size() >= KEEP) {
            reports.clear(); // a bench keeps only the recent sweeps in memory; each capture is saved on disk
        }
        reports.put(id, org.lodestep.report.ProvenanceBlock.html(ResonanceHtml.sweep(header, r.sweep(), r.units(),
                r.avoid(), r.spectrogramColumnRatesFullStepsPerS()), provenance).html());
        StringWriter text = new StringWriter();
        try (PrintWriter out = new PrintWriter(text)) {
            ResonanceText.sweep(out, header, r.sweep(), r.units(), r.avoid());
        }
        String html = "<h2>Result: " + r.sweep().bands().size() + " resonance band"
                + (r.sweep().bands().size() == 1 ? "" : "s") + "</h2><p>" + Layout.esc(origin)
                + ". <a href=\"/sweep/reports/" + id
                + "\">Sweep report (print view)</a></p><iframe class=\"report\" title=\"Sweep report: response curve, "
                + "bands and avoid-list\" src=\"/sweep/reports/" + id + "\"></iframe><details><summary>Bands and "
                + "avoid-list as text</summary><pre class=\"text\">" + Layout.esc(text.toString()) + "</pre></details>";
        return Map.of("html", html, "bands", r.sweep().bands().size(), "report", "/sweep/reports/" + id);
    }
}
