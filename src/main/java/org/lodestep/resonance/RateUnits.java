package org.lodestep.resonance;

import org.lodestep.motor.StepGeometry;

/**
 * The units a user programs: converts a full-step rate to step pulses/s at the microstep setting, rpm, and axis
 * speed in mm/s when the travel per revolution is known.
 *
 * @param microsteps     step pulses per full step (1 = full stepping, 2 = half step, 16 ...), at least 1
 * @param rotorTeeth     rotor teeth N_r (50 for a 1.8° motor), at least 1
 * @param travelMmPerRev axis travel per motor revolution in mm, or NaN when not given
 */
public record RateUnits(int microsteps, int rotorTeeth, double travelMmPerRev) {
    public RateUnits {
        if (microsteps < 1) {
            throw new IllegalArgumentException("microsteps must be at least 1 pulse per full step, got " + microsteps);
        }
        StepGeometry.fullStepsPerRevolution(rotorTeeth); // rejects a tooth count below 1
        if (!Double.isNaN(travelMmPerRev) && !(travelMmPerRev > 0 && Double.isFinite(travelMmPerRev))) {
            throw new IllegalArgumentException("travel per revolution must be positive, got " + travelMmPerRev + " mm");
        }
    }

    /** Full stepping, 50 rotor teeth (200 steps/rev), no axis travel. */
    public static RateUnits defaults() {
        return new RateUnits(1, 50, Double.NaN);
    }

    public int fullStepsPerRev() {
        return StepGeometry.fullStepsPerRevolution(rotorTeeth);
    }

    public double pulsesPerS(double rateFullStepsPerS) {
        return rateFullStepsPerS * microsteps;
    }

    public double rpm(double rateFullStepsPerS) {
        return rateFullStepsPerS / fullStepsPerRev() * 60.0;
    }

    /** Axis speed in mm/s, or NaN without a travel per revolution. */
    public double mmPerS(double rateFullStepsPerS) {
        return rateFullStepsPerS / fullStepsPerRev() * travelMmPerRev;
    }

    public boolean hasTravel() {
        return !Double.isNaN(travelMmPerRev);
    }

    /** A full-step rate in every unit. */
    public Rate of(double rateFullStepsPerS) {
        return new Rate(rateFullStepsPerS, pulsesPerS(rateFullStepsPerS), rpm(rateFullStepsPerS),
                mmPerS(rateFullStepsPerS));
    }

    /** One rate in the four units; {@code mmPerS} is NaN without a travel per revolution. */
    public record Rate(double fullStepsPerS, double pulsesPerS, double rpm, double mmPerS) {
    }
}
