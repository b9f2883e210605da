package org.lodestep.wiring;

/**
 * How one measured pair was read by the identification.
 *
 * @param pair          the leads
 * @param resistanceOhm the reading in ohms, {@code +Infinity} when open
 * @param kind          {@code continuity}, {@code open} or {@code leakage}
 */
public record ReadingUse(LeadPair pair, double resistanceOhm, String kind) {
}
