package org.lodestep.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.lodestep.motor.BackEmfTrace;
import org.lodestep.motor.HalfWinding;
import org.lodestep.motor.MotorCard;
import org.lodestep.motor.PhaseCard;
import org.lodestep.motor.StepInput;
import org.lodestep.motor.StepResponseFit;
import org.lodestep.motor.Terminal;
import org.lodestep.motor.Wiring;
import org.lodestep.report.html.Cell;
import org.lodestep.report.html.DriverTerminal;
import org.lodestep.report.html.HtmlReport;
import org.lodestep.report.html.HtmlTable;
import org.lodestep.report.html.Status;
import org.lodestep.report.html.WiringDiagram;
import org.lodestep.safety.Hazard;
import org.lodestep.wiring.Finding;
import org.lodestep.wiring.Severity;

/**
 * The HTML motor card: wiring diagram, the motor's constants at a glance, each phase, the back-EMF of both phases,
 * the step responses overlaid in normalised form with their residuals, findings and what is still unknown.
 */
public final class MotorHtml {
    private MotorHtml() {
    }

    /**
     * A recorded current step response, for drawing under its fit.
     *
     * @param source   file name
     * @param timeS    sample times, s
     * @param currentA current, A
     */
    public record Trace(String source, double[] timeS, double[] currentA) {
    }

    /**
     * Builds the card.
     *
     * @param traces the recorded step responses in the order of {@code card.stepResponses()}; may be shorter (a
     *               fit without its trace is listed but not drawn)
     */
    public static HtmlReport report(String title, MotorCard card, List<Trace> traces) {
        return report(title, card, traces, MotorPhrasing.PLAIN);
    }

    /** As {@link #report(String, MotorCard, List)}, unknowns and findings phrased by {@code phrasing}. */
    public static HtmlReport report(String title, MotorCard card, List<Trace> traces, MotorPhrasing phrasing) {
        return report(title, card, traces, null, phrasing);
    }

    /**
     * As {@link #report(String, MotorCard, List, MotorPhrasing)}, with a few cycles of the back-EMF capture the card
     * used drawn phase against phase ({@code emf} null: not drawn).
     */
    public static HtmlReport report(String title, MotorCard card, List<Trace> traces, BackEmfTrace emf,
                                    MotorPhrasing phrasing) {
        HtmlReport.Builder b = HtmlReport.builder("Motor card", title)
                .meta("Layout", card.topology() + (card.wiring() == null ? "" : ", " + card.connection()))
                .meta("Leads", String.join(", ", card.leads()));
        boolean warn = card.findings().stream().anyMatch(f -> f.severity() == Severity.WARNING);
        if (card.hasError()) {
            Finding f = card.findings().stream().filter(x -> x.severity() == Severity.ERROR).findFirst().orElseThrow();
            b.verdict(Status.FAIL, "Fault found", phrasing.finding(f));
        } else {
            String head = card.stepAngleDeg() == null ? card.topology() + " motor"
                    : String.format(Locale.ROOT, "%s motor, %s\u00B0 step (%d steps/rev)", card.topology(),
                    MotorCardText.num(card.stepAngleDeg(), 4), card.fullStepsPerRevolution());
            // a card measures; it has no spec to pass. Guessed pairing is provisional, a warning finding a warning.
            Status st = MotorCardText.provisional(card) ? Status.PROVISIONAL : warn ? Status.WARN : Status.INFO;
            String wiring = card.wiring() == null ? null : "Wire " + connectionTitle(card.connection()).toLowerCase(
                    Locale.ROOT) + ": " + MotorCardText.wiringLine(card.wiring());
            String key = MotorCardText.keyFigures(card);
            b.verdict(st, head, wiring, (key.isEmpty() ? "" : "Key figures: " + key + ". ")
                    + (card.unknowns().isEmpty() ? "Nothing left unknown."
                    : "Still unknown: " + MotorCardText.unknownNames(card, phrasing) + "; see below."));
        }
        b.safety(Hazard.ENERGISED_WINDING, Hazard.HOT_MOTOR);

        if (card.wiring() != null && !card.phases().isEmpty()) {
            b.section("How to wire it");
            WiringDiagram d = diagram(card);
            if (d != null) {
                b.figure(d.toSvg(), "Driver connection (" + card.connection() + "). Direction: "
                        + card.rotationConvention() + (d.startsKnown() ? "." : "; coil starts not measured (hollow ?"
                        + " rings): a back-EMF capture fixes them."));
            }
        }

        b.section("The card");
        Map<String, String> f = new LinkedHashMap<>();
        // exact, from the tooth count: no zeros of a measurement's precision
        if (card.stepAngleDeg() != null) {
            f.put("Step angle", MotorCardText.num(card.stepAngleDeg(), 4) + "\u00B0");
        }
        if (card.rotorTeeth() != null) {
            f.put("Rotor teeth", String.valueOf(card.rotorTeeth()));
        }
        put(f, "Back-EMF constant Ke", card.keVsPerRad(), "%s V\u00B7s/rad");
        put(f, "Torque constant Kt", card.ktNmPerA(), "%s N\u00B7m/A");
        put(f, "Phase current", card.phaseCurrentA(), "%s A");
        put(f, "Holding torque (est.)", card.holdingTorqueNm(), "%s N\u00B7m");
        if (card.ratedCurrentMinA() != null && card.ratedCurrentMaxA() != null) {
            // an estimate from an assumed copper loss: two figures are all it has
            f.put("Rated current (est.)", MotorCardText.num(card.ratedCurrentMinA(), 2) + "\u2013"
                    + MotorCardText.num(card.ratedCurrentMaxA(), 2) + " A");
        }
        put(f, "Supply", card.supplyV(), "%s V");
        put(f, "Suggested supply", card.suggestedSupplyV(), "%s V");
        put(f, "Full current up to", card.fullCurrentRateFullStepsPerS(), "%s full steps/s");
        put(f, "Natural frequency", card.naturalFrequencyHz(), "%s Hz");
        b.facts(f);
        if (card.phaseCurrentBasis() != null || card.ratedCurrentAssumption() != null
                || card.fullCurrentRateBasis() != null) {
            List<HtmlReport.Finding> basis = new ArrayList<>();
            if (card.phaseCurrentBasis() != null) {
                basis.add(new HtmlReport.Finding(Status.INFO, "Phase current: " + card.phaseCurrentBasis()));
            }
            if (card.ratedCurrentAssumption() != null) {
                basis.add(new HtmlReport.Finding(Status.INFO, "Rated current: " + card.ratedCurrentAssumption()));
            }
            if (card.supplyBasis() != null) {
                basis.add(new HtmlReport.Finding(Status.INFO, "Supply: " + card.supplyBasis()));
            }
            if (card.fullCurrentRateBasis() != null) {
                basis.add(new HtmlReport.Finding(Status.INFO, "Full current: " + card.fullCurrentRateBasis()
                        + "; " + MotorCardText.SINE_DRIVE_LIMIT));
            }
            b.findings(basis);
        }

        if (!card.phases().isEmpty()) {
            b.section("Phases");
            HtmlTable.Builder t = HtmlTable.builder(null, "Phase", "Coils (start \u2192 end)", "R", "L", "L/R",
                    "Ke (V\u00B7s/rad)", "Orientation");
            for (PhaseCard p : card.phases()) {
                t.row(Cell.text(p.name()), Cell.text(String.join(", ", p.halfWindings().stream()
                                .map(h -> h.startLead() + " \u2192 " + h.endLead()).toList())),
                        Cell.number(ohm(p.resistanceOhm())), Cell.number(mh(p.inductanceH())),
                        Cell.number(p.timeConstantS() == null ? "\u2014" : num(p.timeConstantS() * 1e3) + " ms"),
                        Cell.number(p.keVsPerRad() == null ? "\u2014" : num(p.keVsPerRad())),
                        Cell.text(p.polarityKnown() ? "measured" : "arbitrary"));
            }
            b.table(t.build());
        }

        if (emf != null) {
            b.section("Back-EMF");
            b.figure(MotorFigures.backEmf(emf).toSvg(), MotorFigures.backEmfCaption(emf));
        }

        if (!card.stepResponses().isEmpty()) {
            b.section("Current step responses");
            if (!traces.isEmpty()) {
                b.figure(MotorFigures.steps(card.stepResponses(), traces).toSvg(), "Every recorded step response in"
                        + " the form a first-order rise takes: time since the fitted step in fitted time constants,"
                        + " current rise over the fitted final current. Each fit is then the one curve 1 \u2212"
                        + " e^(\u2212t/\u03C4), drawn in black; the lower panel is measured minus fitted, as a"
                        + " fraction of the final current (a first-order rise leaves only noise there).");
            }
            HtmlTable.Builder t = HtmlTable.builder(null, "Leads", "\u03C4", "Final current", "L", "Loop R",
                    "Shape", "RMS residual");
            for (StepInput in : card.stepResponses()) {
                StepResponseFit fit = in.fit();
                t.row(Cell.text(stepName(in)), Cell.number(num(fit.timeConstantS() * 1e3) + " ms"),
                        Cell.number(num(fit.finalCurrentA()) + " A"), Cell.number(mh(fit.inductanceH())),
                        Cell.number(ohm(fit.loopResistanceOhm())),
                        Cell.text(fit.shape().name().toLowerCase(Locale.ROOT).replace('_', ' ')),
                        Cell.number(num(fit.rmsResidualA()) + " A"));
            }
            b.table(t.build());
        }

        b.section("Findings and unknowns");
        List<HtmlReport.Finding> fs = new ArrayList<>();
        for (Finding x : card.findings()) {
            fs.add(new HtmlReport.Finding(switch (x.severity()) {
                case ERROR -> Status.FAIL;
                case WARNING -> Status.WARN;
                case INFO -> Status.INFO;
            }, x.code().code() + ": " + phrasing.finding(x)));
        }
        for (String u : card.unknowns().stream().map(x -> phrasing.unknown(x, card.connection())).toList()) {
            fs.add(new HtmlReport.Finding(Status.WARN, "Unknown: " + u));
        }
        if (fs.isEmpty()) {
            fs.add(new HtmlReport.Finding(Status.PASS, "No findings; nothing left unknown."));
        }
        b.findings(fs);
        return b.build();
    }

    /** Leads of a step response, and the leads joined for it. */
    static String stepName(StepInput in) {
        return "Leads " + in.leads().first() + "\u2013" + in.leads().second()
                + (in.joinedLeads().isEmpty() ? "" : " (" + String.join("+", in.joinedLeads()) + " joined)");
    }

    /** The card's phases and wiring as a diagram; a phase's two coils sharing a lead are one tapped coil. */
    static WiringDiagram diagram(MotorCard card) {
        Wiring w = card.wiring();
        WiringDiagram.Builder d = WiringDiagram.builder(connectionTitle(card.connection()) + ", " + card.topology());
        if (card.phases().stream().anyMatch(p -> !p.polarityKnown())) {
            // no back-EMF fixed which end of each coil starts it: draw the starts as the guess they are
            d.startsUnknown();
        }
        for (PhaseCard p : card.phases()) {
            List<HalfWinding> h = p.halfWindings();
            if (h.size() == 2 && h.get(0).endLead().equals(h.get(1).startLead())) {
                d.coil(p.name(), h.get(0).startLead(), h.get(1).endLead(), h.get(0).endLead());
            } else {
                for (HalfWinding c : h) {
                    d.coil(p.name(), c.startLead(), c.endLead());
                }
            }
        }
        java.util.Set<String> done = new java.util.HashSet<>();
        for (Terminal t : w.terminals()) {
            DriverTerminal dt = DriverTerminal.parse(t.terminal());
            for (String lead : t.leads()) {
                // A tapped 5-lead common may be listed under both phases' COM: one lead, one destination.
                if (done.add(lead)) {
                    d.connect(lead, dt);
                }
            }
        }
        for (List<String> j : w.joinTogether()) {
            d.tie(j.toArray(String[]::new));
        }
        for (String l : w.insulate()) {
            d.insulate(l);
        }
        try {
            return d.build();
        } catch (IllegalArgumentException e) {
            return null; // a lead the card could not place: the text card still lists the wiring
        }
    }

    private static String connectionTitle(String c) {
        return switch (c) {
            case "series" -> "Bipolar series";
            case "parallel" -> "Bipolar parallel";
            case "half" -> "Bipolar half-coil";
            case "unipolar" -> "Unipolar";
            default -> c;
        };
    }

    private static void put(Map<String, String> m, String label, Double v, String format) {
        if (v != null) {
            m.put(label, String.format(Locale.ROOT, format, num(v)));
        }
    }

    private static String ohm(Double v) {
        return v == null ? "\u2014" : num(v) + " \u03A9";
    }

    private static String mh(Double h) {
        return h == null ? "\u2014" : num(h * 1e3) + " mH";
    }

    static String num(double v) {
        if (!Double.isFinite(v)) {
            return "\u2014";
        }
        // about three significant figures: what a bench measurement of R, L or Ke supports
        if (Math.abs(v) >= 1000 && Math.abs(v) < 1e7) {
            return String.format(Locale.ROOT, "%.0f", v);
        }
        return MotorCardText.measured(v, 3); // its zeros kept, as on the text card
    }
}
