package org.lodestep.capture;

import java.util.List;

/**
 * The rate ranges of an avoid-list JSON (written by {@code resonance sweep --avoid-list}).
 *
 * @param source     file name
 * @param microsteps pulses per full step the list's pulse figures assume
 * @param rotorTeeth rotor teeth the list assumes
 * @param ranges     the ranges, as in the file
 */
public record AvoidListFile(String source, int microsteps, int rotorTeeth, List<Range> ranges) {
    public AvoidListFile {
        ranges = List.copyOf(ranges);
    }

    /**
     * One range.
     *
     * @param line                          line of the range in the file
     * @param fromFullStepsPerS             lower edge, full steps/s
     * @param toFullStepsPerS               upper edge, full steps/s
     * @param minAccelerationFullStepsPerS2 least crossing acceleration, full steps/s²; NaN when the list has none
     * @param bandClass                     the class word of the list, or null
     */
    public record Range(int line, double fromFullStepsPerS, double toFullStepsPerS,
                        double minAccelerationFullStepsPerS2, String bandClass) {
    }
}
