package org.lodestep.motor;

/**
 * The full-step rate up to which a constant-voltage supply still drives the set phase current against the motor's
 * back-EMF.
 *
 * <p>Model: the phase is R and L in series with a back-EMF source of peak {@code E = Ke·ω} (Acarnley,
 * <i>Stepping Motors</i>, 4th ed., the hybrid-motor equivalent circuit, from memory); during a current reversal the
 * winding is left {@code V − E}, taken at its worst (the peak EMF throughout), so the first-order RL response
 * (Alexander and Sadiku, <i>Fundamentals of Electric Circuits</i>, first-order circuits) reverses {@code −I → +I} in
 * {@code t = τ·ln((V − E + R·I)/(V − E − R·I))}. In full stepping a phase reverses every two full steps, so the
 * rate is the largest {@code f} with {@code 2/f ≥ t(E(f))}, {@code ω = 2π·f/(full steps per revolution)}; above
 * {@code V − R·I = E} no current reversal completes at all. Still ignored: driver dead time and chopper ripple,
 * saturation, iron loss, the EMF's phase relative to the current (the worst case is taken), and mutual coupling
 * between phases. The drive-performance model of a voltage-limited phase current may reuse this class.
 */
public final class BackEmfCurrentLimit {
    /** The back-EMF is said to bind when it lowers the inductance-only rate by more than this fraction. */
    public static final double BINDING_FRACTION = 0.10;

    private BackEmfCurrentLimit() {
    }

    /**
     * Highest full-step rate at which the phase current still reaches {@code phaseCurrentA}, full steps/s; 0 when the
     * supply cannot drive that current through the resistance.
     *
     * @param keVsPerRad           back-EMF constant of the phase as wired, peak V per mechanical rad/s
     * @param fullStepsPerRevolution full steps per revolution (4 × rotor teeth)
     */
    public static double rateFullStepsPerS(double supplyV, double phaseResistanceOhm, double phaseInductanceH,
                                           double phaseCurrentA, double keVsPerRad, int fullStepsPerRevolution) {
        Checks.positive(supplyV, "supply", "V");
        Checks.positive(phaseResistanceOhm, "phase resistance", "ohm");
        Checks.positive(phaseInductanceH, "phase inductance", "H");
        Checks.positive(phaseCurrentA, "phase current", "A");
        Checks.nonNegative(keVsPerRad, "Ke", "V·s/rad");
        if (fullStepsPerRevolution < 1) {
            throw new IllegalArgumentException("full steps per revolution must be at least 1, got "
                    + fullStepsPerRevolution);
        }
        double headroomV = supplyV - phaseResistanceOhm * phaseCurrentA;
        if (!(headroomV > 0)) {
            return 0.0;
        }
        double upper = 2.0 / RlStep.timeToReachS(supplyV, phaseResistanceOhm, phaseInductanceH, -phaseCurrentA,
                phaseCurrentA);
        if (keVsPerRad > 0) {
            // the EMF alone uses up the headroom at this rate
            upper = Math.min(upper, headroomV / keVsPerRad * fullStepsPerRevolution / (2 * Math.PI));
        }
        double lo = 0;
        double hi = upper;
        for (int k = 0; k < 200 && hi - lo > 1e-9 * upper; k++) {
            double f = 0.5 * (lo + hi);
            double emfV = keVsPerRad * 2 * Math.PI * f / fullStepsPerRevolution;
            double t = RlStep.timeToReachS(supplyV - emfV, phaseResistanceOhm, phaseInductanceH, -phaseCurrentA,
                    phaseCurrentA);
            if (Double.isFinite(t) && 2.0 / f >= t) {
                lo = f;
            } else {
                hi = f;
            }
        }
        return lo;
    }
}
