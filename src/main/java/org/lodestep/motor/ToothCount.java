package org.lodestep.motor;

import java.util.List;
import java.util.Objects;

/**
 * How the rotor tooth count was read from a back-EMF capture, and how far it can be trusted.
 *
 * @param cyclesCounted       electrical cycles between the first and last trusted instant, plus the travel through
 *                            slow stretches estimated from the EMF amplitude; net of direction
 * @param cyclesUncertainty   bound on the error of {@code cyclesCounted}, electrical cycles
 * @param revolutions         revolutions the cycles were counted over
 * @param revolutionTolerance bound on the error of {@code revolutions} (a mark lined up by eye), rev
 * @param cyclesPerRevolution {@code cyclesCounted / revolutions}
 * @param lowestTeeth         least tooth count the measurement allows
 * @param highestTeeth        greatest tooth count the measurement allows
 * @param candidates          the whole numbers between them (empty when none)
 * @param teeth               the answer, or null when the evidence does not settle one whole number
 * @param confidence          how the answer was reached
 * @param trustedFraction     share of the moving time during which the electrical angle was read directly
 */
public record ToothCount(double cyclesCounted, double cyclesUncertainty, double revolutions,
                         double revolutionTolerance, double cyclesPerRevolution, double lowestTeeth,
                         double highestTeeth, List<Integer> candidates, Integer teeth, Confidence confidence,
                         double trustedFraction) {
    /** How the tooth count was decided. */
    public enum Confidence {
        /** exactly one whole number fits the measurement */
        EXACT,
        /** several fit, and the one common hybrid count (50, 100, 200) among them was taken */
        COMMON_COUNT,
        /** several fit and none is preferred: no tooth count is given */
        AMBIGUOUS,
        /** no whole number fits: the revolutions or the capture are wrong */
        INCONSISTENT
    }

    public ToothCount {
        Checks.finite(cyclesCounted, "electrical cycles counted", "cycles");
        Checks.nonNegative(cyclesUncertainty, "cycle uncertainty", "cycles");
        Checks.positive(revolutions, "revolutions", "rev");
        Checks.nonNegative(revolutionTolerance, "revolution tolerance", "rev");
        Checks.finite(cyclesPerRevolution, "cycles per revolution", "cycles/rev");
        Checks.finite(lowestTeeth, "lowest tooth count", "teeth");
        Checks.finite(highestTeeth, "highest tooth count", "teeth");
        candidates = List.copyOf(candidates);
        Objects.requireNonNull(confidence, "confidence");
        if (teeth != null && teeth < 1) {
            throw new IllegalArgumentException("rotor teeth must be at least 1, got " + teeth);
        }
        if (!(trustedFraction >= 0 && trustedFraction <= 1)) {
            throw new IllegalArgumentException("trusted fraction must be within 0..1, got " + trustedFraction);
        }
    }
}
