package org.lodestep.resonance;

/**
 * Centre of the mid-band (electromagnetic) instability region of an open-loop hybrid stepper.
 *
 * <p>Source: P. P. Acarnley, <i>Stepping Motors: A Guide to Theory and Practice</i>, 4th ed., IEE 2002, section 5.5
 * "Instability": instability lies near the step rates where the phase-excitation angular frequency equals R/L.
 * With four full steps per electrical cycle the full-step rate there is 4·(R/L)/(2π). This is the centre of a
 * region whose width depends on the load and the drive, not a sharp limit.
 */
final class MidBandInstability {
    private MidBandInstability() {
    }

    /** Full-step rate where the electrical angular frequency equals R/L, in full steps/s. */
    public static double centreFullStepsPerS(double phaseResistanceOhm, double phaseInductanceH) {
        Require.positive(phaseResistanceOhm, "phase resistance", "ohm");
        Require.positive(phaseInductanceH, "phase inductance", "H");
        double electricalHz = phaseResistanceOhm / phaseInductanceH / (2 * Math.PI);
        return 4 * electricalHz;
    }
}
