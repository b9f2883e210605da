package org.lodestep.station;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.Map;

import org.lodestep.qa.RecordStore;
import org.lodestep.qa.RecordStores;
import org.lodestep.qa.StoreException;

import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;
import io.javalin.http.HttpStatus;

/**
 * What every page shares: the settings, the access rules, the task queue, the record store, and the routes common
 * to all pages (home, assets, task events).
 */
final class Desk {
    final Station.Settings settings;
    final Access access;
    final Tasks tasks;
    final RigArming arming = new RigArming();

    Desk(Station.Settings settings, Access access, Tasks tasks) {
        this.settings = settings;
        this.access = access;
        this.tasks = tasks;
    }

    /** Opens the record store as {@code qa} does (credentials from the environment, never from a page). */
    RecordStore openStore() throws StoreException {
        return RecordStores.open(settings.db(), System.getenv());
    }

    /** The provenance of one station run: this tool, "station" as the command, the time now (inputs added by the page). */
    org.lodestep.workflow.Provenance provenance() {
        return org.lodestep.workflow.Provenance.of(settings.toolVersion(), java.util.List.of("station"),
                java.time.Instant.now());
    }

    String page(String title, String active, String main) {
        return Layout.page(title, active, main, access.formKey());
    }

    void routes(RoutesConfig r) {
        r.get("/", ctx -> ctx.html(page("Home", "", home())));
        r.get("/assets/station.css", ctx -> asset(ctx, "station.css", "text/css"));
        r.get("/assets/station.js", ctx -> asset(ctx, "station.js", "text/javascript"));
        r.post("/api/rig/arm", ctx -> {
            RigArming.Action action = switch (String.valueOf(ctx.formParam("action"))) {
                case "leads" -> RigArming.Action.LEADS;
                case "motor" -> RigArming.Action.MOTOR;
                default -> throw new org.lodestep.workflow.SettingsException("action: expected leads or motor");
            };
            json(ctx, Map.of("arm", arming.arm(action, ctx.formParam("tab"), System.currentTimeMillis()),
                    "valid_s", RigArming.VALID_MS / 1000));
        });
        r.sse("/api/tasks/{id}/events", client -> {
            client.keepAlive();
            Tasks.Task t = tasks.find(client.ctx().pathParam("id")).orElse(null);
            if (t == null) {
                client.sendEvent("task", "{\"type\":\"failed\",\"kind\":\"setting\",\"message\":\"no such task\"}");
                client.close();
                return;
            }
            int from = 0;
            String last = client.ctx().header("Last-Event-ID");
            if (last != null && last.matches("\\d{1,6}")) {
                from = Integer.parseInt(last) + 1;
            }
            try {
                t.stream(client, from);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
            client.close();
        });
    }

    private static void asset(Context ctx, String name, String type) throws IOException {
        try (InputStream in = Desk.class.getResourceAsStream(name)) {
            if (in == null) {
                ctx.status(HttpStatus.NOT_FOUND);
                return;
            }
            ctx.contentType(type + "; charset=utf-8");
            ctx.result(new String(in.readAllBytes(), StandardCharsets.UTF_8));
        }
    }

    /** Answers a script's request with a JSON document. */
    static void json(Context ctx, Map<String, ?> doc) {
        ctx.contentType("application/json");
        ctx.result(org.lodestep.report.Json.write(doc));
    }

    private String home() {
        return "<h1>Bench station</h1>"
                + "<p>Served by Lodestep on this computer. Rig: <code>" + Layout.esc(settings.rig()) + "</code>; records: "
                + "<code>" + Layout.esc(settings.db() == null ? RecordStores.DEFAULT_FILE : settings.db())
                + "</code>.</p><ul class=\"cards\">"
                + "<li><a href=\"/leads\"><strong>Leads</strong></a><span>Guided probe: the next lead pair in large "
                + "type, type the meter's reading, Enter; the schematic fills in as you go; or let the rig measure. "
                + "Then the windings, findings and wiring guide.</span></li>"
                + "<li><a href=\"/motor\"><strong>Motor</strong></a><span>Upload step responses and a back-EMF capture,"
                + " or measure them on the rig: the motor card.</span></li>"
                + "<li><a href=\"/qa\"><strong>QA station</strong></a><span>Incoming inspection: pick a part spec, scan "
                + "serial numbers (or type the meter's readings), read the verdict and why, print a certificate."
                + "</span></li>"
                + "<li><a href=\"/records\"><strong>Records</strong></a><span>Lot summaries: yield, capability, control "
                + "charts; filter, export, certificates.</span></li>"
                + "<li><a href=\"/sweep\"><strong>Sweep</strong></a><span>Step-rate sweep through the rig, the "
                + "response curve drawn as it streams, then the resonance bands, the rates to avoid and a drive "
                + "profile across them.</span></li></ul>";
    }
}
