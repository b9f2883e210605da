package org.lodestep.report;

import java.io.PrintWriter;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.lodestep.wiring.DriverWiring;
import org.lodestep.wiring.Finding;
import org.lodestep.wiring.Identification;
import org.lodestep.wiring.LeadPair;
import org.lodestep.wiring.OpenCoil;
import org.lodestep.wiring.TemperatureCorrection;
import org.lodestep.wiring.Topology;
import org.lodestep.wiring.Winding;

/**
 * Renders a lead identification as text for a technician: topology, an ASCII schematic of windings, taps and labels,
 * findings with what to do next, driver connections, and the pairs still to measure.
 */
public final class LeadsTextReport {
    private LeadsTextReport() {
    }

    /** Full report; {@code title} names the motor or file. */
    public static void write(PrintWriter out, String title, Identification id) {
        out.printf(Locale.ROOT, "%s: %d leads, %d of %d pairs measured%n", title, id.leads().size(),
                id.measuredPairs(), id.totalPairs());
        String answer = answer(id);
        if (answer != null) {
            out.println(answer);
        }
        out.println("Topology: " + id.topology().label()
                + (id.determined() ? describe(id.topology()) : " (not yet certain: more pairs needed)"));
        out.println();
        schematic(out, id);
        if (id.temperature() != null) {
            out.println("  " + temperature(id) + ".");
        }
        findings(out, id.findings(), id.determined());
        connections(out, id.connections());
        if (!id.missingPairs().isEmpty()) {
            out.println();
            out.println("Not yet certain. Measure next: " + pairs(id.missingPairs()));
        }
    }

    /**
     * The line a person acts on: the first driver connection in one line, its status first ("PROVISIONAL" where
     * resistance could not settle the pairing or polarity), or null when there is no connection to give.
     */
    static String answer(Identification id) {
        if (id.connections().isEmpty()) {
            return null;
        }
        DriverWiring c = id.connections().get(0);
        String state = id.hasError() ? "FAULT" : !id.determined() ? "NOT YET CERTAIN"
                : c.verified() ? "WIRING" : "PROVISIONAL";
        return state + ": " + wiringLine(c);
    }

    /** One connection in one line: "bipolar series: A+ = 1, A− = 7, B+ = 3, B− = 6; join 5 + 2, 8 + 4". */
    static String wiringLine(DriverWiring c) {
        return c.name().replace('-', ' ') + ": " + wiringLine(c.terminals(), c.jumpers(), c.insulate());
    }

    /**
     * Terminals, joins and insulated leads in one line, the one way every report writes a wiring:
     * "A+ = 1, A− = 7, B+ = 3, B− = 6; join 5 + 2, 8 + 4; insulate 9".
     */
    static String wiringLine(Map<String, List<String>> terminals, List<List<String>> joins, List<String> insulate) {
        StringBuilder b = new StringBuilder();
        for (Map.Entry<String, List<String>> e : terminals.entrySet()) {
            b.append(b.length() == 0 ? "" : ", ").append(e.getKey().replace("-", "\u2212")).append(" = ")
                    .append(String.join(" + ", e.getValue()));
        }
        if (!joins.isEmpty()) {
            b.append("; join ").append(String.join(", ", joins.stream().map(j -> String.join(" + ", j)).toList()));
        }
        if (!insulate.isEmpty()) {
            b.append("; insulate ").append(String.join(", ", insulate));
        }
        return b.toString();
    }

    /**
     * The temperature line: "measured at 23.0 °C, corrected to 20.0 °C for copper (k = 234.5 °C, IEC 60034-1)", or
     * "measured at 20.0 °C, the reference: no correction needed".
     */
    static String temperature(Identification id) {
        TemperatureCorrection t = id.temperature();
        if (Math.abs(t.measuredC() - t.referenceC()) < 0.05) {
            return String.format(Locale.ROOT, "Measured at %.1f \u00B0C, the reference temperature: no correction"
                    + " needed", t.measuredC());
        }
        return String.format(Locale.ROOT, "Measured at %.1f \u00B0C, corrected to %.1f \u00B0C for copper (k = %s"
                + " \u00B0C, %s)", t.measuredC(), t.referenceC(), num(t.constantC()), t.standard());
    }

    /** A compact summary: one line for the layout, one per finding, the first connection. */
    public static void writeBrief(PrintWriter out, String title, Identification id) {
        StringBuilder b = new StringBuilder();
        for (Winding w : id.windings()) {
            if (b.length() > 0) {
                b.append("; ");
            }
            b.append(w.ends().get(0)).append('-').append(w.ends().get(1));
            if (w.tap() != null) {
                b.append(" tap ").append(w.tap());
            }
            b.append(' ').append(ohm(w.resistanceOhm()));
        }
        out.printf(Locale.ROOT, "%s: %s  %s%n", title, id.topology().label(), b);
        for (Finding f : id.findings()) {
            out.println("  " + f.severity().label().toUpperCase(Locale.ROOT) + " " + f.code().code() + ": "
                    + f.message());
        }
        if (!id.connections().isEmpty()) {
            out.println("  " + answer(id) + (id.connections().get(0).verified() ? ""
                    : "  (pairing and coil starts guessed: back-EMF phasing settles them)"));
        }
        if (!id.missingPairs().isEmpty()) {
            out.println("  measure next: " + pairs(id.missingPairs()));
        }
    }

    private static String describe(Topology t) {
        return switch (t) {
            case FOUR_LEAD -> " (two separate windings)";
            case FIVE_LEAD -> " (four half-windings on one common lead)";
            case SIX_LEAD -> " (two centre-tapped windings)";
            case EIGHT_LEAD -> " (four separate half-windings)";
            case UNKNOWN -> " (no two-phase layout fits the readings)";
        };
    }

    private static void schematic(PrintWriter out, Identification id) {
        List<Winding> ws = id.windings();
        if (ws.isEmpty()) {
            out.println("  (no winding found)");
        }
        boolean common = id.topology() == Topology.FIVE_LEAD && !ws.isEmpty();
        if (common) {
            String com = ws.get(0).ends().get(0);
            String pad = " ".repeat(com.length() + 4);
            for (int i = 0; i < ws.size(); i++) {
                Winding w = ws.get(i);
                String head = i == 0 ? "  " + com + " o" : "  " + pad.substring(2);
                out.printf(Locale.ROOT, "%s%s--[ %s ]--o %s%s%n", head, i == 0 ? "--+" : "  +",
                        value(w.resistanceOhm(), w.resistanceMeasured()), w.ends().get(1), atRef(id, i));
            }
            for (OpenCoil c : id.openCoils()) {
                out.printf(Locale.ROOT, "  %s  +--/ OPEN /--o %s%n", pad.substring(2), String.join(" or ",
                        c.otherEnd()));
            }
            out.println("  " + com + " is the common lead.");
        } else {
            for (int i = 0; i < ws.size(); i++) {
                Winding w = ws.get(i);
                String a = w.ends().get(0);
                String b = w.ends().get(1);
                String label = w.halfWinding() ? "half-winding " : "winding ";
                if (w.tap() == null) {
                    out.printf(Locale.ROOT, "  %-15s %s o--[ %s ]--o %s%s%n", label + (i + 1) + ":", a,
                            value(w.resistanceOhm(), w.resistanceMeasured()), b, atRef(id, i));
                } else {
                    String left = String.format(Locale.ROOT, "  %-15s %s o--[ %s ]--", label + (i + 1) + ":", a,
                            value(w.halfResistancesOhm().get(0), w.halvesMeasured().get(0)));
                    out.printf(Locale.ROOT, "%s+--[ %s ]--o %s   end to end %s%s%n", left,
                            value(w.halfResistancesOhm().get(1), w.halvesMeasured().get(1)), b,
                            value(w.resistanceOhm(), w.resistanceMeasured()), atRef(id, i));
                    out.println(" ".repeat(left.length()) + "|");
                    out.println(" ".repeat(left.length()) + "o " + w.tap() + " (centre tap)");
                }
            }
            for (OpenCoil c : id.openCoils()) {
                // drawn broken: the coil reads open, so it has no value
                String to = c.otherEnd().size() == 1 ? c.otherEnd().get(0)
                        : "tap (" + String.join(" or ", c.otherEnd()) + ")";
                out.printf(Locale.ROOT, "  %-15s %s o--/ OPEN /--o %s%n", "open coil:", c.end(), to);
            }
        }
        measuredAndInferred(out, id);
    }

    /** What was read and what was inferred, under the schematic, when anything was inferred. */
    private static void measuredAndInferred(PrintWriter out, Identification id) {
        List<String> inferredOpen = id.readings().stream().filter(u -> !u.measured())
                .map(u -> u.pair().toString()).toList();
        boolean values = id.windings().stream().anyMatch(w -> !w.resistanceMeasured()
                || w.halvesMeasured().contains(false));
        if (!inferredOpen.isEmpty()) {
            out.println("  Inferred, not read: " + String.join(", ", inferredOpen) + " open (the only healthy "
                    + id.topology().label() + " layout the readings leave has no coil between them).");
        }
        if (values) {
            out.println("  Values marked inferred were not read: they follow from other readings by the series"
                    + " relation; measure that pair to confirm.");
        }
    }

    /** A resistance as the schematic shows it: the value, marked when it was inferred rather than read. */
    static String value(double ohms, boolean measured) {
        return measured ? ohm(ohms) : ohm(ohms) + " inferred";
    }

    private static String atRef(Identification id, int i) {
        if (id.windingsAtReferenceOhm().isEmpty()) {
            return "";
        }
        return String.format(Locale.ROOT, "   (%s at %s °C)", ohm(id.windingsAtReferenceOhm().get(i)),
                num(id.temperature().referenceC()));
    }

    private static void findings(PrintWriter out, List<Finding> findings, boolean determined) {
        out.println();
        if (findings.isEmpty()) {
            out.println(determined ? "Findings: none; windings balanced and readings consistent."
                    : "Findings so far: none.");
            return;
        }
        out.println("Findings:");
        for (Finding f : findings) {
            out.println("  " + f.severity().label().toUpperCase(Locale.ROOT) + " " + f.code().code() + ": "
                    + f.message());
        }
    }

    private static void connections(PrintWriter out, List<DriverWiring> cs) {
        if (cs.isEmpty()) {
            return;
        }
        out.println();
        out.println("Driver connections (factors relative to one half-winding, or to the whole winding of a 4-lead"
                + " motor; current factors are trade convention):");
        for (DriverWiring c : cs) {
            out.printf(Locale.ROOT, "  %s: phase %s, inductance x%s, current rating x%s%s%n", c.name(),
                    ohm(c.phaseResistanceOhm()), num(c.inductanceFactor()), num(c.currentFactor()),
                    c.verified() ? "" : "  [PROVISIONAL]");
            out.println("    " + terminals(c.terminals()));
            for (List<String> j : c.jumpers()) {
                out.println("    join " + String.join(" + ", j) + " (to nothing else)");
            }
            if (!c.insulate().isEmpty()) {
                out.println("    insulate " + String.join(", ", c.insulate()));
            }
            out.println("    " + c.tradeoff());
            if (!c.note().isEmpty()) {
                out.println("    " + c.note());
            }
        }
    }

    private static String terminals(Map<String, List<String>> t) {
        StringBuilder b = new StringBuilder();
        for (Map.Entry<String, List<String>> e : t.entrySet()) {
            if (b.length() > 0) {
                b.append("  ");
            }
            b.append(e.getKey()).append('=').append(String.join("+", e.getValue()));
        }
        return b.toString();
    }

    private static String pairs(List<LeadPair> ps) {
        return String.join(", ", ps.stream().map(LeadPair::toString).toList());
    }

    static String ohm(double v) {
        if (Double.isNaN(v)) {
            return "? Ω";
        }
        if (Double.isInfinite(v)) {
            return "open";
        }
        if (v >= 1e3) {
            return String.format(Locale.ROOT, "%.3g kΩ", v / 1e3);
        }
        return String.format(Locale.ROOT, v < 10 ? "%.2f Ω" : "%.1f Ω", v);
    }

    private static String num(double v) {
        String s = String.format(Locale.ROOT, "%.3f", v);
        s = s.replaceAll("0+$", "");
        return s.endsWith(".") ? s.substring(0, s.length() - 1) : s;
    }
}
