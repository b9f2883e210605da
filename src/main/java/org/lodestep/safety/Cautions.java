package org.lodestep.safety;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;

/**
 * The cautions as a command or a page words them at the moment of the work: what is about to happen, then the hazards.
 */
public final class Cautions {
    /** Columns of a terminal caution, its continuation lines indented by two. */
    private static final int WIDTH = 110;

    private Cautions() {
    }

    /** The hazards of a motor running its axis (a sweep, a ring-down test, a motion profile), for every such report. */
    public static Hazard[] motion() {
        return new Hazard[] {Hazard.MOVING_AXIS, Hazard.HOT_MOTOR};
    }

    /**
     * The sentences of each hazard in turn, then their deferrals to local codes, each once: one list for a report or
     * a page that names several hazards.
     */
    public static List<String> sentences(Hazard... hazards) {
        List<String> all = new ArrayList<>();
        Set<String> deferrals = new LinkedHashSet<>();
        for (Hazard h : hazards) {
            all.addAll(h.sentences());
            if (h.deferral() != null) {
                deferrals.add(h.deferral());
            }
        }
        all.addAll(deferrals);
        return List.copyOf(all);
    }

    /**
     * The caution a command prints before the rig arms, energises or moves anything: {@code CAUTION - what:} and
     * what is about to happen, then each hazard's sentences, wrapped for a terminal.
     *
     * @param what      a few words naming the action ("insulation test", "conformance run")
     * @param situation what the rig is about to do, as whole sentences
     */
    public static String beforeRigAction(String what, String situation, Hazard... hazards) {
        List<String> words = new ArrayList<>(List.of(("CAUTION - " + what + ": " + situation).split(" ")));
        for (String s : sentences(hazards)) {
            words.addAll(List.of(s.split(" ")));
        }
        StringBuilder text = new StringBuilder();
        StringBuilder line = new StringBuilder();
        for (String w : words) {
            if (line.length() > 0 && line.length() + 1 + w.length() > WIDTH) {
                text.append(line).append(System.lineSeparator());
                line.setLength(0);
                line.append(' ');
            }
            line.append(' ').append(w);
        }
        text.append(line);
        return text.substring(1); // the first line has no indent
    }

    /** The one-line caution printed before checks that include an insulation test. */
    public static String insulationTestLine(double testVoltageV) {
        return String.format(Locale.ROOT, "Caution: the insulation test applies %d V DC. Motor disconnected from any"
                + " driver, hands off leads and frame while the tester runs, windings discharged afterwards; local"
                + " electrical-safety rules take precedence.", Math.round(testVoltageV));
    }

    /**
     * The one-line caution printed with every lead report.
     *
     * @param howToGiveTemperature where the user gives the winding temperature here ("with --ambient-c")
     */
    public static String leadMeasurementLine(String howToGiveTemperature) {
        return "Caution: measure with the motor disconnected from any driver and its shaft still; a warm winding reads"
                + " high (let it cool or give its temperature " + howToGiveTemperature + "). Follow local codes and"
                + " practice.";
    }
}
