package org.lodestep.capture;

import java.util.Objects;

/**
 * One measured lead pair as read from a file or the command line.
 *
 * @param leadA         first lead label as written
 * @param leadB         second lead label as written
 * @param resistanceOhm the reading converted to ohms, {@code +Infinity} for open circuit
 * @param line          1-based source line, or 0 when the reading did not come from a file
 */
public record LeadPairReading(String leadA, String leadB, double resistanceOhm, int line) {
    public LeadPairReading {
        Objects.requireNonNull(leadA, "leadA");
        Objects.requireNonNull(leadB, "leadB");
        if (leadA.isBlank() || leadB.isBlank()) {
            throw new IllegalArgumentException("lead labels must not be blank");
        }
        if (leadA.equals(leadB)) {
            throw new IllegalArgumentException("a lead cannot be paired with itself: " + leadA);
        }
        if (!(resistanceOhm >= 0) || resistanceOhm == Double.NEGATIVE_INFINITY) {
            throw new IllegalArgumentException("resistance must be >= 0 ohm or +Infinity (open): " + resistanceOhm
                    + " ohm");
        }
        if (line < 0) {
            throw new IllegalArgumentException("line must be >= 0: " + line);
        }
    }

    /** Whether the pair read open circuit. */
    public boolean open() {
        return Double.isInfinite(resistanceOhm);
    }

    /** Whether this reading is of the same two leads as {@code o}, in either order. */
    public boolean samePair(LeadPairReading o) {
        return leadA.equals(o.leadA) && leadB.equals(o.leadB) || leadA.equals(o.leadB) && leadB.equals(o.leadA);
    }
}
