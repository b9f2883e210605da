package org.lodestep.rig;

/**
 * One four-wire resistance reading between two relay positions.
 *
 * @param leadA         first position, 1-based
 * @param leadB         second position, 1-based
 * @param resistanceOhm reading in ohm, or +infinity when over the meter's range (no winding joins the leads)
 */
public record ResistanceReading(int leadA, int leadB, double resistanceOhm) {
    public ResistanceReading {
        if (leadA < 1 || leadB < 1 || leadA == leadB) {
            throw new IllegalArgumentException("leads must be distinct positions from 1, got " + leadA + " and "
                    + leadB);
        }
        if (Double.isNaN(resistanceOhm) || resistanceOhm < 0) {
            throw new IllegalArgumentException("resistance must be >= 0 ohm, got " + resistanceOhm + " ohm");
        }
    }

    /** Whether the meter read over range (an open circuit at this rig's range). */
    public boolean open() {
        return Double.isInfinite(resistanceOhm);
    }
}
