package org.lodestep.station;

import java.io.StringWriter;
import java.util.List;
import java.util.Locale;

import org.lodestep.qa.LotStatistics;
import org.lodestep.qa.RecordQuery;
import org.lodestep.qa.RecordStore;
import org.lodestep.qa.StoredRecord;
import org.lodestep.report.QaCsv;
import org.lodestep.report.QaHtml;
import org.lodestep.workflow.Progress;
import org.lodestep.workflow.QaExport;
import org.lodestep.workflow.QaLotReport;

import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;

/**
 * Records: the lots in the store with their yield, the lot report (capability, control charts, histograms: the
 * report's own charts, also its print view), filters by lot, part and date, the CSV export and certificates. Every
 * figure comes from {@link QaLotReport} and {@link QaExport}; this page only lays them out.
 */
final class RecordsPages {
    private final Desk desk;

    RecordsPages(Desk desk) {
        this.desk = desk;
    }

    void routes(RoutesConfig r) {
        r.get("/records", this::page);
        r.get("/records/report.html", this::report);
        r.get("/records/export.csv", this::export);
    }

    /** The filter as the query string gives it. */
    private record Filter(String lot, String part, String from, String to) {
        static Filter of(Context ctx) {
            return new Filter(Forms.optional(ctx.queryParam("lot")), Forms.optional(ctx.queryParam("part")),
                    Forms.optional(ctx.queryParam("from")), Forms.optional(ctx.queryParam("to")));
        }

        RecordQuery query() {
            return new RecordQuery(null, lot, part, Forms.day(from, "from", false), Forms.day(to, "to", true));
        }

        String queryString() {
            StringBuilder b = new StringBuilder();
            add(b, "lot", lot);
            add(b, "part", part);
            add(b, "from", from);
            add(b, "to", to);
            return b.toString();
        }

        private static void add(StringBuilder b, String k, String v) {
            if (v != null) {
                b.append(b.length() == 0 ? "?" : "&").append(k).append('=').append(Forms.url(v));
            }
        }

        String title() {
            return org.lodestep.report.QaText.selectionTitle(lot, part, from, to);
        }
    }

    private void page(Context ctx) throws Exception {
        Filter f = Filter.of(ctx);
        QaLotReport.Result all;
        QaLotReport.Result selected;
        try (RecordStore store = desk.openStore()) {
            all = QaLotReport.run(new RecordQuery(null, null, null, null, null), store, Progress.NONE);
            selected = QaLotReport.run(f.query(), store, Progress.NONE);
        }
        StringBuilder sb = new StringBuilder("<h1>Records</h1>")
                .append("<form method=\"get\" action=\"/records\" class=\"filters\" role=\"search\">")
                .append(field("lot", "Lot", f.lot(), "text")).append(field("part", "Part", f.part(), "text"))
                .append(field("from", "From", f.from(), "date")).append(field("to", "To", f.to(), "date"))
                .append("<button type=\"submit\">Show</button></form>");
        List<String> lots = all.records().stream().map(r -> r.submission().lot()).filter(l -> !l.isEmpty())
                .distinct().toList();
        if (!lots.isEmpty()) {
            sb.append("<nav aria-label=\"Lots\" class=\"lots\"><h2>Lots</h2><ul>");
            for (String lot : lots) {
                sb.append("<li><a href=\"/records?lot=").append(Forms.url(lot)).append("\">")
                        .append(Layout.esc(lot)).append("</a></li>");
            }
            sb.append("</ul></nav>");
        }
        LotStatistics.Counts c = selected.summary().counts();
        sb.append("<section aria-labelledby=\"sel\"><h2 id=\"sel\">").append(Layout.esc(f.title())).append("</h2>");
        if (c.records() == 0) {
            sb.append("<p>No records match.</p></section>");
        } else {
            sb.append("<dl class=\"counts\">")
                    .append(count("Motors", Integer.toString(c.motors())))
                    .append(count("Records", c.records() + (c.retests() > 0 ? " (" + c.retests() + " re-tests)" : "")))
                    .append(count("Passed", Integer.toString(c.passed())))
                    .append(count("Failed", Integer.toString(c.failed())))
                    .append(count("Incomplete", Integer.toString(c.incomplete())))
                    .append(count("First-pass yield", pct(c.firstPassYieldPct())))
                    .append(count("Final yield", pct(c.finalYieldPct())))
                    .append(c.notIntact() > 0 ? count("Records failing their SHA-256", Integer.toString(c.notIntact()))
                            : "")
                    .append("</dl>");
            if (!selected.summary().notPassed().isEmpty()) {
                sb.append("<h3>Not passed (latest record)</h3><ul class=\"notpassed\">");
                for (LotStatistics.NotPassed n : selected.summary().notPassed()) {
                    sb.append("<li>").append(QaPages.badge(n.verdict())).append(' ').append(Layout.esc(n.serial()))
                            .append(": ").append(Layout.esc(String.join(", ", n.checks()))).append("</li>");
                }
                sb.append("</ul>");
            }
            String q = f.queryString();
            sb.append("<p class=\"actions\"><a href=\"/records/report.html").append(Layout.esc(q))
                    .append("\">Lot report (print view)</a> <a href=\"/records/export.csv").append(Layout.esc(q))
                    .append("\" download>Export CSV</a></p>")
                    .append("<iframe class=\"report\" title=\"").append(Layout.esc(f.title()))
                    .append(": capability, control charts and histograms\" src=\"/records/report.html")
                    .append(Layout.esc(q)).append("\"></iframe></section>");
        }
        sb.append("<section aria-labelledby=\"certs\"><h2 id=\"certs\">Certificates</h2><ul class=\"certs\">");
        List<StoredRecord> latest = selected.records();
        java.util.Map<String, StoredRecord> bySerial = new java.util.LinkedHashMap<>();
        for (StoredRecord r : latest) {
            bySerial.put(r.submission().serial() + "\u0000" + r.submission().partNumber(), r);
        }
        for (StoredRecord r : bySerial.values()) {
            sb.append("<li><a href=\"").append(QaPages.certificateLink(r.submission().serial(), r)).append("\">")
                    .append(Layout.esc(r.submission().serial())).append("</a> ")
                    .append(QaPages.badge(r.submission().verdict())).append("</li>");
        }
        sb.append("</ul><form method=\"get\" action=\"/qa/certificate\" class=\"filters\">")
                .append(field("serial", "Serial", null, "text"))
                .append("<button type=\"submit\">Certificate</button></form></section>");
        ctx.html(desk.page("Records", "/records", sb.toString()));
    }

    private static String field(String name, String label, String value, String type) {
        return "<label>" + Layout.esc(label) + " <input type=\"" + type + "\" name=\"" + name + "\" value=\""
                + Layout.esc(value == null ? "" : value) + "\"></label>";
    }

    private static String count(String label, String value) {
        return "<div><dt>" + Layout.esc(label) + "</dt><dd>" + Layout.esc(value) + "</dd></div>";
    }

    private static String pct(double v) {
        return Double.isNaN(v) ? "\u2013" : String.format(Locale.ROOT, "%.1f %%", v);
    }

    private void report(Context ctx) throws Exception {
        Filter f = Filter.of(ctx);
        QaLotReport.Result r;
        try (RecordStore store = desk.openStore()) {
            r = QaLotReport.run(f.query(), store, Progress.NONE);
        }
        ctx.html(org.lodestep.report.ProvenanceBlock.html(QaHtml.lot(f.title(), r.summary()), desk.provenance())
                .html());
    }

    private void export(Context ctx) throws Exception {
        Filter f = Filter.of(ctx);
        QaExport.Result r;
        try (RecordStore store = desk.openStore()) {
            r = QaExport.run(f.query(), store, Progress.NONE);
        }
        StringWriter text = new StringWriter();
        QaCsv.write(r.records(), text);
        ctx.contentType("text/csv; charset=utf-8");
        ctx.header("Content-Disposition", "attachment; filename=\"qa-records.csv\"");
        ctx.result(text.toString());
    }
}
