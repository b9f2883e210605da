package org.lodestep.motor;

/**
 * First-order RL circuit driven by a voltage step: {@code i(t) = (V/R)(1 - e^(-t/tau))}, {@code tau = L/R}.
 *
 * <p>Source: C. K. Alexander, M. N. O. Sadiku, <i>Fundamentals of Electric Circuits</i>, chapter on first-order
 * circuits (step response of an RL circuit); REFERENCE-CHECKS item 10. {@code R} is the whole loop resistance
 * (winding plus sense resistor plus source).
 */
public final class RlStep {
    private RlStep() {
    }

    /** Current at time {@code timeS} after the step, in A, for a loop of {@code loopResistanceOhm} and {@code inductanceH}. */
    public static double currentA(double supplyV, double loopResistanceOhm, double inductanceH, double timeS) {
        if (timeS <= 0) {
            return 0.0;
        }
        return supplyV / loopResistanceOhm * (1.0 - Math.exp(-timeS / timeConstantS(inductanceH, loopResistanceOhm)));
    }

    /**
     * Rise of the same circuit written with its final current {@code I∞ = V/R} and time constant:
     * {@code I∞·(1 - e^(-t/tau))}, in A, zero before the step. This is the form a fit estimates.
     */
    public static double riseA(double finalCurrentA, double timeConstantS, double timeS) {
        return timeS > 0 ? finalCurrentA * -Math.expm1(-timeS / timeConstantS) : 0.0;
    }

    /** Electrical time constant {@code tau = L/R}, in s. */
    public static double timeConstantS(double inductanceH, double resistanceOhm) {
        return inductanceH / resistanceOhm;
    }

    /** Inductance {@code L = tau·R}, in H. */
    public static double inductanceH(double timeConstantS, double resistanceOhm) {
        return timeConstantS * resistanceOhm;
    }

    /**
     * Time for the current to swing from {@code fromA} towards {@code v/R} and reach {@code toA}, in s: the solution of
     * the same first-order equation with a non-zero initial current, {@code t = tau·ln((V - R·i0)/(V - R·i1))}.
     * Infinite when {@code toA} is at or beyond the final current {@code V/R}.
     */
    public static double timeToReachS(double supplyV, double loopResistanceOhm, double inductanceH,
                                      double fromA, double toA) {
        double tau = timeConstantS(inductanceH, loopResistanceOhm);
        double num = supplyV - loopResistanceOhm * fromA;
        double den = supplyV - loopResistanceOhm * toA;
        if (den <= 0) {
            return Double.POSITIVE_INFINITY;
        }
        return tau * Math.log(num / den);
    }
}
