package org.lodestep.wiring;

import java.util.Objects;

/**
 * One insulation-resistance reading: the 1-minute (or other dwell) value of a DC insulation tester, whether the
 * rig's own tester took it or an inspector read it from a hand-held one. The one type for this reading: {@code rig}
 * and the meter-log reader produce it, {@code qa} judges it, {@code report} renders it.
 *
 * @param label         between what it was measured: {@code A-frame}, {@code B-frame}, {@code A-B}, {@code 3-frame}
 * @param resistanceOhm reading, Ω, 0 or more (0 is a dead short to the frame); {@code +Infinity} above the tester's
 *                      range
 * @param testVoltageV  applied DC test voltage, V, positive
 */
public record InsulationReading(String label, double resistanceOhm, double testVoltageV) {
    public InsulationReading {
        Objects.requireNonNull(label, "label");
        if (Double.isNaN(resistanceOhm) || resistanceOhm < 0) {
            throw new IllegalArgumentException("insulation resistance " + label + " must be 0 Ω or more, got "
                    + resistanceOhm + " Ω");
        }
        if (!(testVoltageV > 0) || Double.isInfinite(testVoltageV)) {
            throw new IllegalArgumentException("insulation test voltage " + label + " must be positive, got "
                    + testVoltageV + " V");
        }
    }

    /** The same reading between other points, named as the caller knows them (a lead label instead of a position). */
    public InsulationReading withLabel(String newLabel) {
        return new InsulationReading(newLabel, resistanceOhm, testVoltageV);
    }
}
