package org.lodestep.resonance;

/** What kind of resonance a band is, judged against the natural frequency f_n. */
public enum BandClass {
    /** Step rate at f_n or a sub-multiple f_n/k: each step re-excites the rotor's ring-down in phase. */
    LOW_SPEED_RESONANCE,
    /**
     * Vibration at f_n while the step rate is near 2·f_n/k (k odd): the detent (or any torque ripple at the step
     * rate) modulates the stiffness, a Mathieu-type parametric excitation that the rotor answers at half the
     * modulation frequency.
     */
    PARAMETRIC_RESONANCE,
    /** Step rate well above f_n: electromagnetic (mid-band) instability of the motor and drive. */
    MID_BAND_INSTABILITY,
    /** No natural frequency known, or the band fits neither pattern. */
    UNCLASSIFIED
}
