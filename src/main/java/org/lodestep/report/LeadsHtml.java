package org.lodestep.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.lodestep.report.html.Cell;
import org.lodestep.report.html.Html;
import org.lodestep.report.html.HtmlReport;
import org.lodestep.report.html.HtmlTable;
import org.lodestep.report.html.Status;
import org.lodestep.safety.Hazard;
import org.lodestep.wiring.DriverWiring;
import org.lodestep.wiring.Finding;
import org.lodestep.wiring.Identification;
import org.lodestep.wiring.ReadingUse;
import org.lodestep.wiring.Severity;
import org.lodestep.wiring.Topology;
import org.lodestep.wiring.Winding;

/**
 * The HTML report of a lead identification: verdict, a wiring diagram for each driver connection, the windings,
 * the findings with what to do next, and every reading used.
 */
public final class LeadsHtml {
    private LeadsHtml() {
    }

    /**
     * Builds the report.
     *
     * @param title  the motor's name or serial (shown as the heading)
     * @param source the file the readings came from, or null
     */
    public static HtmlReport report(String title, String source, Identification id) {
        HtmlReport.Builder b = HtmlReport.builder("Lead identification", title)
                .meta("Layout", id.topology().label() + (id.determined() ? "" : " (not yet certain)"))
                .meta("Leads", id.leads().size() + ": " + String.join(", ", id.leads()))
                .meta("Pairs measured", id.measuredPairs() + " of " + id.totalPairs());
        if (source != null) {
            b.meta("Source", source);
        }
        if (id.temperature() != null) {
            b.meta("Temperature", LeadsTextReport.temperature(id));
        }
        verdict(b, id);
        b.safety(Hazard.ENERGISED_WINDING);

        if (!id.connections().isEmpty()) {
            b.section("How to wire it");
            for (DriverWiring c : id.connections()) {
                b.figure(WiringDiagrams.of(id, c).toSvg(), caption(id, c));
                List<HtmlReport.Finding> notes = new ArrayList<>();
                notes.add(new HtmlReport.Finding(Status.INFO, c.tradeoff()));
                if (!c.note().isEmpty()) {
                    notes.add(new HtmlReport.Finding(c.verified() ? Status.INFO : Status.PROVISIONAL, c.note()));
                }
                b.findings(notes);
            }
        }

        WiringDiagrams.asFound(id).ifPresent(d -> {
            b.section("As found");
            b.figure(d.toSvg(), "The windings as read; the open coil drawn broken.");
        });

        b.section("Windings");
        HtmlTable.Builder t = HtmlTable.builder(null, "Winding", "Ends", "Centre tap", "End to end",
                "Halves", id.temperature() == null ? "At reference"
                        : String.format(Locale.ROOT, "At %.0f \u00B0C", id.temperature().referenceC()));
        List<Winding> ws = id.windings();
        for (int i = 0; i < ws.size(); i++) {
            Winding w = ws.get(i);
            String halves = w.halfResistancesOhm().isEmpty() ? "\u2014"
                    : LeadsTextReport.value(w.halfResistancesOhm().get(0), w.halvesMeasured().get(0)) + " + "
                    + LeadsTextReport.value(w.halfResistancesOhm().get(1), w.halvesMeasured().get(1));
            t.row(Cell.text((w.halfWinding() ? "half-winding " : "winding ") + (i + 1)),
                    Cell.text(w.ends().get(0) + " \u2013 " + w.ends().get(1)),
                    Cell.text(w.tap() == null ? "\u2014" : w.tap()),
                    Cell.number(LeadsTextReport.value(w.resistanceOhm(), w.resistanceMeasured())),
                    Cell.number(halves),
                    Cell.number(id.windingsAtReferenceOhm().isEmpty() ? "\u2014"
                            : LeadsTextReport.ohm(id.windingsAtReferenceOhm().get(i))));
        }
        if (ws.isEmpty()) {
            b.paragraph("No winding was found in the readings.");
        } else {
            b.table(t.build());
        }

        b.section("Findings");
        if (id.findings().isEmpty()) {
            b.findings(List.of(new HtmlReport.Finding(Status.PASS,
                    "None: windings balanced and readings consistent.")));
        } else {
            List<HtmlReport.Finding> fs = new ArrayList<>();
            for (Finding f : id.findings()) {
                fs.add(new HtmlReport.Finding(status(f.severity()), f.code().code() + ": " + f.message()));
            }
            b.findings(fs);
        }
        if (!id.missingPairs().isEmpty()) {
            b.paragraph("Measure next: " + String.join(", ", id.missingPairs().stream().map(Object::toString)
                    .toList()) + ".");
        }

        b.section("Readings used");
        HtmlTable.Builder r = HtmlTable.builder(null, "Pair", "Reading", "Read as");
        for (ReadingUse u : id.readings()) {
            r.row(Cell.text(u.pair().toString()), Cell.number(u.measured() ? LeadsTextReport.ohm(u.resistanceOhm())
                    : "not read"), Cell.text(u.measured() ? u.kind() : u.kind() + ", inferred from the only healthy"
                    + " layout left"));
        }
        b.table(r.build());
        return b.build();
    }

    /**
     * What a probe session shows between readings, as a fragment of a page: the schematic of the first driver
     * connection the readings allow so far (marked provisional until certain), the windings found and the findings.
     */
    public static String soFar(Identification id) {
        StringBuilder sb = new StringBuilder("<section class=\"so-far\" aria-label=\"Identification so far\">");
        sb.append("<h2>So far: ").append(id.topology() == Topology.UNKNOWN ? "layout not known yet"
                : Html.escape(id.topology().label()) + (id.determined() ? "" : " (not yet certain)")).append("</h2>");
        if (!id.connections().isEmpty()) {
            DriverWiring c = id.connections().get(0);
            sb.append("<figure class=\"schematic\">").append(WiringDiagrams.of(id, c).toSvg().markup())
                    .append("<figcaption>").append(Html.escape(caption(id, c))).append("</figcaption></figure>");
        } else if (!id.windings().isEmpty()) {
            sb.append("<figure class=\"schematic\">").append(WiringDiagrams.soFar(id).toSvg().markup())
                    .append("<figcaption>The windings found so far; how to wire them follows once the layout is "
                            + "certain.</figcaption></figure>");
        } else {
            sb.append("<p class=\"schematic none\">No schematic yet: no winding found.</p>");
        }
        sb.append("<ul class=\"windings\">");
        for (Winding w : id.windings()) {
            sb.append("<li>").append(w.halfWinding() ? "half-winding " : "winding ")
                    .append(Html.escape(w.ends().get(0) + " \u2013 " + w.ends().get(1)))
                    .append(w.tap() == null ? "" : ", centre tap " + Html.escape(w.tap())).append(": ")
                    .append(Html.escape(LeadsTextReport.ohm(w.resistanceOhm()))).append("</li>");
        }
        if (id.windings().isEmpty()) {
            sb.append("<li>no winding yet</li>");
        }
        sb.append("</ul><ul class=\"findings\">");
        for (Finding f : id.findings()) {
            Status st = status(f.severity());
            sb.append("<li class=\"").append(st.name().toLowerCase(Locale.ROOT)).append("\"><span aria-hidden=\"true\">")
                    .append(st.symbol()).append("</span> ").append(Html.escape(f.code().code() + ": " + f.message()))
                    .append("</li>");
        }
        return sb.append("</ul></section>").toString();
    }

    /**
     * The verdict of an identification, one rule for every front end: a fault FAILs; an unsettled or unknown layout
     * is a warning; a wiring the tool had to guess (which coils pair, where each starts) is PROVISIONAL; a warning
     * finding makes it a warning; otherwise PASS.
     */
    public static Status status(Identification id) {
        if (id.hasError()) {
            return Status.FAIL;
        }
        if (!id.determined() || id.topology() == Topology.UNKNOWN) {
            return Status.WARN;
        }
        DriverWiring first = id.connections().isEmpty() ? null : id.connections().get(0);
        if (first != null && !first.verified()) {
            return Status.PROVISIONAL;
        }
        return id.findings().stream().anyMatch(f -> f.severity() == Severity.WARNING) ? Status.WARN : Status.PASS;
    }

    private static void verdict(HtmlReport.Builder b, Identification id) {
        DriverWiring first = id.connections().isEmpty() ? null : id.connections().get(0);
        String answer = first == null ? null : LeadsTextReport.wiringLine(first);
        Status st = status(id);
        if (id.hasError()) {
            Finding f = id.findings().get(0);
            b.verdict(Status.FAIL, "Fault found: do not use this motor as it is",
                    answer == null ? null : answer.startsWith("salvage") ? Character.toUpperCase(answer.charAt(0))
                            + answer.substring(1) : "Salvage wiring, " + answer, f.message());
        } else if (!id.determined()) {
            b.verdict(Status.WARN, "Not yet certain", null, id.missingPairs().isEmpty() ? "The readings allow more"
                    + " than one layout." : "Measure " + id.missingPairs().size() + " more pair(s) to settle the layout: "
                    + String.join(", ", id.missingPairs().stream().map(Object::toString).toList()) + ".");
        } else if (id.topology() == Topology.UNKNOWN) {
            b.verdict(Status.WARN, "No two-phase layout fits the readings", null);
        } else {
            boolean warned = id.findings().stream().anyMatch(f -> f.severity() == Severity.WARNING);
            String layout = id.topology().label() + " motor, " + id.windings().size()
                    + (id.topology() == Topology.FIVE_LEAD || id.topology() == Topology.EIGHT_LEAD
                    ? " half-windings" : " windings");
            if (st == Status.PROVISIONAL) {
                // the tool guessed which coils pair and where each starts: usable, but not a pass
                b.verdict(st, layout + ": wiring provisional", answer, (warned
                        ? "See the findings before wiring it. " : "") + first.note());
            } else {
                b.verdict(st, layout, answer, warned ? "See the findings before wiring it." : null);
            }
        }
    }

    private static String caption(Identification id, DriverWiring c) {
        String measured = id.temperature() == null ? "" : String.format(Locale.ROOT, " as measured at %.1f \u00B0C",
                id.temperature().measuredC());
        return String.format(Locale.ROOT, "%s: phase resistance %s%s, inductance \u00D7%s and current rating \u00D7%s"
                        + " of one half-winding%s.", c.name(), LeadsTextReport.ohm(c.phaseResistanceOhm()), measured,
                trim(c.inductanceFactor()), trim(c.currentFactor()), c.verified() ? ""
                        : "; provisional: which coils pair and where each starts are a guess (hollow ? dots)");
    }

    private static String trim(double v) {
        String s = String.format(Locale.ROOT, "%.3f", v).replaceAll("0+$", "");
        return s.endsWith(".") ? s.substring(0, s.length() - 1) : s;
    }

    static Status status(Severity s) {
        return switch (s) {
            case ERROR -> Status.FAIL;
            case WARNING -> Status.WARN;
            case INFO -> Status.INFO;
        };
    }
}
