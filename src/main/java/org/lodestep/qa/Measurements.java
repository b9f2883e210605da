package org.lodestep.qa;

import org.lodestep.wiring.InsulationReading;
import java.util.List;
import java.util.Objects;

/**
 * Everything measured on one motor, as measured (no correction applied), with the captures it came from.
 *
 * @param phaseResistancesOhm    phase (end-to-end winding) resistances, Ω, in phase order A, B, ...
 * @param windingTemperatureC    winding temperature during the resistance reading, °C, or NaN when unknown
 * @param phaseInductancesH      phase inductances, H
 * @param insulation             insulation-resistance readings
 * @param backEmfConstantVsPerRad back-EMF constant, V·s/rad (peak per phase), or NaN when not measured
 * @param stepAngleDeg           full-step angle, degrees, or NaN when not measured
 * @param captures               raw captures the values came from, with their SHA-256
 */
public record Measurements(List<Double> phaseResistancesOhm, double windingTemperatureC, List<Double> phaseInductancesH,
                           List<InsulationReading> insulation, double backEmfConstantVsPerRad, double stepAngleDeg,
                           List<CaptureRef> captures) {
    public Measurements {
        phaseResistancesOhm = List.copyOf(Objects.requireNonNull(phaseResistancesOhm, "phaseResistancesOhm"));
        phaseInductancesH = List.copyOf(Objects.requireNonNull(phaseInductancesH, "phaseInductancesH"));
        insulation = List.copyOf(Objects.requireNonNull(insulation, "insulation"));
        captures = List.copyOf(Objects.requireNonNull(captures, "captures"));
        for (double r : phaseResistancesOhm) {
            if (!(r > 0) || Double.isInfinite(r)) {
                throw new IllegalArgumentException("phase resistance must be positive and finite, got " + r + " Ω");
            }
        }
        for (double l : phaseInductancesH) {
            if (!(l > 0) || Double.isInfinite(l)) {
                throw new IllegalArgumentException("phase inductance must be positive and finite, got " + l + " H");
            }
        }
        if (!Double.isNaN(windingTemperatureC) && !(windingTemperatureC > -60 && windingTemperatureC < 250)) {
            throw new IllegalArgumentException("winding temperature " + windingTemperatureC + " °C is outside -60..250 °C");
        }
        if (!Double.isNaN(backEmfConstantVsPerRad) && !(backEmfConstantVsPerRad > 0 && backEmfConstantVsPerRad < 1e3)) {
            throw new IllegalArgumentException("back-EMF constant must be positive, got " + backEmfConstantVsPerRad
                    + " V·s/rad");
        }
        if (!Double.isNaN(stepAngleDeg) && !(stepAngleDeg > 0 && stepAngleDeg <= 90)) {
            throw new IllegalArgumentException("step angle must be in (0, 90] degrees, got " + stepAngleDeg + " deg");
        }
    }

    /** The same values without the capture list (for keys that hash captures separately). */
    Measurements withoutCaptures() {
        return new Measurements(phaseResistancesOhm, windingTemperatureC, phaseInductancesH, insulation,
                backEmfConstantVsPerRad, stepAngleDeg, List.of());
    }

    /** Nothing measured yet. */
    static Measurements none() {
        return new Measurements(List.of(), Double.NaN, List.of(), List.of(), Double.NaN, Double.NaN, List.of());
    }
}
