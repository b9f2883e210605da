package org.lodestep.drive;

/**
 * What the motor drives, referred to its shaft.
 *
 * @param inertiaKgM2     load inertia reflected to the motor shaft (couplings, pulleys, screw, carriage), kg·m²
 * @param frictionTorqueNm friction torque at the motor shaft, N·m (opposes motion either way)
 * @param gravityForceN   force of gravity along the axis (vertical axes), N; needs a travel per revolution
 * @param travelMmPerRev  axis travel per motor revolution, mm; NaN for a rotary load
 */
public record Load(double inertiaKgM2, double frictionTorqueNm, double gravityForceN, double travelMmPerRev) {
    public Load {
        Require.nonNegative(inertiaKgM2, "load inertia", "kg·m²");
        Require.nonNegative(frictionTorqueNm, "friction torque", "N·m");
        Require.nonNegative(gravityForceN, "gravity force", "N");
        if (!Double.isNaN(travelMmPerRev)) {
            Require.positive(travelMmPerRev, "travel per revolution", "mm");
        } else if (gravityForceN > 0) {
            throw new IllegalArgumentException("a gravity force needs the travel per revolution (mm) to become a"
                    + " torque");
        }
    }

    /** No load at all. */
    public static Load none() {
        return new Load(0, 0, 0, Double.NaN);
    }

    /**
     * Inertia of a linearly moving mass reflected to the shaft, kg·m²: {@code m·(p/2π)²} with p the travel per
     * revolution in metres (energy balance, any mechanics text).
     */
    public static double massInertiaKgM2(double massKg, double travelMmPerRev) {
        Require.nonNegative(massKg, "moving mass", "kg");
        Require.positive(travelMmPerRev, "travel per revolution", "mm");
        double r = travelMmPerRev / 1000 / (2 * Math.PI);
        return massKg * r * r;
    }

    /** Torque the load needs at constant speed, N·m: friction plus {@code F·p/2π} for gravity. */
    public double steadyTorqueNm() {
        double g = gravityForceN > 0 ? gravityForceN * travelMmPerRev / 1000 / (2 * Math.PI) : 0;
        return frictionTorqueNm + g;
    }

    /** True when an axis travel is known (mm/s figures). */
    public boolean hasTravel() {
        return !Double.isNaN(travelMmPerRev);
    }
}
