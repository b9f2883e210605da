package org.lodestep.qa;

import java.util.Objects;

/**
 * One insulation-resistance reading (1-minute value of a DC insulation tester).
 *
 * @param label          between what it was measured: {@code A-frame}, {@code B-frame}, {@code A-B}
 * @param resistanceOhm  reading, Ω, positive and finite (an over-range display is entered as the range's top value)
 * @param testVoltageV   applied DC test voltage, V, positive
 */
public record InsulationReading(String label, double resistanceOhm, double testVoltageV) {
    public InsulationReading {
        Objects.requireNonNull(label, "label");
        if (!(resistanceOhm > 0) || Double.isInfinite(resistanceOhm)) {
            throw new IllegalArgumentException("insulation resistance " + label + " must be positive and finite, got "
                    + resistanceOhm + " Ω");
        }
        if (!(testVoltageV > 0) || Double.isInfinite(testVoltageV)) {
            throw new IllegalArgumentException("insulation test voltage " + label + " must be positive, got "
                    + testVoltageV + " V");
        }
    }
}
