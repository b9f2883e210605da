package org.lodestep.rig;

/**
 * The mechanical side of a two-phase hybrid motor and its load.
 *
 * @param inertiaKgM2      rotor plus load inertia, kg·m²
 * @param dampingNmsPerRad viscous damping, N·m·s/rad
 * @param detentTorqueNm   peak detent torque with no current, N·m (period a quarter of the tooth pitch)
 * @param rotorTeeth       rotor teeth N_r (50 for 1.8°, 100 for 0.9°)
 */
public record RotorSettings(double inertiaKgM2, double dampingNmsPerRad, double detentTorqueNm, int rotorTeeth) {
    public RotorSettings {
        if (!(inertiaKgM2 > 0) || !Double.isFinite(inertiaKgM2)) {
            throw new IllegalArgumentException("inertia must be positive, got " + inertiaKgM2 + " kg·m²");
        }
        if (!(dampingNmsPerRad >= 0) || !Double.isFinite(dampingNmsPerRad)) {
            throw new IllegalArgumentException("damping must be zero or positive, got " + dampingNmsPerRad
                    + " N·m·s/rad");
        }
        if (!(detentTorqueNm >= 0) || !Double.isFinite(detentTorqueNm)) {
            throw new IllegalArgumentException("detent torque must be zero or positive, got " + detentTorqueNm
                    + " N·m");
        }
        if (rotorTeeth < 1) {
            throw new IllegalArgumentException("rotor teeth must be at least 1, got " + rotorTeeth);
        }
    }
}
