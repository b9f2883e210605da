package org.lodestep.cli;

import org.lodestep.safety.Cautions;
import org.lodestep.wiring.CopperTemperature;
import org.lodestep.workflow.LeadsSettings;

import picocli.CommandLine.Option;

/** Options shared by {@code leads identify} and {@code leads probe}: temperatures, tolerance, JSON. */
final class LeadsIdentifyOptions {
    /** The caution printed with every lead report on the terminal. */
    static final String CAUTION = Cautions.leadMeasurementLine("with --ambient-c");

    @Option(names = "--ambient-c", paramLabel = "DEG_C",
            description = "Winding temperature when measured, in °C (identify: overrides '# temperature_c=' in the "
                    + "file). Resistances are then also given at the reference temperature.")
    Double ambientC;

    @Option(names = "--reference-c", paramLabel = "DEG_C", defaultValue = "20",
            description = "Reference temperature to correct resistances to, in °C (default: ${DEFAULT-VALUE}).")
    double referenceC;

    @Option(names = "--copper-k", paramLabel = "K", defaultValue = "235",
            description = "Copper constant for the temperature correction: 235 (IEC 60034-1, default) or 234.5 "
                    + "(IEEE usage).")
    String copperK;

    @Option(names = "--imbalance-tolerance", paramLabel = "PERCENT", defaultValue = "10",
            description = "Largest accepted difference between phase (or half-winding) resistances, in percent of "
                    + "their mean (default: ${DEFAULT-VALUE}, common practice).")
    double imbalanceTolerancePercent;

    @Option(names = "--contact-allowance-ohm", paramLabel = "OHMS", defaultValue = "0.3",
            description = "Largest probe contact resistance expected per reading, in ohms (default: ${DEFAULT-VALUE}); "
                    + "differences up to this are not reported as faults.")
    double contactAllowanceOhm;

    @Option(names = "--json", description = "Write JSON instead of text (contract in the README).")
    boolean json;

    /** The settings the leads workflows take; a file's temperature applies where --ambient-c is not given. */
    LeadsSettings settings() {
        CopperTemperature.Constant k = switch (copperK.strip()) {
            case "235" -> CopperTemperature.Constant.IEC_60034_1;
            case "234.5" -> CopperTemperature.Constant.IEEE_234_5;
            default -> throw new UsageException("--copper-k '" + copperK + "': expected 235 (IEC 60034-1) or 234.5"
                    + " (IEEE usage)");
        };
        if (!(imbalanceTolerancePercent > 0 && imbalanceTolerancePercent < 100)) {
            throw new UsageException("--imbalance-tolerance " + imbalanceTolerancePercent
                    + ": expected a percentage between 0 and 100");
        }
        double ambient = ambientC != null ? ambientC : Double.NaN;
        if (ambientC != null && !(Double.isFinite(ambient) && ambient > -k.kC()) || !Double.isFinite(referenceC)
                || referenceC <= -k.kC()) {
            throw new UsageException("temperatures must be above " + (-k.kC()) + " °C");
        }
        if (!(contactAllowanceOhm >= 0 && contactAllowanceOhm < 1e3)) {
            throw new UsageException("--contact-allowance-ohm " + contactAllowanceOhm + ": expected 0 to 1000 ohms");
        }
        return new LeadsSettings(ambient, referenceC, k, imbalanceTolerancePercent / 100, contactAllowanceOhm);
    }
}
