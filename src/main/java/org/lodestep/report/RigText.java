package org.lodestep.report;

import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.lodestep.sample.Channel;
import org.lodestep.wiring.InsulationReading;
import org.lodestep.rig.ResistanceReading;
import org.lodestep.rig.RigCapture;
import org.lodestep.rig.RigInfo;
import org.lodestep.rig.Scenario;

/** Plain-text rendering of rig results: identity, readings and capture summaries. Computes nothing. */
public final class RigText {
    private RigText() {
    }

    /** The rig's identity and capabilities. */
    public static String info(RigInfo i) {
        StringBuilder b = new StringBuilder();
        b.append("rig       ").append(i.rig()).append(" (id ").append(i.id()).append(", firmware ").append(i.firmware())
                .append(", protocol ").append(i.protocolVersion()).append(")\n");
        b.append("address   ").append(i.address()).append('\n');
        b.append("leads     ").append(i.leads()).append(" relay positions");
        if (!i.labels().isEmpty()) {
            b.append(": ");
            for (int k = 0; k < i.labels().size(); k++) {
                b.append(k == 0 ? "" : ", ").append(k + 1).append('=').append(i.labels().get(k));
            }
        }
        b.append('\n');
        b.append("measures  ").append(String.join(", ", i.measures())).append('\n');
        for (Map.Entry<String, String> e : new java.util.TreeMap<>(i.capabilities()).entrySet()) {
            if (!List.of("leads", "labels", "measure").contains(e.getKey())) {
                b.append(String.format(Locale.ROOT, "  %-14s %s%n", e.getKey(), e.getValue()));
            }
        }
        return b.toString();
    }

    /** The bundled scenarios, one line each. */
    public static String scenarios(Map<String, Scenario> all) {
        StringBuilder b = new StringBuilder("Virtual-rig scenarios (use sim:NAME):\n");
        for (Map.Entry<String, Scenario> e : all.entrySet()) {
            Scenario s = e.getValue();
            b.append(String.format(Locale.ROOT, "  %-12s %d leads, %d teeth  %s%n", e.getKey(), s.leads(),
                    s.rotorTeeth(), s.description()));
        }
        return b.toString();
    }

    private static String lead(int k, List<String> labels) {
        return k <= labels.size() ? k + " (" + labels.get(k - 1) + ")" : Integer.toString(k);
    }

    /** A table of four-wire readings; over-range shows as "open". */
    public static String resistances(List<ResistanceReading> readings, List<String> labels) {
        StringBuilder b = new StringBuilder(String.format(Locale.ROOT, "%-16s %-16s %14s%n", "lead", "lead",
                "resistance"));
        for (ResistanceReading r : readings) {
            b.append(String.format(Locale.ROOT, "%-16s %-16s %14s%n", lead(r.leadA(), labels), lead(r.leadB(), labels),
                    r.open() ? "open" : ohm(r.resistanceOhm())));
        }
        return b.toString();
    }

    /** A table of insulation readings. */
    public static String insulation(List<InsulationReading> readings, List<String> labels) {
        StringBuilder b = new StringBuilder(String.format(Locale.ROOT, "%-16s %8s %16s%n", "lead to frame",
                "test V", "insulation"));
        for (InsulationReading r : readings) {
            b.append(String.format(Locale.ROOT, "%-16s %8.0f %16s%n", between(r.label(), labels), r.testVoltageV(),
                    Double.isInfinite(r.resistanceOhm()) ? "above range" : ohm(r.resistanceOhm())));
        }
        return b.toString();
    }

    /** A rig label {@code <position>-frame} with the position's lead label, when the rig named its leads. */
    private static String between(String label, List<String> labels) {
        int dash = label.indexOf('-');
        if (dash > 0 && label.substring(0, dash).chars().allMatch(Character::isDigit)) {
            return lead(Integer.parseInt(label.substring(0, dash)), labels);
        }
        return label;
    }

    /** Ohms with an SI prefix, 4 significant figures. */
    public static String ohm(double v) {
        if (v >= 1e9) {
            return String.format(Locale.ROOT, "%.4g G\u03A9", v / 1e9);
        }
        if (v >= 1e6) {
            return String.format(Locale.ROOT, "%.4g M\u03A9", v / 1e6);
        }
        if (v >= 1e3) {
            return String.format(Locale.ROOT, "%.4g k\u03A9", v / 1e3);
        }
        return String.format(Locale.ROOT, "%.4g \u03A9", v);
    }

    /** What a stream delivered: channels, length, rate, and how the line carried it. */
    public static String capture(RigCapture c) {
        StringBuilder b = new StringBuilder();
        int n = c.signal().length();
        b.append(String.format(Locale.ROOT, "%s: %d frames at %.0f Hz (%.3f s), channels ", c.kind(), n,
                c.signal().sampleRateHz(), n / c.signal().sampleRateHz()));
        for (int i = 0; i < c.signal().channels().size(); i++) {
            Channel ch = c.signal().channels().get(i);
            b.append(i == 0 ? "" : ", ").append(ch.header());
        }
        b.append('\n');
        b.append(String.format(Locale.ROOT, "line: %d bytes received, %.1f %% of them sample payload%n",
                c.wireBytes(), 100.0 * c.sampleBytes() / Math.max(1, c.wireBytes())));
        return b.toString();
    }
}
