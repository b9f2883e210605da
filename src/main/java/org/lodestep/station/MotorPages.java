package org.lodestep.station;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

import org.lodestep.motor.OrientedLeads;
import org.lodestep.motor.WindingInput;
import org.lodestep.report.IdentifyProgressText;
import org.lodestep.report.MotorCardText;
import org.lodestep.report.MotorHtml;
import org.lodestep.report.MotorPhrasing;
import org.lodestep.rig.RigClient;
import org.lodestep.rig.RigInfo;
import org.lodestep.safety.Cautions;
import org.lodestep.safety.Hazard;
import org.lodestep.workflow.MotorCardSettings;
import org.lodestep.workflow.MotorFromFiles;
import org.lodestep.workflow.MotorOnRig;
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
        r.post("/api/motor/rig", this::onRig);
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
                + Layout.caution(Hazard.ENERGISED_WINDING.title(),
                Cautions.sentences(Hazard.ENERGISED_WINDING, Hazard.HOT_MOTOR))
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
                + Layout.progressArea("motor-progress") + "<div id=\"motor-result\" aria-live=\"polite\"></div>"
                + rigSection();
    }

    /** Or measure on the rig: resistances, step responses, a hand-turned back-EMF, after the caution and arming. */
    private String rigSection() {
        return "<section class=\"rig-action\" data-rig-action=\"motor\" data-url=\"/api/motor/rig\"><h2>Or measure on "
                + "the rig</h2>" + Layout.caution(Hazard.ENERGISED_WINDING.title(), List.of("The rig ("
                + desk.settings.rig() + ") measures the lead-pair resistances, then drives a voltage step through each "
                + "coil (the caution above applies), then asks you to turn the shaft by hand while it records the "
                + "back-EMF.", Hazard.TURNED_SHAFT.text()))
                + "<form class=\"stack rig-fields\"><fieldset class=\"grid\"><legend>Where the rig does not say</legend>"
                + field("rig_revolutions", "Revolutions you will turn") + field("rig_phase_current_a",
                "Rated phase current, A") + field("rig_supply_v", "Drive supply, V") + "</fieldset></form>"
                + "<div class=\"arm\"><button type=\"button\" class=\"arm-button\">Arm the rig for one motor</button> "
                + "<span class=\"arm-state\" role=\"status\" aria-live=\"assertive\">Not armed: the rig will not energise "
                + "anything.</span></div><button type=\"button\" class=\"primary fire\" disabled>Measure the motor on the "
                + "rig</button>" + Layout.progressArea("motor-rig-progress") + "<ol class=\"rig-readings\" aria-label=\""
                + "Stages\"></ol><div class=\"rig-result\" aria-live=\"polite\"></div></section>";
    }

    /** {@link MotorOnRig} through the station's rig once this page's arming is taken; outputs off at the end. */
    private void onRig(Context ctx) {
        MotorCardSettings card = new MotorCardSettings(null,
                boxed(ctx.formParam("rig_phase_current_a"), "phase current", "A"),
                boxed(ctx.formParam("rig_supply_v"), "supply voltage", "V"), null);
        MotorOnRig.Settings s = new MotorOnRig.Settings(boxed(ctx.formParam("rig_revolutions"), "revolutions", ""),
                card);
        desk.arming.take(ctx.formParam("arm"), RigArming.Action.MOTOR, ctx.formParam("tab"), System.currentTimeMillis());
        String address = desk.settings.rig();
        Tasks.Task task = desk.tasks.submit(t -> {
            MotorOnRig.Result r;
            try (RigClient c = RigClient.open(address)) {
                r = MotorOnRig.run(c, s, new StageEvents(t));
            }
            String id = Access.random();
            if (reports.size() >= KEEP) {
                reports.clear();
            }
            reports.put(id, MotorHtml.report("Motor card (rig)", r.card(), List.of(), r.emf(), MotorPhrasing.PLAIN).html());
            String html = "<h3>Motor card</h3><p class=\"actions\"><a href=\"/motor/reports/" + id + "\">Motor report "
                    + "(print view)</a></p><pre class=\"text\">" + Layout.esc(MotorCardText.render(r.card()))
                    + "</pre>";
            return Map.of("html", html, "report", "/motor/reports/" + id);
        });
        Desk.json(ctx, Map.of("task", task.id));
    }

    /** Each stage of the rig sequence as an event the page lists, in the command line's words. */
    private record StageEvents(Tasks.Task t) implements MotorOnRig.Listener, TaskProgress {
        @Override
        public Tasks.Task task() {
            return t;
        }

        private void stage(String text) {
            t.add("reading", Map.of("text", text.strip()));
        }

        @Override
        public void connected(RigInfo info, List<String> leads) {
            stage(IdentifyProgressText.motorConnected(info, leads));
        }

        @Override
        public void measuringResistances(int pairs) {
            stage(IdentifyProgressText.motorResistances(pairs));
        }

        @Override
        public void windingsFound(WindingInput windings) {
            stage(IdentifyProgressText.motorWindings(windings));
        }

        @Override
        public void stepResponse(int k, int n, double volts, OrientedLeads coil) {
            stage(IdentifyProgressText.motorStep(k, n, volts, coil));
        }

        @Override
        public void turnTheShaft(int coils, double seconds) {
            t.add("attention", Map.of("text", IdentifyProgressText.motorTurnTheShaft(coils, seconds).strip()));
        }

        @Override
        public void outputsOff() {
            stage(IdentifyProgressText.motorOutputsOff());
        }
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
        org.lodestep.workflow.Provenance prov = desk.provenance();
        if (resistance != null) {
            prov = prov.withInput("resistance", resistance);
        }
        prov = prov.withInputs("step response", steps);
        org.lodestep.workflow.Provenance provenance = emf == null ? prov : prov.withInput("back-EMF", emf);
        Tasks.Task task = desk.tasks.submit(progress -> result(MotorFromFiles.run(s, progress), provenance));
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

    private Map<String, Object> result(MotorFromFiles.Result r, org.lodestep.workflow.Provenance provenance) {
        List<MotorHtml.Trace> traces = r.traces().stream()
                .map(t -> new MotorHtml.Trace(t.source(), t.timeS(), t.currentA())).toList();
        String id = Access.random();
        if (reports.size() >= KEEP) {
            reports.clear();
        }
        reports.put(id, org.lodestep.report.ProvenanceBlock.html(MotorHtml.report("Motor card", r.card(), traces,
                r.emf(), MotorPhrasing.PLAIN), provenance).html());
        String html = "<h2>Motor card</h2><p class=\"actions\"><a href=\"/motor/reports/" + id + "\">Motor report "
                + "(print view)</a></p><pre class=\"text\">" + Layout.esc(MotorCardText.render(r.card()))
                + "</pre><iframe class=\"report\" title=\"Motor report: fits, back-EMF, constants\" src=\"/motor/reports/"
                + id + "\"></iframe>";
        return Map.of("html", html, "report", "/motor/reports/" + id);
    }
}
