package org.lodestep.resonance;

import java.util.List;

/**
 * The rates to avoid for one motor and load, with the settings they were computed for: the document written by
 * {@code --avoid-list}.
 *
 * @param format             always {@value #FORMAT}
 * @param version            format version, {@value #VERSION}
 * @param microsteps         step pulses per full step the pulse figures assume
 * @param rotorTeeth         rotor teeth N_r
 * @param fullStepsPerRev    4·N_r
 * @param travelMmPerRev     axis travel per revolution, mm (NaN when not given)
 * @param naturalFrequencyHz natural frequency used, Hz (NaN when unknown)
 * @param crossingPeriods    oscillation periods allowed for crossing a band
 * @param margin             fraction each band was widened by on both sides
 * @param dampingRatio       damping ratio if known (NaN otherwise)
 * @param ranges             ranges to avoid, by increasing rate
 * @param notes              general advice
 */
public record AvoidList(String format, int version, int microsteps, int rotorTeeth, int fullStepsPerRev,
                        double travelMmPerRev, double naturalFrequencyHz, double crossingPeriods, double margin,
                        double dampingRatio, List<AvoidRange> ranges, List<String> notes) {
    public static final String FORMAT = "lodestep-avoid-list";
    public static final int VERSION = 1;

    public AvoidList {
        ranges = List.copyOf(ranges);
        notes = List.copyOf(notes);
    }
}
