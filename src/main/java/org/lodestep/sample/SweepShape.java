package org.lodestep.sample;

import java.util.Locale;

/**
 * How the commanded step rate of a sweep moves from its start to its end rate: linearly or logarithmically
 * (exponentially in time).
 *
 * <p>One type for one concept: {@code capture} records it with a capture ({@code capture.SweepProfile}), the rig
 * commands it, and {@code resonance} analyses by it ({@code resonance.SweepLaw}). It lives in this leaf package
 * because a sweep's shape describes how the samples were taken, and {@code capture} and {@code resonance} may both
 * depend on {@code sample} but not on each other; the rate formula itself stays with the analysis in
 * {@code resonance.SweepLaw}.
 */
public enum SweepShape {
    LINEAR, LOG;

    /** The word used in files and on the command line: {@code linear} or {@code log}. */
    public String word() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** The shape a word names, case and surrounding blanks ignored; null when it names none. */
    public static SweepShape ofWord(String word) {
        if (word == null) {
            return null;
        }
        for (SweepShape s : values()) {
            if (s.word().equals(word.strip().toLowerCase(Locale.ROOT))) {
                return s;
            }
        }
        return null;
    }
}
