package org.lodestep.workflow;

import java.util.OptionalDouble;

import org.lodestep.wiring.CopperTemperature;
import org.lodestep.wiring.IdentifySettings;

/**
 * How lead identification judges readings, shared by every leads workflow (from readings, through a rig, guided).
 *
 * @param ambientC            winding temperature when measured, °C; NaN to use the file's {@code # temperature_c=}
 *                            (or none)
 * @param referenceC          temperature to correct resistances to, °C
 * @param copper              copper constant of the temperature correction
 * @param imbalanceTolerance  largest accepted phase-resistance difference, a fraction of the mean (0 to 1)
 * @param contactAllowanceOhm largest probe contact resistance expected per reading, Ω
 */
public record LeadsSettings(double ambientC, double referenceC, CopperTemperature.Constant copper,
                            double imbalanceTolerance, double contactAllowanceOhm) {

    /** The defaults of {@link IdentifySettings#DEFAULT}: 20 °C reference, IEC copper, 10 %, 0.3 Ω. */
    public static final LeadsSettings DEFAULT = new LeadsSettings(Double.NaN, IdentifySettings.DEFAULT.referenceC(),
            IdentifySettings.DEFAULT.copper(), IdentifySettings.DEFAULT.imbalanceTolerance(),
            IdentifySettings.DEFAULT.contactAllowanceOhm());

    public LeadsSettings {
        java.util.Objects.requireNonNull(copper, "copper");
        if (Double.isInfinite(ambientC) || ambientC <= -copper.kC()) {
            throw new SettingsException("ambient temperature must be above " + (-copper.kC()) + " °C or NaN "
                    + "(unknown): " + ambientC + " °C");
        }
        if (!Double.isFinite(referenceC) || referenceC <= -copper.kC()) {
            throw new SettingsException("reference temperature must be above " + (-copper.kC()) + " °C: "
                    + referenceC + " °C");
        }
        if (!(imbalanceTolerance > 0 && imbalanceTolerance < 1)) {
            throw new SettingsException("imbalance tolerance must be between 0 and 100 %: "
                    + imbalanceTolerance * 100 + " %");
        }
        if (!(contactAllowanceOhm >= 0 && contactAllowanceOhm < 1e3)) {
            throw new SettingsException("contact allowance must be 0 to 1000 ohm: " + contactAllowanceOhm
                    + " ohm");
        }
    }

    /** Whether a temperature in °C is physical for this copper constant (above −k). */
    public boolean physical(double temperatureC) {
        return Double.isFinite(temperatureC) && temperatureC > -copper.kC();
    }

    /** The identification settings, with {@code fileTemperatureC} used when no ambient temperature is set. */
    IdentifySettings identifySettings(OptionalDouble fileTemperatureC) {
        double ambient = Double.isNaN(ambientC) ? fileTemperatureC.orElse(Double.NaN) : ambientC;
        return new IdentifySettings(imbalanceTolerance, contactAllowanceOhm,
                IdentifySettings.DEFAULT.continuityRatio(), ambient, referenceC, copper);
    }
}
