package org.lodestep.report;

import java.util.List;
import java.util.Locale;

import org.lodestep.motor.BackEmfResult;
import org.lodestep.wiring.Finding;
import org.lodestep.motor.HalfWinding;
import org.lodestep.motor.MotorCard;
import org.lodestep.motor.PhaseCard;
import org.lodestep.motor.StepInput;
import org.lodestep.motor.StepResponseFit;
import org.lodestep.motor.Terminal;
import org.lodestep.motor.Wiring;

/** Renders a {@link MotorCard} as a plain-text card for the bench; computes nothing. */
public final class MotorCardText {
    /** Where the full-current limit of a microstepping drive comes from: the card's rate is for full stepping. */
    static final String SINE_DRIVE_LIMIT = "for a microstepping drive's sine currents, 'lodestep drive curve --card' "
            + "gives the steady-state limit";

    private MotorCardText() {
    }

    /** The whole card, lines ending in {@code \n}. */
    public static String render(MotorCard card) {
        return render(card, MotorPhrasing.PLAIN);
    }

    /** The card as text, unknowns and findings phrased by {@code phrasing}. */
    public static String render(MotorCard card, MotorPhrasing phrasing) {
        StringBuilder b = new StringBuilder();
        b.append("MOTOR CARD  ").append(card.topology()).append(" motor");
        if (card.wiring() != null) {
            b.append(", ").append(connectionName(card.connection()));
        }
        b.append('\n');
        // the answer first: how to wire it, its key figures, and what is still unknown, by name
        if (card.wiring() != null) {
            b.append(provisional(card) ? "PROVISIONAL: " : "Wire: ").append(wiringLine(card.wiring())).append('\n');
        }
        String key = keyFigures(card);
        if (!key.isEmpty()) {
            b.append("Key figures: ").append(key).append('\n');
        }
        if (!card.unknowns().isEmpty()) {
            b.append("Unknown: ").append(unknownNames(card, phrasing)).append('\n');
        }
        b.append("Leads: ").append(String.join(" ", card.leads())).append("\n\n");

        b.append("Wiring\n");
        Wiring w = card.wiring();
        if (w == null) {
            b.append("  not yet known (see Unknown below)\n");
        } else {
            for (Terminal t : w.terminals()) {
                b.append(String.format("  %-6s <- lead%s %s%n", t.terminal(), t.leads().size() > 1 ? "s" : "",
                        String.join(" + ", t.leads())));
            }
            for (List<String> j : w.joinTogether()) {
                b.append("  join   ").append(String.join(" + ", j)).append(" together (not to the driver); insulate "
                        + "the joint\n");
            }
            for (String l : w.insulate()) {
                b.append("  leave  ").append(l).append(" unconnected; insulate it\n");
            }
        }
        b.append("  Direction: ").append(card.rotationConvention()).append("\n\n");

        if (!card.phases().isEmpty()) {
            b.append("Phases\n");
            for (PhaseCard p : card.phases()) {
                b.append("  ").append(p.name()).append(": ");
                List<String> coils = p.halfWindings().stream().map(h -> h.startLead() + "->" + h.endLead()).toList();
                b.append(String.join(", ", coils)).append(p.polarityKnown() ? "  (start->end measured)"
                        : "  (orientation arbitrary)").append('\n');
                for (HalfWinding h : p.halfWindings()) {
                    b.append(String.format("     coil %s->%s: %s, %s, Ke %s%n", h.startLead(), h.endLead(),
                            ohm(h.resistanceOhm()), henry(h.inductanceH()), ke(h.keVsPerRad())));
                }
                b.append(String.format("     phase as wired: %s, %s, tau %s, Ke %s%s%n", ohm(p.resistanceOhm()),
                        henry(p.inductanceH()), ms(p.timeConstantS()), ke(p.keVsPerRad()),
                        p.couplingFactor() == null ? "" : String.format(Locale.ROOT, ", coupling %.3f",
                                p.couplingFactor())));
            }
            b.append('\n');
        }

        b.append("Step angle\n");
        if (card.rotorTeeth() == null) {
            b.append("  unknown\n\n");
        } else {
            b.append(String.format(Locale.ROOT, "  %s° full step, %d full steps/rev, %d rotor teeth%n%n",
                    num(card.stepAngleDeg(), 4), card.fullStepsPerRevolution(), card.rotorTeeth()));
        }

        b.append("Constants and drive\n");
        int before = b.length();
        if (card.keVsPerRad() != null) {
            b.append(String.format(Locale.ROOT, "  Ke per half-winding   %s V·s/rad peak (%s V/krpm); a full phase in "
                    + "series has twice this%n", measured(card.keVsPerRad(), 3), measured(card.keVPerKrpm(), 3)));
        }
        if (card.ktNmPerA() != null) {
            b.append(String.format(Locale.ROOT, "  Kt, phase as wired     %s N·m/A (= Ke in SI units)%n",
                    measured(card.ktNmPerA(), 3)));
        }
        if (card.phaseCurrentA() != null) {
            b.append(String.format(Locale.ROOT, "  phase current          %s A (%s)%n", num(card.phaseCurrentA(), 3),
                    card.phaseCurrentBasis()));
        }
        if (card.holdingTorqueNm() != null) {
            b.append(String.format(Locale.ROOT, "  peak torque estimate   %s N·m at that current (ideal: no detent, no "
                    + "saturation)%n", num(card.holdingTorqueNm(), 3)));
        }
        if (card.ratedCurrentMinA() != null) {
            b.append(String.format(Locale.ROOT, "  rated current estimate %s to %s A per phase as wired, assuming %s%n",
                    num(card.ratedCurrentMinA(), 2), num(card.ratedCurrentMaxA(), 2), card.ratedCurrentAssumption()));
        }
        if (card.suggestedSupplyV() != null) {
            b.append(String.format(Locale.ROOT, "  supply suggestion      %s V (common practice: 32·sqrt(L in mH); "
                    + "stay within the driver's rating)%n", num(card.suggestedSupplyV(), 3)));
        }
        if (card.fullCurrentRateFullStepsPerS() != null) {
            double rate = card.fullCurrentRateFullStepsPerS();
            String revs = card.fullCurrentRateRevPerS() == null ? ""
                    : String.format(Locale.ROOT, " = %s rev/s", num(card.fullCurrentRateRevPerS(), 3));
            b.append(String.format(Locale.ROOT, "  full current up to     %s full steps/s%s at %s V (%s)%n"
                    + "                         %s; %s%n", num(rate, 4), revs, num(card.supplyV(), 3),
                    card.supplyBasis(), card.fullCurrentRateBasis(), SINE_DRIVE_LIMIT));
        }
        if (card.naturalFrequencyHz() != null) {
            b.append(String.format(Locale.ROOT, "  natural frequency      %s Hz with %s kg·m² (full-step resonance near "
                    + "%s full steps/s)%n", num(card.naturalFrequencyHz(), 4), String.format(Locale.ROOT, "%.3g", card.inertiaKgM2()),
                    num(card.naturalFrequencyHz(), 4)));
        }
        if (b.length() == before) {
            b.append("  nothing known yet\n");
        }
        b.append('\n');

        BackEmfResult e = card.backEmf();
        if (e != null) {
            b.append("Measurements\n");
            b.append(String.format(Locale.ROOT, "  back-EMF: %s electrical cycles%s, %s s turning, electrical "
                    + "frequency %s to %s Hz (mean %s Hz)%n", num(e.electricalCycles(), 4),
                    e.revolutions() == null ? "" : String.format(Locale.ROOT, " in %s revolutions (%s)",
                            num(e.revolutions(), 3), e.revolutionSource().name().toLowerCase(Locale.ROOT)
                                    .replace('_', ' ')),
                    num(e.movingDurationS(), 3), num(e.minElectricalFrequencyHz(), 3),
                    num(e.maxElectricalFrequencyHz(), 3), num(e.meanElectricalFrequencyHz(), 3)));
            if (e.quadratureLagDeg() != null) {
                b.append(String.format(Locale.ROOT, "  phase B lags phase A by %s° electrical%n",
                        num(e.quadratureLagDeg(), 3)));
            }
        }
        for (StepInput s : card.stepResponses()) {
            StepResponseFit f = s.fit();
            b.append(String.format(Locale.ROOT, "  step response %s%s: tau %s, final %s A, L %s, %s, residual %s A "
                    + "RMS, %s%n", s.leads(), s.joinedLeads().isEmpty() ? ""
                            : " (" + String.join("+", s.joinedLeads()) + " joined)",
                    ms(f.timeConstantS()), num(f.finalCurrentA(), 4), henry(f.inductanceH()),
                    ohm(f.windingResistanceOhm()), num(f.rmsResidualA(), 2),
                    f.shape().name().toLowerCase(Locale.ROOT).replace('_', ' ')));
        }
        if (e != null || !card.stepResponses().isEmpty()) {
            b.append('\n');
        }

        if (!card.unknowns().isEmpty()) {
            b.append("Unknown\n");
            card.unknowns().forEach(u -> b.append("  - ").append(phrasing.unknown(u, card.connection())).append('\n'));
            b.append('\n');
        }
        if (!card.findings().isEmpty()) {
            b.append("Findings\n");
            for (Finding f : card.findings()) {
                b.append(String.format("  %-7s %s%n", f.severity(), phrasing.finding(f)));
            }
        }
        return b.toString();
    }

    private static String connectionName(String c) {
        return switch (c) {
            case "series" -> "bipolar series";
            case "parallel" -> "bipolar parallel";
            case "half" -> "bipolar, half winding";
            default -> c;
        };
    }

    /** {@link #measured} without trailing zeros: for exact values (a step angle) and estimates (a rated current). */
    static String num(Double v, int significant) {
        String m = measured(v, significant);
        return m.contains(".") ? new java.math.BigDecimal(m).stripTrailingZeros().toPlainString() : m;
    }

    /**
     * A measured value to {@code significant} figures with the zeros the rounding leaves: a Ke read as 0.0900 is not
     * 0.09, which claims one figure. {@link #num} strips them, right for exact values such as a step angle of 1.8°.
     */
    static String measured(Double v, int significant) {
        if (v == null || !Double.isFinite(v)) {
            return "?";
        }
        if (v == 0) {
            return "0";
        }
        java.math.BigDecimal d = new java.math.BigDecimal(v).round(new java.math.MathContext(significant));
        if (d.precision() < significant) {
            d = d.setScale(d.scale() + significant - d.precision());
        }
        return d.toPlainString();
    }

    private static String ohm(Double v) {
        return v == null ? "R ?" : measured(v, 3) + " \u03A9";
    }

    /** True when the card's wiring rests on a guess of which coils pair (5- and 8-lead without back-EMF). */
    static boolean provisional(MotorCard card) {
        return card.unknowns().stream().anyMatch(u -> u.what() == org.lodestep.motor.Unknown.What.PHASES_OF_EIGHT_LEAD
                || u.what() == org.lodestep.motor.Unknown.What.PHASES_OF_FIVE_LEAD);
    }

    /** The wiring in one line: "A+ = 1, A− = 4, B+ = 5, B− = 8; join 7 + 6, 2 + 3". */
    static String wiringLine(Wiring w) {
        java.util.Map<String, List<String>> terminals = new java.util.LinkedHashMap<>();
        for (Terminal t : w.terminals()) {
            terminals.put(t.terminal(), t.leads());
        }
        return LeadsTextReport.wiringLine(terminals, w.joinTogether(), w.insulate());
    }

    /** The figures a person sets a driver by: phase R and L as wired, Ke, the rated-current range; known ones only. */
    static String keyFigures(MotorCard card) {
        List<String> parts = new java.util.ArrayList<>();
        if (!card.phases().isEmpty()) {
            PhaseCard p = card.phases().get(0);
            if (p.resistanceOhm() != null) {
                parts.add("phase " + ohm(p.resistanceOhm()) + (p.inductanceH() == null ? "" : ", " + henry(p.inductanceH())));
            }
        }
        if (card.keVsPerRad() != null) {
            parts.add("Ke " + ke(card.keVsPerRad()));
        }
        if (card.ratedCurrentMinA() != null && card.ratedCurrentMaxA() != null) {
            parts.add("rated current about " + num(card.ratedCurrentMinA(), 2) + "\u2013" + num(card.ratedCurrentMaxA(), 2)
                    + " A (estimate)");
        }
        if (card.stepAngleDeg() != null) {
            parts.add(num(card.stepAngleDeg(), 3) + "\u00B0 step");
        }
        return String.join("; ", parts);
    }

    /** The unknowns by name, joined: "coupling of phase B (the other phase's used); step angle". */
    static String unknownNames(MotorCard card, MotorPhrasing phrasing) {
        return String.join("; ", card.unknowns().stream().map(phrasing::name).toList());
    }

    private static String henry(Double v) {
        return v == null ? "L ?" : measured(v * 1e3, 3) + " mH";
    }

    private static String ms(Double v) {
        return v == null ? "?" : measured(v * 1e3, 3) + " ms";
    }

    private static String ke(Double v) {
        return v == null ? "?" : measured(v, 3) + " V·s/rad";
    }
}
