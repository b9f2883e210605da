package org.lodestep.wiring;

/**
 * How one measured pair was read by the identification.
 *
 * @param pair          the leads
 * @param resistanceOhm the reading in ohms, {@code +Infinity} when open
 * @param kind          {@code continuity}, {@code open}, {@code leakage} or {@code suspect}
 * @param measured      true for a reading, false for a pair inferred from the only healthy layout left
 */
public record ReadingUse(LeadPair pair, double resistanceOhm, String kind, boolean measured) {
}
