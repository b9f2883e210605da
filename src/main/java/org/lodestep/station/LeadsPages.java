package org.lodestep.station;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.concurrent.ConcurrentHashMap;

import org.lodestep.report.IdentifyProgressText;
import org.lodestep.report.LeadsHtml;
import org.lodestep.report.html.Status;
import org.lodestep.rig.RigClient;
import org.lodestep.rig.RigInfo;
import org.lodestep.safety.Cautions;
import org.lodestep.safety.Hazard;
import org.lodestep.wiring.Identification;
import org.lodestep.wiring.LeadPair;
import org.lodestep.workflow.LeadsOnRig;
import org.lodestep.workflow.LeadsProbe;
import org.lodestep.workflow.LeadsSettings;
import org.lodestep.workflow.SettingsException;

import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;
import io.javalin.http.HttpStatus;
import io.javalin.http.NotFoundResponse;

/**
 * Leads: a guided probe session typed at the keyboard ({@link LeadsProbe}, as {@code leads probe} runs it): the next
 * pair in large type, Enter records the reading, {@code OL} an open circuit, {@code u} withdraws the last reading;
 * the readings so far; at the end the identification report with the schematic, findings and wiring guide.
 */
final class LeadsPages {
    private static final int KEEP = 32;
    private final Desk desk;
    private final Map<String, LeadsProbeRun> probes = new ConcurrentHashMap<>();
    private final List<String> order = new ArrayList<>();
    private final Map<String, String> rigReports = new ConcurrentHashMap<>();

    LeadsPages(Desk desk) {
        this.desk = desk;
    }

    void routes(RoutesConfig r) {
        r.get("/leads", ctx -> ctx.html(desk.page("Leads", "/leads", form(null))));
        r.post("/leads/probes", this::start);
        r.get("/leads/probes/{id}", ctx -> ctx.html(desk.page("Probe", "/leads", page(probe(ctx)))));
        r.get("/leads/probes/{id}/panel", ctx -> ctx.html(panel(probe(ctx))));
        r.post("/api/leads/probes/{id}/answer", this::answer);
        r.get("/leads/probes/{id}/report.html", this::report);
        r.post("/api/leads/rig", this::onRig);
        r.get("/leads/rig/{id}", ctx -> {
            String html = rigReports.get(ctx.pathParam("id"));
            if (html == null) {
                throw new NotFoundResponse("no such rig identification (the station keeps the last " + KEEP + ")");
            }
            ctx.html(html);
        });
    }

    /**
     * The rig measures the pairs the probe session asks for ({@link LeadsOnRig}), once this page's arming is taken;
     * each reading is an event, the rig switches its outputs off when the session ends or the line drops.
     */
    private void onRig(Context ctx) {
        desk.arming.take(ctx.formParam("arm"), RigArming.Action.LEADS, ctx.formParam("tab"), System.currentTimeMillis());
        String address = desk.settings.rig();
        Tasks.Task task = desk.tasks.submit(t -> {
            LeadsOnRig.Result r;
            try (RigClient c = RigClient.open(address)) {
                r = LeadsOnRig.run(c, LeadsSettings.DEFAULT, new TaskProgress.Leads(t) {
                    @Override
                    public void connected(RigInfo info, List<String> leads, int allPairs) {
                        t.note(IdentifyProgressText.leadsConnected(address, info, leads.size(), allPairs));
                    }

                    @Override
                    public void measured(LeadPair pair, OptionalDouble ohms) {
                        t.add("reading", Map.of("text", IdentifyProgressText.leadsMeasured(pair, ohms).strip()));
                    }
                });
            }
            String id = Access.random();
            if (rigReports.size() >= KEEP) {
                rigReports.clear();
            }
            String title = r.motorSerial() == null ? "Motor on the rig" : r.motorSerial();
            rigReports.put(id, LeadsHtml.report(title, address, r.identification()).html());
            Identification idn = r.identification();
            Status st = LeadsHtml.status(idn);
            String html = "<section class=\"verdict " + Layout.verdictClass(st) + "\"><p class=\"big\">"
                    + Layout.symbol(st) + " " + Layout.layoutLabel(st, idn.topology().label())
                    + "</p><p>" + Layout.esc(IdentifyProgressText.leadsDone(r.readings(), r.allPairs())) + " Outputs "
                    + "off.</p></section><p class=\"actions\"><a href=\"/leads/rig/" + id + "\">Wiring guide and report "
                    + "(print view)</a></p><iframe class=\"report\" title=\"Lead identification on the rig\" src=\""
                    + "/leads/rig/" + id + "\"></iframe>";
            return Map.of("html", html, "topology", idn.topology().label());
        });
        Desk.json(ctx, Map.of("task", task.id));
    }

    private LeadsProbeRun probe(Context ctx) {
        LeadsProbeRun p = probes.get(ctx.pathParam("id"));
        if (p == null) {
            throw new NotFoundResponse("no such probe session (the station was restarted?): start a new one");
        }
        return p;
    }

    private String form(String problem) {
        return "<h1>Leads</h1>" + (problem == null ? "" : "<p class=\"problem\" role=\"alert\">"
                + Layout.symbol(Status.FAIL) + " " + Layout.esc(problem) + "</p>")
                + Layout.caution("Before you measure", List.of(Cautions.leadMeasurementLine("in the field below")))
                + "<form method=\"post\" action=\"/leads/probes\" class=\"stack\">"
                + Layout.formKeyField(desk.access.formKey())
                + "<fieldset><legend>The motor's leads</legend>"
                + "<label for=\"labels\">Lead labels, in the order you know them (colours or numbers), separated by "
                + "commas; or just how many leads</label><input id=\"labels\" name=\"labels\" value=\"6\" "
                + "spellcheck=\"false\" autofocus>"
                + "<label for=\"ambient\">Winding temperature, \u00b0C (optional)</label><input id=\"ambient\" "
                + "name=\"ambient_c\" inputmode=\"decimal\"></fieldset>"
                + "<button type=\"submit\" class=\"primary\">Start probing</button></form>"
                + rigSection();
    }

    /** Or let the rig measure: its caution, the arming, the start. */
    private String rigSection() {
        return "<section class=\"rig-action\" data-rig-action=\"leads\" data-url=\"/api/leads/rig\"><h2>Or let the rig "
                + "measure</h2>" + Layout.caution(Hazard.ENERGISED_WINDING.title(), List.of(
                "The rig passes a measuring current through each lead pair of the motor clipped to it (rig "
                        + desk.settings.rig() + ").", Hazard.ENERGISED_WINDING.text()))
                + "<div class=\"arm\"><button type=\"button\" class=\"arm-button\">Arm the rig for one session"
                + "</button> <span class=\"arm-state\" role=\"status\" aria-live=\"assertive\">Not armed: the rig will "
                + "not energise anything.</span></div><button type=\"button\" class=\"primary fire\" disabled>Measure "
                + "the leads on the rig</button>" + Layout.progressArea("leads-rig-progress")
                + "<ol class=\"rig-readings\" aria-label=\"Readings so far\"></ol><div class=\"rig-result\" "
                + "aria-live=\"polite\"></div></section>";
    }

    private void start(Context ctx) throws Exception {
        try {
            List<String> leads = labels(ctx.formParam("labels"));
            double ambient = Forms.optionalNumber(ctx.formParam("ambient_c"), "winding temperature", "\u00b0C");
            LeadsSettings d = LeadsSettings.DEFAULT;
            LeadsSettings s = new LeadsSettings(ambient, d.referenceC(), d.copper(), d.imbalanceTolerance(),
                    d.contactAllowanceOhm());
            LeadsProbeRun p = new LeadsProbeRun(Access.random(), new LeadsProbe.Settings(leads, s));
            synchronized (order) {
                order.add(p.id);
                while (order.size() > KEEP) {
                    LeadsProbeRun old = probes.remove(order.remove(0));
                    if (old != null) {
                        old.stop();
                    }
                }
            }
            probes.put(p.id, p);
            p.start();
            p.awaitReady();
            ctx.redirect("/leads/probes/" + p.id, HttpStatus.SEE_OTHER);
        } catch (IllegalArgumentException e) {
            ctx.status(HttpStatus.BAD_REQUEST);
            ctx.html(desk.page("Leads", "/leads", form(e.getMessage())));
        }
    }

    /** "6" for leads 1 to 6, or the labels themselves. */
    static List<String> labels(String text) {
        String t = text == null ? "" : text.strip();
        if (t.matches("\\d{1,2}")) {
            int n = Integer.parseInt(t);
            if (n < 2 || n > 16) {
                throw new SettingsException("a motor has 2 to 16 leads, not " + n);
            }
            List<String> l = new ArrayList<>();
            for (int i = 1; i <= n; i++) {
                l.add(Integer.toString(i));
            }
            return l;
        }
        List<String> l = new ArrayList<>();
        for (String part : t.split(",")) {
            String p = part.strip();
            if (p.length() > 24 || p.chars().anyMatch(Character::isISOControl)) {
                throw new SettingsException("lead label '" + p.replaceAll("\\p{Cntrl}", "?") + "': at most 24 printable"
                        + " characters");
            }
            l.add(p);
        }
        if (l.size() > 16) {
            throw new SettingsException("a motor has 2 to 16 leads, not " + l.size());
        }
        return l;
    }

    private String page(LeadsProbeRun p) {
        return "<div data-page=\"leads-probe\" data-probe=\"" + Layout.esc(p.id) + "\"><h1 class=\"sr-only\">Probe "
                + "session</h1><p class=\"context\">Leads " + Layout.esc(String.join(", ", p.settings.leads())) + " \u00b7 up to "
                + p.settings.allPairs() + " pairs</p><p id=\"announce\" class=\"sr-only\" role=\"status\" "
                + "aria-live=\"assertive\"></p><div id=\"probe-panel\">" + panel(p) + "</div></div>";
    }

    /** The next pair (or the result), the answer field, the readings so far. */
    String panel(LeadsProbeRun p) {
        StringBuilder sb = new StringBuilder();
        LeadsProbe.Question q = p.question();
        LeadsProbe.Result r = p.result();
        if (p.failure() != null) {
            sb.append("<p class=\"problem\" role=\"alert\">").append(Layout.symbol(Status.FAIL)).append(' ')
                    .append(Layout.esc(p.failure())).append("</p>");
        } else if (q != null) {
            sb.append("<section id=\"next\" class=\"verdict none\" aria-live=\"assertive\"><p>Reading ")
                    .append(q.number()).append(" of up to ").append(p.settings.allPairs()).append(": measure</p>")
                    .append("<p class=\"big pair\">").append(Layout.esc(q.first())).append(" \u2013 ")
                    .append(Layout.esc(q.second())).append("</p></section>")
                    .append("<form id=\"answer-form\" class=\"scan\" autocomplete=\"off\"><label for=\"ohms\">Ohms, "
                            + "then Enter (OL = open circuit, u = undo the last reading)</label><input id=\"ohms\" "
                            + "name=\"value\" inputmode=\"decimal\" spellcheck=\"false\" autofocus maxlength=\"24\">"
                            + "<button type=\"submit\">Record</button><button type=\"button\" data-value=\"OL\">OL"
                            + "</button><button type=\"button\" data-value=\"u\">Undo</button><button type=\"button\" "
                            + "data-value=\"stop\">Stop</button></form>");
        } else if (r != null) {
            Identification id = r.identification();
            Status st = LeadsHtml.status(id);
            sb.append("<section id=\"next\" class=\"verdict ").append(Layout.verdictClass(st))
                    .append("\" aria-live=\"assertive\"><p class=\"big\">")
                    .append(Layout.symbol(st)).append(' ').append(Layout.layoutLabel(st, id.topology().label()))
                    .append("</p><p>")
                    .append(r.readings()).append(" of ").append(r.allPairs()).append(" pairs measured")
                    .append(r.stopped() == null ? "" : "; stopped before the answer was certain").append("</p></section>")
                    .append("<p class=\"actions\"><a href=\"/leads/probes/").append(Layout.esc(p.id))
                    .append("/report.html\">Wiring guide and report (print view)</a></p><iframe class=\"report\" title=\""
                            + "Lead identification: schematic, findings and wiring guide\" src=\"/leads/probes/")
                    .append(Layout.esc(p.id)).append("/report.html\"></iframe>");
        }
        if (!p.notice().isEmpty()) {
            sb.append("<p class=\"notice\" role=\"status\">").append(Layout.esc(p.notice())).append("</p>");
        }
        List<LeadsProbeRun.Entry> entries = p.entries();
        Identification soFar = p.soFar();
        boolean live = q != null && soFar != null && !entries.isEmpty();
        if (live) {
            sb.append("<div class=\"live-leads\">").append(LeadsHtml.soFar(soFar));
        }
        if (!entries.isEmpty()) {
            sb.append("<table class=\"rows\"><caption>Readings so far, newest first</caption><thead><tr><th scope=\"col\">"
                    + "#</th><th scope=\"col\">Pair</th><th scope=\"col\">Reading</th></tr></thead><tbody>");
            for (int i = entries.size() - 1; i >= 0; i--) {
                LeadsProbeRun.Entry e = entries.get(i);
                sb.append("<tr><td>").append(i + 1).append("</td><td>").append(Layout.esc(e.first())).append(" \u2013 ")
                        .append(Layout.esc(e.second())).append("</td><td>")
                        .append(e.ohms().isPresent() ? String.format(Locale.ROOT, "%.4g \u03a9", e.ohms().getAsDouble())
                                : "OL (open)").append("</td></tr>");
            }
            sb.append("</tbody></table>");
        }
        if (live) {
            sb.append("</div>");
        }
        return sb.toString();
    }

    /** The typed answer: ohms, OL, undo or stop; anything else is refused with what was expected. */
    static LeadsProbe.Answer parse(String text) {
        String t = text == null ? "" : text.strip().toLowerCase(Locale.ROOT);
        switch (t) {
            case "ol", "open", "inf" -> {
                return new LeadsProbe.Answer.Reading(OptionalDouble.empty());
            }
            case "u", "undo" -> {
                return new LeadsProbe.Answer.Undo();
            }
            case "stop", "q" -> {
                return new LeadsProbe.Answer.Stop(LeadsProbe.StopReason.QUIT);
            }
            default -> {
                String num = t.replaceAll("\\s*(ohms?|\u03c9|\u2126)$", "");
                try {
                    double v = Double.parseDouble(num);
                    if (v >= 0 && Double.isFinite(v)) {
                        return new LeadsProbe.Answer.Reading(OptionalDouble.of(v));
                    }
                } catch (NumberFormatException e) {
                    // reported below
                }
                throw new SettingsException("'" + text.strip() + "' is not a reading: expected ohms (e.g. 2.4), OL "
                        + "for open circuit, u to undo or stop");
            }
        }
    }

    private void answer(Context ctx) throws Exception {
        LeadsProbeRun p = probe(ctx);
        p.answer(parse(ctx.formParam("value")));
        Desk.json(ctx, Map.of("html", panel(p), "done", p.question() == null));
    }

    private void report(Context ctx) {
        LeadsProbeRun p = probe(ctx);
        LeadsProbe.Result r = p.result();
        if (r == null) {
            throw new SettingsException("the probe session has not finished yet");
        }
        ctx.html(org.lodestep.report.ProvenanceBlock.html(LeadsHtml.report("Probed motor", null,
                r.identification()), desk.provenance()).html());
    }
}
