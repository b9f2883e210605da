package org.lodestep.station;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

import org.lodestep.report.MotorCardText;
import org.lodestep.report.MotorHtml;
import org.lodestep.report.MotorPhrasing;
import org.lodestep.report.html.SafetyNote;
import org.lodestep.workflow.MotorCardSettings;
import org.lodestep.workflow.MotorFromFiles;
import org.lodestep.workflow.SettingsException;

import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;
import io.javalin.http.NotFoundResponse;
import io.javalin.http.UploadedFile;

/**
 * Motor: upload the current step responses and a hand-turned back-EMF capture (and, if measured, the lead-pair
 * resistances); {@link MotorFromFiles} reads and fits them with the same readers as {@code motor identify} and the
 * page shows the motor card and its report.
 */
final class MotorPages {
    private static final int KEEP = 16;
    private final Desk desk;
    private final Map<String, String> reports = new ConcurrentHashMap<>();

    MotorPages(Desk desk) {
        this.desk = desk;
    }

    void routes(RoutesConfig r) {
        r.get("/motor", ctx -> ctx.html(desk.page("Motor", "/motor", form())));
        r.post("/api/motor", this::identify);
        r.get("/motor/reports/{id}", ctx -> {
            String html = reports.get(ctx.pathParam("id"));
            if (html == null) {
                throw new NotFoundResponse("no such motor report (the station keeps the last " + KEEP + ")");
            }
            ctx.html(html);
        });
    }

    private String form() {
        return "<h1>Motor</h1>"
                + Layout.caution(SafetyNote.ENERGISED_COILS.title(), List.of(SafetyNote.ENERGISED_COILS.text(),
                SafetyNote.HOT_MOTOR.text()))
                + "<form id=\"motor-form\" class=\"stack\" enctype=\"multipart/form-data\"><fieldset><legend>Captures"
                + "</legend><label for=\"step_response\">Current step responses (CSV time_s,current_a with "
                + "<code># leads=</code>), one per coil or phase</label><input type=\"file\" id=\"step_response\" "
                + "name=\"step_response\" accept=\".csv\" multiple>"
                + "<label for=\"back_emf\">Back-EMF capture, shaft turned by hand (CSV or WAV)</label><input "
                + "type=\"file\" id=\"back_emf\" name=\"back_emf\" accept=\".csv,.wav\">"
                + "<label for=\"resistance\">Lead-pair resistances (CSV), if measured</label><input type=\"file\" "
                + "id=\"resistance\" name=\"resistance\" accept=\".csv\"></fieldset>"
                + "<fieldset class=\"grid\"><legend>Where the files do not say</legend>"
                + field("step_supply_v", "Step voltage, V") + field("series_ohm", "Series resistance, \u03a9")
                + field("revolutions", "Revolutions turned") + field("phase_current_a", "Rated phase current, A")
                + field("supply_v", "Drive supply, V") + "</fieldset>"
                + "<button type=\"submit\" class=\"primary\">Identify the motor</button></form>"
                + Layout.progressArea("motor-progress") + "<div id=\"motor-result\" aria-live=\"polite\"></div>";
    }

    private static String field(String name, String label) {
        return "<label>" + Layout.esc(label) + " <input name=\"" + name + "\" inputmode=\"decimal\"></label>";
    }

    private static Double boxed(String text, String what, String unit) {
        double v = Forms.optionalNumber(text, what, unit);
        return Double.isNaN(v) ? null : v;
    }

    private void identify(Context ctx) throws Exception {
        Path folder = desk.settings.out().resolve("uploads").resolve(Access.random().substring(0, 12));
        List<Path> steps = new ArrayList<>();
        for (UploadedFile f : ctx.uploadedFiles("step_response")) {
            if (f.size() > 0) {
                steps.add(save(folder, f));
            }
        }
        Path emf = one(ctx, folder, "back_emf");
        Path resistance = one(ctx, folder, "resistance");
        MotorCardSettings card = new MotorCardSettings(null,
                boxed(ctx.formParam("phase_current_a"), "phase current", "A"),
                boxed(ctx.formParam("supply_v"), "supply voltage", "V"), null);
        MotorFromFiles.Settings s = new MotorFromFiles.Settings(resistance, steps, emf,
                boxed(ctx.formParam("revolutions"), "revolutions", ""), null,
                boxed(ctx.formParam("step_supply_v"), "step voltage", "V"),
                boxed(ctx.formParam("series_ohm"), "series resistance", "\u03a9"), card, true);
        Tasks.Task task = desk.tasks.submit(progress -> result(MotorFromFiles.run(s, progress)));
        Desk.json(ctx, Map.of("task", task.id));
    }

    private static Path one(Context ctx, Path folder, String field) throws Exception {
        UploadedFile f = ctx.uploadedFile(field);
        return f == null || f.size() == 0 ? null : save(folder, f);
    }

    /** Each upload in the run's own folder under its own (safe) name, so the readers' messages name it. */
    private static Path save(Path folder, UploadedFile f) throws Exception {
        Files.createDirectories(folder);
        Path p = folder.resolve(Uploads.safeName(f.filename()).replace('/', '_'));
        if (Files.exists(p)) {
            throw new SettingsException(Uploads.safeName(f.filename()) + " was given twice");
        }
        Files.write(p, Uploads.bytes(f));
        return p;
    }

    private Map<String, Object> result(MotorFromFiles.Result r) {
        List<MotorHtml.Trace> traces = r.traces().stream()
                .map(t -> new MotorHtml.Trace(t.source(), t.timeS(), t.currentA())).toList();
        String id = Access.random();
        if (reports.size() >= KEEP) {
            reports.clear();
        }
        reports.put(id, MotorHtml.report("Motor card", r.card(), traces, r.emf(), MotorPhrasing.PLAIN).html());
        String html = "<h2>Motor card</h2><p class=\"actions\"><a href=\"/motor/reports/" + id + "\">Motor report "
                + "(print view)</a></p><pre class=\"text\">" + Layout.esc(MotorCardText.render(r.card()))
                + "</pre><iframe class=\"report\" title=\"Motor report: fits, back-EMF, constants\" src=\"/motor/reports/"
                + id + "\"></iframe>";
        return Map.of("html", html, "report", "/motor/reports/" + id);
    }
}
