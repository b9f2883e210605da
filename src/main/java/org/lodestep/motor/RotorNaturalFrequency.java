package org.lodestep.motor;

/**
 * Small-oscillation natural frequency of the rotor and its load about a step position:
 * {@code k = Nr·Th}, {@code fn = (1/2pi)·sqrt(Nr·Th/J)}.
 *
 * <p>Source: Acarnley, <i>Stepping Motors</i>, 4th ed., ch. 4 (rotor dynamics); REFERENCE-CHECKS item 11 (from
 * memory there). The stiffness is the slope at equilibrium of {@code T = -Th·sin(Nr·theta)}. The resonance package
 * is the intended owner of this formula; this is the single call site in {@code motor}, to be switched over when it
 * lands.
 */
final class RotorNaturalFrequency {
    private RotorNaturalFrequency() {
    }

    /** Natural frequency in Hz for peak static torque {@code holdingTorqueNm} and total inertia {@code inertiaKgM2}. */
    static double frequencyHz(int rotorTeeth, double holdingTorqueNm, double inertiaKgM2) {
        return Math.sqrt(rotorTeeth * holdingTorqueNm / inertiaKgM2) / (2.0 * Math.PI);
    }
}
