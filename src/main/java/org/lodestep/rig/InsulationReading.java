package org.lodestep.rig;

/**
 * One insulation-resistance reading from a lead to the motor frame.
 *
 * @param lead          relay position, 1-based
 * @param testVolts     DC test voltage applied, V
 * @param seconds       dwell before the reading, s
 * @param resistanceOhm reading in ohm, or +infinity when above the tester's range
 */
public record InsulationReading(int lead, int testVolts, double seconds, double resistanceOhm) {
    public InsulationReading {
        if (lead < 1 || testVolts <= 0 || !(seconds > 0)) {
            throw new IllegalArgumentException("lead, test voltage (V) and dwell (s) must be positive");
        }
        if (Double.isNaN(resistanceOhm) || resistanceOhm < 0) {
            throw new IllegalArgumentException("insulation resistance must be >= 0 ohm, got " + resistanceOhm);
        }
    }
}
