package org.lodestep.station;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDateTime;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

import org.lodestep.drive.DriveMode;
import org.lodestep.drive.Load;
import org.lodestep.drive.Margin;
import org.lodestep.drive.ProfileShape;
import org.lodestep.report.DriveHtml;
import org.lodestep.report.DriveText;
import org.lodestep.report.ResonanceHtml;
import org.lodestep.report.ResonanceJson;
import org.lodestep.report.ResonanceText;
import org.lodestep.report.html.OutputFile;
import org.lodestep.resonance.AvoidRange;
import org.lodestep.resonance.ResonanceBand;
import org.lodestep.resonance.ResponsePoint;
import org.lodestep.rig.SweepPlan;
import org.lodestep.safety.Cautions;
import org.lodestep.safety.Hazard;
import org.lodestep.workflow.DriveCurve;
import org.lodestep.workflow.DrivePlan;
import org.lodestep.workflow.ResonanceSweep;
import org.lodestep.workflow.RigSweepCapture;
import org.lodestep.workflow.SettingsException;

import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;
import io.javalin.http.NotFoundResponse;

/**
 * Sweep: a step-rate sweep through the rig once the moving-axis caution is acknowledged, with the response curve
 * drawn live as the samples stream ({@link RigSweepCapture} with its listener, then {@link ResonanceSweep} on the
 * saved capture, as {@code rig capture} and {@code resonance sweep} do on the command line); then the bands, the
 * avoid-list and, from typed motor and drive values, a profile across the bands with its step-rate table
 * ({@link DrivePlan}, as {@code drive plan --avoid-list} does).
 */
final class SweepPages {
    private static final int KEEP = 16;
    private static final DateTimeFormatter STAMP = DateTimeFormatter.ofPattern("yyyyMMdd-HHmmss");

    /** One analysed sweep: its report and the avoid-list file a profile is planned from. */
    private record Analysed(String reportHtml, Path avoidList, int microsteps) {
    }

    /** One planned profile: its report and step-rate table. */
    private record Planned(String reportHtml, String tableCsv) {
    }

    private final Desk desk;
    private final Map<String, Analysed> sweeps = new ConcurrentHashMap<>();
    private final Map<String, Planned> plans = new ConcurrentHashMap<>();

    SweepPages(Desk desk) {
        this.desk = desk;
    }

    void routes(RoutesConfig r) {
        r.get("/sweep", ctx -> ctx.html(desk.page("Sweep", "/sweep", form())));
        r.post("/api/sweep", this::start);
        r.post("/api/sweep/upload", this::upload);
        r.post("/api/sweep/{id}/plan", this::plan);
        r.get("/sweep/reports/{id}", ctx -> ctx.html(analysed(ctx).reportHtml()));
        r.get("/sweep/plans/{id}", ctx -> ctx.html(planned(ctx).reportHtml()));
        r.get("/sweep/plans/{id}/table.csv", ctx -> {
            ctx.contentType("text/csv; charset=utf-8");
            ctx.header("Content-Disposition", "attachment; filename=\"step-rate-table.csv\"");
            ctx.result(planned(ctx).tableCsv());
        });
    }

    private Analysed analysed(Context ctx) {
        Analysed a = sweeps.get(ctx.pathParam("id"));
        if (a == null) {
            throw new NotFoundResponse("no such sweep (the station keeps the last " + KEEP + "; each capture is saved"
                    + " on disk)");
        }
        return a;
    }

    private Planned planned(Context ctx) {
        Planned p = plans.get(ctx.pathParam("id"));
        if (p == null) {
            throw new NotFoundResponse("no such profile (the station keeps the last " + KEEP + ")");
        }
        return p;
    }

    private String rigDefault() {
        String rig = desk.settings.rig();
        return rig.startsWith("sim:") && !rig.equals("sim:gantry-axis") ? "sim:gantry-axis" : rig;
    }

    private String form() {
        return "<h1>Sweep</h1>"
                + Layout.caution(Hazard.MOVING_AXIS.title(), Cautions.sentences(Cautions.motion()))
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
                + "<details class=\"upload\"><summary>Or analyse a recorded sweep</summary>"
                + "<form id=\"upload-form\" class=\"stack\" enctype=\"multipart/form-data\">"
                + "<label for=\"capture\">Capture file (CSV, WAV or rig capture, with its "
                + "sweep law in the file)</label><input type=\"file\" id=\"capture\" name=\"capture\" "
                + "accept=\".csv,.wav\"><button type=\"submit\" id=\"upload-start\">Analyse</button></form></details>"
                + Layout.progressArea("sweep-progress")
                // drawn by the page's script from the curve events; the text beside it says the same in words
                // not a live region: a few updates a second would drown a screen reader; the progress speaks
                + "<figure id=\"live-curve\" class=\"curve\" hidden><figcaption>Vibration level per step rate "
                + "<span id=\"curve-state\"></span></figcaption><div id=\"curve-plot\"></div></figure>"
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
        Tasks.Task task = desk.tasks.submit(t -> sweep(settings, t));
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
        Tasks.Task task = desk.tasks.submit(t -> {
            ResonanceSweep.Result r = ResonanceSweep.analyse(file, ResonanceSweep.Settings.defaults(), t);
            return result(r, "Uploaded capture " + Uploads.safeName(up.filename()), folder,
                    desk.provenance().withInput("sweep", file));
        });
        Desk.json(ctx, Map.of("task", task.id));
    }

    private Map<String, Object> sweep(RigSweepCapture.Settings settings, Tasks.Task task) throws Exception {
        RigSweepCapture.Result cap = RigSweepCapture.run(settings, task, (soFar, capturedS, sweepS) ->
                task.add("curve", curveEvent(soFar, capturedS, sweepS)));
        // the saved capture carries its sweep law, as `resonance sweep FILE` reads it after `rig capture`
        ResonanceSweep.Result r = ResonanceSweep.analyse(cap.saved(), ResonanceSweep.Settings.defaults(), task);
        return result(r, "Capture saved to " + cap.saved(), cap.saved().getParent(),
                desk.provenance().withInput("sweep", cap.saved()).withRig(desk.settings.rig()));
    }

    private static Map<String, Object> curveEvent(List<ResponsePoint> soFar, double capturedS, double sweepS) {
        Map<String, Object> e = new LinkedHashMap<>();
        e.put("points", points(soFar));
        e.put("captured_s", round(capturedS, 100));
        e.put("sweep_s", sweepS);
        return e;
    }

    /** Rate and level of each point, rounded to what a drawing resolves, for the page's script. */
    private static List<double[]> points(List<ResponsePoint> curve) {
        List<double[]> out = new ArrayList<>(curve.size());
        for (ResponsePoint p : curve) {
            out.add(new double[] {round(p.rateFullStepsPerS(), 100), round(p.levelDb(), 100)});
        }
        return out;
    }

    private static double round(double v, double per) {
        return Math.rint(v * per) / per;
    }

    private Map<String, Object> result(ResonanceSweep.Result r, String origin, Path folder,
                                       org.lodestep.workflow.Provenance provenance) throws Exception {
        ResonanceText.SweepHeader header = new ResonanceText.SweepHeader(r.source(), r.channel(), r.unit(),
                r.sampleRateHz(), r.rateLaw());
        String id = Access.random();
        if (sweeps.size() >= KEEP) {
            sweeps.clear(); // a bench keeps only the recent sweeps in memory; each capture is saved on disk
        }
        // the avoid-list as `resonance sweep --avoid-list` writes it: what `drive plan` and the profile read
        Path avoid = folder.resolve(id.substring(0, 12) + "-avoid-list.json");
        OutputFile.write(avoid, org.lodestep.report.ProvenanceBlock.json(ResonanceJson.avoidList(r.avoid()),
                provenance) + System.lineSeparator());
        sweeps.put(id, new Analysed(org.lodestep.report.ProvenanceBlock.html(ResonanceHtml.sweep(header, r.sweep(),
                r.units(), r.avoid(), r.spectrogramColumnRatesFullStepsPerS()), provenance).html(), avoid,
                r.units().microsteps()));
        StringWriter text = new StringWriter();
        try (PrintWriter out = new PrintWriter(text)) {
            ResonanceText.sweep(out, header, r.sweep(), r.units(), r.avoid());
        }
        int n = r.sweep().bands().size();
        StringWriter stall = new StringWriter();
        try (PrintWriter out = new PrintWriter(stall)) {
            ResonanceText.stall(out, r.sweep().stall(), r.units());
        }
        // lost synchronism is the first thing the text says, and the first thing the page shows: a warning (the
        // reports mark it so), since the sweep itself worked
        String synchronism = r.sweep().stall().lostSynchronism()
                ? "<div class=\"problem\" role=\"alert\"><pre class=\"plain\">" + Layout.symbol(
                org.lodestep.report.html.Status.WARN) + " " + Layout.esc(stall.toString().strip()) + "</pre></div>"
                : "<p>" + Layout.esc(stall.toString().strip()) + "</p>";
        String html = "<h2>Result: " + n + " resonance band" + (n == 1 ? "" : "s") + "</h2>" + synchronism + "<p>"
                + Layout.esc(origin) + ". Avoid-list: <code>" + Layout.esc(avoid.toString()) + "</code></p>"
                + bandTable(r.avoid().ranges())
                + "<p class=\"actions\"><a href=\"/sweep/reports/" + id + "\">Sweep report (print view)</a></p>"
                + "<details><summary>Sweep report: response curve, spectrogram, bands</summary><iframe class=\"report\""
                + " title=\"Sweep report: response curve, bands and avoid-list\" src=\"/sweep/reports/" + id
                + "\"></iframe></details><details><summary>Bands and avoid-list as text</summary><pre class=\"text\">"
                + Layout.esc(text.toString()) + "</pre></details>" + planForm(id, r.units().microsteps());
        List<double[]> bandSpans = new ArrayList<>();
        for (ResonanceBand b : r.sweep().bands()) {
            bandSpans.add(new double[] {round(b.startFullStepsPerS(), 100), round(b.endFullStepsPerS(), 100),
                    round(b.peakFullStepsPerS(), 100)});
        }
        List<double[]> avoidSpans = new ArrayList<>();
        for (AvoidRange a : r.avoid().ranges()) {
            avoidSpans.add(new double[] {round(a.fromFullStepsPerS(), 100), round(a.toFullStepsPerS(), 100)});
        }
        Map<String, Object> done = new LinkedHashMap<>();
        done.put("html", html);
        done.put("bands", n);
        done.put("sweep", id);
        done.put("report", "/sweep/reports/" + id);
        done.put("points", points(r.sweep().response()));
        done.put("band_spans", bandSpans);
        done.put("avoid_spans", avoidSpans);
        return done;
    }

    /** The avoid-list at a glance: where, how fast to cross, what to do. */
    private static String bandTable(List<AvoidRange> ranges) {
        if (ranges.isEmpty()) {
            return "<p>No band to avoid in the swept range.</p>";
        }
        StringBuilder sb = new StringBuilder("<div class=\"table-wrap\"><table class=\"rows\" id=\"avoid-table\"><caption>Avoid-list: step rates "
                + "not to dwell at</caption><thead><tr><th scope=\"col\">Full steps/s</th><th scope=\"col\">rpm</th>"
                + "<th scope=\"col\">Kind</th><th scope=\"col\">Cross at least at, full steps/s\u00b2</th>"
                + "<th scope=\"col\">Advice</th></tr></thead><tbody>");
        for (AvoidRange a : ranges) {
            sb.append("<tr><td>").append(fmt(a.fromFullStepsPerS())).append(" \u2013 ").append(fmt(a.toFullStepsPerS()))
                    .append("</td><td>").append(fmt(a.fromRpm())).append(" \u2013 ").append(fmt(a.toRpm()))
                    .append("</td><td>").append(Layout.esc(ResonanceText.className(a.bandClass(), a.subharmonic()))).append("</td><td>")
                    .append(Double.isNaN(a.minAccelerationFullStepsPerS2()) ? "\u2014"
                            : fmt(a.minAccelerationFullStepsPerS2())).append("</td><td>")
                    .append(Layout.esc(a.advice())).append("</td></tr>");
        }
        return sb.append("</tbody></table></div>").toString();
    }

    private static String fmt(double v) {
        return Double.isNaN(v) ? "\u2014" : String.format(Locale.ROOT, v >= 100 ? "%.0f" : "%.1f", v);
    }

    // ---- the drive profile across the bands ----

    private String planForm(String sweepId, int microsteps) {
        return "<h2>Drive profile across the bands</h2>" + Layout.caution(Hazard.MOVING_AXIS.title(),
                Cautions.sentences(Hazard.MOVING_AXIS))
                + "<form id=\"plan-form\" class=\"stack\" data-sweep=\"" + sweepId + "\"><p>The motor's constants (from "
                + "its motor card or datasheet), the drive and the load; the profile crosses each band of this sweep's "
                + "avoid-list at no less than its crossing acceleration.</p><fieldset class=\"grid\"><legend>Motor"
                + "</legend>" + field("phase_resistance_ohm", "Phase resistance, \u03a9", "", "decimal")
                + field("phase_inductance_h", "Phase inductance, H", "", "decimal")
                + field("kt_nm_per_a", "Torque constant, N\u00b7m/A", "", "decimal")
                + field("rotor_inertia_kgm2", "Rotor inertia, kg\u00b7m\u00b2", "", "decimal")
                + field("rotor_teeth", "Rotor teeth", "50", "numeric") + "</fieldset>"
                + "<fieldset class=\"grid\"><legend>Drive and load</legend><label>Drive <select name=\"drive\">"
                + "<option value=\"chopper\">chopper (current-regulating)</option><option value=\"constant-voltage\">"
                + "constant voltage</option></select></label>"
                + field("supply_v", "Supply, V", "", "decimal") + field("current_a", "Current, A peak per phase", "",
                "decimal")
                + field("plan_microsteps", "Microsteps", Integer.toString(microsteps), "numeric")
                + field("load_inertia_kgm2", "Load inertia at the shaft, kg\u00b7m\u00b2", "0", "decimal")
                + field("friction_torque_nm", "Friction torque, N\u00b7m", "0", "decimal") + "</fieldset>"
                + "<fieldset class=\"grid\"><legend>Move</legend>"
                + field("target_full_steps_per_s", "Target, full steps/s", "", "decimal")
                + field("margin", "Torque margin (fraction)", "0.3", "decimal")
                + "<label>Shape <select name=\"shape\"><option value=\"trapezoidal\">trapezoidal</option><option "
                + "value=\"s-curve\">S-curve</option></select></label>"
                + field("cruise_s", "Cruise, s", "0.5", "decimal") + "</fieldset>"
                + "<button type=\"submit\" id=\"plan-start\">Plan the profile</button></form>"
                + Layout.progressArea("plan-progress") + "<div id=\"plan-result\" aria-live=\"polite\"></div>";
    }

    private void plan(Context ctx) {
        Analysed a = analysed(ctx);
        DriveMode mode = switch (String.valueOf(ctx.formParam("drive"))) {
            case "chopper" -> DriveMode.CHOPPER;
            case "constant-voltage" -> DriveMode.CONSTANT_VOLTAGE;
            default -> throw new SettingsException("drive: expected chopper or constant-voltage");
        };
        Double current = boxed(ctx, "current_a", "current", "A");
        if (mode == DriveMode.CONSTANT_VOLTAGE && current != null) {
            throw new SettingsException("current: a constant-voltage drive has no current setting; its current is the"
                    + " supply over the winding resistance");
        }
        double micro = Forms.number(ctx.formParam("plan_microsteps"), "microsteps", "", a.microsteps());
        double teeth = Forms.number(ctx.formParam("rotor_teeth"), "rotor teeth", "", 50);
        if (micro != Math.rint(micro) || micro < 1 || micro > 256 || teeth != Math.rint(teeth) || teeth < 1) {
            throw new SettingsException("microsteps and rotor teeth are whole numbers (microsteps 1 to 256)");
        }
        double target = Forms.optionalNumber(ctx.formParam("target_full_steps_per_s"), "target", "full steps/s");
        if (!(target > 0)) {
            throw new SettingsException("target: give the speed to reach, full steps/s (a positive number)");
        }
        double margin = Forms.number(ctx.formParam("margin"), "margin", "", Margin.DEFAULT);
        Margin.check(margin);
        String shapeText = String.valueOf(ctx.formParam("shape"));
        ProfileShape shape = shapeText.equals("s-curve") ? ProfileShape.S_CURVE : shapeText.equals("trapezoidal")
                ? ProfileShape.TRAPEZOIDAL : null;
        if (shape == null) {
            throw new SettingsException("shape: expected trapezoidal or s-curve");
        }
        Load load = new Load(Forms.number(ctx.formParam("load_inertia_kgm2"), "load inertia", "kg\u00b7m\u00b2", 0),
                Forms.number(ctx.formParam("friction_torque_nm"), "friction torque", "N\u00b7m", 0), 0, Double.NaN);
        DriveCurve.Settings curve = new DriveCurve.Settings(null, boxed(ctx, "phase_resistance_ohm",
                "phase resistance", "\u03a9"), boxed(ctx, "phase_inductance_h", "phase inductance", "H"),
                boxed(ctx, "kt_nm_per_a", "torque constant", "N\u00b7m/A"), (int) teeth,
                boxed(ctx, "rotor_inertia_kgm2", "rotor inertia", "kg\u00b7m\u00b2"), 0, mode,
                boxed(ctx, "supply_v", "supply", "V"), current, (int) micro, 0, load, target,
                DriveCurve.SpeedUnit.FULL_STEPS_PER_S, margin, false);
        DrivePlan.Settings s = new DrivePlan.Settings(curve, a.avoidList(), shape, Double.POSITIVE_INFINITY,
                Double.NaN, Forms.number(ctx.formParam("cruise_s"), "cruise", "s", 0.5), 0.001, false);
        Tasks.Task task = desk.tasks.submit(t -> planned(DrivePlan.run(s, t)));
        Desk.json(ctx, Map.of("task", task.id));
    }

    private static Double boxed(Context ctx, String name, String what, String unit) {
        double v = Forms.optionalNumber(ctx.formParam(name), what, unit);
        return Double.isNaN(v) ? null : v;
    }

    private Map<String, Object> planned(DrivePlan.Result r) {
        String id = Access.random();
        if (plans.size() >= KEEP) {
            plans.clear();
        }
        plans.put(id, new Planned(DriveHtml.plan(r).html(), r.table().csv()));
        StringWriter text = new StringWriter();
        try (PrintWriter out = new PrintWriter(text)) {
            DriveText.plan(out, r);
        }
        String html = "<h3>Planned profile</h3><p class=\"actions\"><a href=\"/sweep/plans/" + id + "/table.csv\" "
                + "download>Step-rate table (CSV)</a> <a href=\"/sweep/plans/" + id + "\">Profile report (print view)"
                + "</a></p><pre class=\"text\">" + Layout.esc(text.toString()) + "</pre><iframe class=\"report\" "
                + "title=\"Drive profile: torque curve with the bands, the profile\" src=\"/sweep/plans/" + id
                + "\"></iframe>";
        return Map.of("html", html, "plan", "/sweep/plans/" + id, "rows", r.table().rows().size());
    }
}
