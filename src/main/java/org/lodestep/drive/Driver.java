package org.lodestep.drive;

/**
 * The driver and supply.
 *
 * @param mode          chopper or constant-voltage
 * @param supplyV       supply (bus) voltage, V
 * @param phaseCurrentA current setting, peak A per phase (chopper); NaN for a constant-voltage drive
 * @param microsteps    step pulses per full step: 1 is full stepping with two phases on (square-wave currents),
 *                      2 and more are sine-cosine microstepping
 */
public record Driver(DriveMode mode, double supplyV, double phaseCurrentA, int microsteps) {
    public Driver {
        java.util.Objects.requireNonNull(mode, "mode");
        Require.positive(supplyV, "supply voltage", "V");
        if (mode == DriveMode.CHOPPER) {
            Require.positive(phaseCurrentA, "phase current setting", "A");
        } else if (!Double.isNaN(phaseCurrentA)) {
            throw new IllegalArgumentException("a constant-voltage drive has no current setting (got "
                    + phaseCurrentA + " A): its current is what the supply drives through the winding");
        }
        if (microsteps < 1 || microsteps > 256) {
            throw new IllegalArgumentException("microsteps must be 1 to 256 pulses per full step, got " + microsteps);
        }
    }

    /** True for full stepping (square-wave phase currents, two phases on). */
    public boolean fullStep() {
        return microsteps == 1;
    }

    /** The same drive at another supply voltage. */
    public Driver withSupplyV(double v) {
        return new Driver(mode, v, phaseCurrentA, microsteps);
    }

    /** The same drive at another current setting (chopper). */
    public Driver withCurrentA(double a) {
        return new Driver(mode, supplyV, a, microsteps);
    }
}
