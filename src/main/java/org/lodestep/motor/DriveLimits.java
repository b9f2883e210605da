package org.lodestep.motor;

/**
 * What a driver can do with a winding: the full-step rate above which the phase current no longer reaches its set
 * value, and rule-of-thumb supply voltage and current ratings.
 *
 * <p>The rate limit applies the RL step response (Alexander and Sadiku, <i>Fundamentals of Electric Circuits</i>,
 * first-order circuits; REFERENCE-CHECKS item 10) to a current reversal: in full stepping each phase current reverses
 * once every two full steps, and with the whole supply across the winding a swing from {@code -I} to {@code +I}
 * takes {@code t = tau·ln((V + R·I)/(V - R·I))}. Back-EMF, which lowers the voltage left for the current at speed,
 * and driver dead time are ignored, so the real limit is lower. The supply and current rules are common practice
 * (no published source) and say so in their javadoc.
 */
final class DriveLimits {
    /** Coefficient of the common supply rule {@code V = 32·sqrt(L in mH)}; common practice, no published source. */
    static final double SUPPLY_RULE_COEFFICIENT = 32.0;
    /** Copper loss per phase assumed for the low end of the rated-current range, in W; common practice. */
    static final double LOW_LOSS_PER_PHASE_W = 2.0;
    /** Copper loss per phase assumed for the high end of the rated-current range, in W; common practice. */
    static final double HIGH_LOSS_PER_PHASE_W = 5.0;

    private DriveLimits() {
    }

    /**
     * Highest full-step rate, in full steps/s, at which the phase current still reaches {@code phaseCurrentA} after
     * each reversal; 0 when the supply cannot drive that current through the resistance at all.
     */
    static double fullCurrentRateFullStepsPerS(double supplyV, double phaseResistanceOhm,
                                                      double phaseInductanceH, double phaseCurrentA) {
        double reversalS = RlStep.timeToReachS(supplyV, phaseResistanceOhm, phaseInductanceH,
                -phaseCurrentA, phaseCurrentA);
        if (!Double.isFinite(reversalS)) {
            return 0.0;
        }
        return 2.0 / reversalS;
    }

    /**
     * Suggested supply voltage {@code 32·sqrt(L/mH)} in V, for a chopper driver. Common practice (no published
     * source): a compromise between high-speed torque and iron loss and heating; keep within the driver's rating.
     */
    static double suggestedSupplyV(double phaseInductanceH) {
        return SUPPLY_RULE_COEFFICIENT * Math.sqrt(phaseInductanceH * 1000.0);
    }

    /**
     * Phase current, in A, that dissipates {@code copperLossW} in {@code phaseResistanceOhm}: {@code sqrt(P/R)}.
     * Used with {@link #LOW_LOSS_PER_PHASE_W} and {@link #HIGH_LOSS_PER_PHASE_W} as a rated-current range for small
     * hybrid motors (frames about 35 to 60 mm); common practice, no published source. Check the case temperature.
     */
    static double currentForLossA(double phaseResistanceOhm, double copperLossW) {
        return Math.sqrt(copperLossW / phaseResistanceOhm);
    }
}
