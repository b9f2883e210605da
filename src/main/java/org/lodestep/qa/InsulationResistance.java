package org.lodestep.qa;

/**
 * Insulation-resistance test voltage, minimum and temperature correction for small stepper motors.
 *
 * <p>Source: IEEE Std 43-2013, <i>Recommended Practice for Testing Insulation Resistance of Electric Machinery</i>:
 * Table 1 (DC test voltage by winding rated voltage) and clause 6.3 (correction of the reading to 40 °C, with the
 * classic rule that insulation resistance halves for every 10 °C rise). IEEE 43 covers machines of 750 W and more;
 * steppers are fractional-horsepower machines, so it is applied here by analogy. The 100 MΩ default minimum at
 * 500 V DC is a small-motor datasheet habit (common practice, no published source), compared with the raw
 * room-temperature reading; the 40 °C value is kept for trending only, as IEEE 43's own minima assume it.
 */
final class InsulationResistance {

    /** Default minimum insulation resistance, 100 MΩ: small-motor datasheet habit (common practice). */
    static final double DEFAULT_MINIMUM_OHM = 100e6;

    /** IEEE 43 correction base temperature, 40 °C (clause 6.3). */
    static final double BASE_TEMPERATURE_C = 40.0;

    private InsulationResistance() {
    }

    /**
     * DC test voltage for a winding of the given rated voltage: the lower end of the range in IEEE Std 43-2013
     * Table 1 (below 1000 V: 500 V; 1000-2500 V: 500-1000 V; 2501-5000 V: 1000-2500 V; 5001-12000 V: 2500-5000 V;
     * above 12000 V: 5000-10000 V).
     *
     * @param ratedVoltageV winding rated voltage, V, positive
     * @return test voltage, V
     */
    static double testVoltageV(double ratedVoltageV) {
        if (!(ratedVoltageV > 0) || Double.isInfinite(ratedVoltageV)) {
            throw new IllegalArgumentException("rated voltage must be positive, got " + ratedVoltageV + " V");
        }
        if (ratedVoltageV <= 2500) {
            return 500;
        } else if (ratedVoltageV <= 5000) {
            return 1000;
        } else if (ratedVoltageV <= 12000) {
            return 2500;
        }
        return 5000;
    }

    /**
     * The reading corrected to 40 °C: R40 = K_T·R_T with K_T = 0.5^((40 − T)/10) (IEEE 43 clause 6.3, halving
     * per 10 °C). For trending only; the standard now prefers measured curves for each insulation system.
     *
     * @param resistanceOhm reading at the winding temperature, Ω, positive
     * @param windingTemperatureC winding temperature during the test, °C
     * @return the reading referred to 40 °C, Ω
     */
    static double correctedTo40C(double resistanceOhm, double windingTemperatureC) {
        if (!(resistanceOhm > 0) || Double.isInfinite(resistanceOhm)) {
            throw new IllegalArgumentException("insulation resistance must be positive, got " + resistanceOhm + " Ω");
        }
        if (!Double.isFinite(windingTemperatureC)) {
            throw new IllegalArgumentException("winding temperature must be finite, got " + windingTemperatureC + " °C");
        }
        return Math.pow(0.5, (BASE_TEMPERATURE_C - windingTemperatureC) / 10.0) * resistanceOhm;
    }
}
