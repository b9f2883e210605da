package org.lodestep.motor;

/**
 * Step geometry of a two-phase hybrid motor: four full steps per rotor-tooth pitch.
 *
 * <p>Source: P. P. Acarnley, <i>Stepping Motors: A Guide to Theory and Practice</i>, 4th ed., IEE 2002, ch. 1-2;
 * D. W. Jones, <i>Stepping Motors</i> tutorial, part 2 "Stepping Motor Physics" (torque-angle period = 4 steps);
 * Acarnley, Stepping Motors, 4th ed., ch. 1-2, references §1. One electrical cycle of the back-EMF is one rotor-tooth
 * pitch, so the rotor tooth count is
 * the number of electrical cycles per mechanical revolution (item 14).
 */
public final class StepGeometry {
    private StepGeometry() {
    }

    /** Full steps per revolution, {@code 4·Nr}. */
    public static int fullStepsPerRevolution(int rotorTeeth) {
        requireTeeth(rotorTeeth);
        return 4 * rotorTeeth;
    }

    /** Full-step angle {@code 360°/(4·Nr)}, in degrees. */
    public static double stepAngleDeg(int rotorTeeth) {
        return 360.0 / fullStepsPerRevolution(rotorTeeth);
    }

    /** Rotor tooth pitch {@code 360°/Nr}, in degrees. */
    public static double toothPitchDeg(int rotorTeeth) {
        requireTeeth(rotorTeeth);
        return 360.0 / rotorTeeth;
    }

    /** Steps per revolution at {@code 1/microsteps} stepping (1 = full step, 2 = half step). */
    public static int stepsPerRevolution(int rotorTeeth, int microsteps) {
        if (microsteps < 1) {
            throw new IllegalArgumentException("microsteps must be at least 1, got " + microsteps);
        }
        return fullStepsPerRevolution(rotorTeeth) * microsteps;
    }

    /** Electrical (phase-current) frequency in Hz at a full-step rate: four full steps per electrical cycle. */
    public static double electricalHz(double rateFullStepsPerS) {
        return rateFullStepsPerS / 4.0;
    }

    /** Electrical cycles per mechanical revolution, not yet rounded: {@code cycles / revolutions}. */
    public static double cyclesPerRevolution(double electricalCycles, double revolutions) {
        if (!(revolutions > 0) || !Double.isFinite(revolutions)) {
            throw new IllegalArgumentException("revolutions must be positive, got " + revolutions);
        }
        return electricalCycles / revolutions;
    }

    static void requireTeeth(int rotorTeeth) {
        if (rotorTeeth < 1) {
            throw new IllegalArgumentException("rotor teeth must be at least 1, got " + rotorTeeth);
        }
    }
}
