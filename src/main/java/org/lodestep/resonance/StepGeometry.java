package org.lodestep.resonance;

/**
 * Full steps per revolution and electrical frequency of a two-phase hybrid motor from its rotor teeth.
 *
 * <p>Source: P. P. Acarnley, <i>Stepping Motors: A Guide to Theory and Practice</i>, 4th ed., IEE 2002, ch. 1-2:
 * a two-phase hybrid advances four full steps per rotor-tooth pitch, so steps/rev = 4·N_r (50 teeth: 200 steps,
 * 1.8°); one electrical cycle per tooth pitch, so the full-step rate is four times the electrical frequency.
 */
public final class StepGeometry {
    private StepGeometry() {
    }

    /** Full steps per revolution, 4·N_r. */
    public static int fullStepsPerRev(int rotorTeeth) {
        requireTeeth(rotorTeeth);
        return 4 * rotorTeeth;
    }

    /** Electrical (phase-current) frequency in Hz at a full-step rate: rate / 4. */
    public static double electricalHz(double rateFullStepsPerS) {
        return rateFullStepsPerS / 4.0;
    }

    static void requireTeeth(int rotorTeeth) {
        if (rotorTeeth < 1) {
            throw new IllegalArgumentException("rotor teeth must be at least 1, got " + rotorTeeth);
        }
    }
}
