package org.lodestep.rig;

import org.lodestep.drive.DriveMode;

/**
 * One phase circuit of a two-phase motor and the drive that feeds it; both phases are taken alike.
 *
 * @param phaseResistanceOhm winding resistance of one phase as connected, plus the drive's sense resistance, ohm
 * @param phaseInductanceH   inductance of one phase as connected, henry
 * @param keVsPerRad         back-EMF constant of one phase (peak volts per rad/s), V·s/rad; also the torque
 *                           constant, N·m/A (power balance e·i = T·ω in SI units)
 * @param supplyV            bridge supply voltage, V (the largest voltage the drive can put across a winding)
 * @param mode               constant-voltage H-bridge or current-regulating chopper
 * @param currentSettingA    the chopper's phase-current setting, A (peak per phase at a full-step position);
 *                           ignored by a constant-voltage drive, whose current is set by supply / resistance
 * @param chopperBandwidthHz bandwidth of the chopper's averaged current loop, Hz (ignored by a constant-voltage drive)
 */
public record DriveSettings(double phaseResistanceOhm, double phaseInductanceH, double keVsPerRad, double supplyV,
                            DriveMode mode, double currentSettingA, double chopperBandwidthHz) {
    /** Chopper current-loop bandwidth when none is stated, Hz: common practice for small stepper drives. */
    public static final double DEFAULT_CHOPPER_BANDWIDTH_HZ = 2000;

    public DriveSettings {
        positive(phaseResistanceOhm, "phase resistance", "ohm");
        positive(phaseInductanceH, "phase inductance", "H");
        positive(keVsPerRad, "back-EMF constant", "V·s/rad");
        positive(supplyV, "supply voltage", "V");
        if (mode == null) {
            throw new IllegalArgumentException("drive mode is missing (constant voltage or chopper)");
        }
        if (mode == DriveMode.CHOPPER) {
            positive(currentSettingA, "chopper current setting", "A");
            positive(chopperBandwidthHz, "chopper bandwidth", "Hz");
        }
    }

    /** A constant-voltage (L/R) drive. */
    public static DriveSettings constantVoltage(double phaseResistanceOhm, double phaseInductanceH,
                                                double keVsPerRad, double supplyV) {
        return new DriveSettings(phaseResistanceOhm, phaseInductanceH, keVsPerRad, supplyV,
                DriveMode.CONSTANT_VOLTAGE, 0, 0);
    }

    /** A chopper drive with the default current-loop bandwidth. */
    public static DriveSettings chopper(double phaseResistanceOhm, double phaseInductanceH, double keVsPerRad,
                                        double supplyV, double currentSettingA) {
        return new DriveSettings(phaseResistanceOhm, phaseInductanceH, keVsPerRad, supplyV, DriveMode.CHOPPER,
                currentSettingA, DEFAULT_CHOPPER_BANDWIDTH_HZ);
    }

    /** Electrical time constant L/R of a phase, s. */
    public double timeConstantS() {
        return phaseInductanceH / phaseResistanceOhm;
    }

    private static void positive(double v, String what, String unit) {
        if (!(v > 0) || !Double.isFinite(v)) {
            throw new IllegalArgumentException(what + " must be positive and finite, got " + v + " " + unit);
        }
    }
}
