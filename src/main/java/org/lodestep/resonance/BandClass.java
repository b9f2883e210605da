package org.lodestep.resonance;

/** What kind of resonance a band is, judged against the natural frequency f_n. */
public enum BandClass {
    /** Step rate at f_n or a sub-multiple f_n/k: each step re-excites the rotor's ring-down in phase. */
    LOW_SPEED_RESONANCE,
    /** Step rate well above f_n: electromagnetic (mid-band) instability of the motor and drive. */
    MID_BAND_INSTABILITY,
    /** No natural frequency known, or the band fits neither pattern. */
    UNCLASSIFIED
}
