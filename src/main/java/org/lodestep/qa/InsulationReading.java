package org.lodestep.qa;

import java.util.Objects;

/**
 * One insulation-resistance reading (1-minute value of a DC insulation tester).
 *
 * @param label          between what it was measured: {@code A-frame}, {@code B-frame}, {@code A-B}
 * @param resistanceOhm  reading, Ω, positive; {@code +Infinity} when above the tester's range
 * @param testVoltageV   applied DC test voltage, V, positive
 */
public record InsulationReading(String label, double resistanceOhm, double testVoltageV) {
    public InsulationReading {
        Objects.requireNonNull(label, "label");
        if (!(resistanceOhm > 0)) {
            throw new IllegalArgumentException("insulation resistance " + label + " must be positive, got "
                    + resistanceOhm + " Ω");
        }
        if (!(testVoltageV > 0) || Double.isInfinite(testVoltageV)) {
            throw new IllegalArgumentException("insulation test voltage " + label + " must be positive, got "
                    + testVoltageV + " V");
        }
    }
}
