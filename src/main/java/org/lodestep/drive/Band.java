package org.lodestep.drive;

import org.lodestep.resonance.AvoidRange;

/**
 * A step-rate range a profile must not dwell in and must cross at no less than a given acceleration.
 *
 * @param fromFullStepsPerS             lower edge, full steps/s
 * @param toFullStepsPerS               upper edge, full steps/s
 * @param minAccelerationFullStepsPerS2 least acceleration to cross it, full steps/s² (0 when only dwelling is
 *                                      forbidden)
 */
public record Band(double fromFullStepsPerS, double toFullStepsPerS, double minAccelerationFullStepsPerS2) {
    public Band {
        Require.nonNegative(fromFullStepsPerS, "band start", "full steps/s");
        Require.positive(toFullStepsPerS, "band end", "full steps/s");
        if (!(toFullStepsPerS > fromFullStepsPerS)) {
            throw new IllegalArgumentException("band must rise: " + fromFullStepsPerS + " ... " + toFullStepsPerS
                    + " full steps/s");
        }
        Require.nonNegative(minAccelerationFullStepsPerS2, "band crossing acceleration", "full steps/s²");
    }

    /** The band of an avoid range (an unknown crossing acceleration becomes 0: only dwelling is forbidden). */
    public static Band of(AvoidRange r) {
        double a = r.minAccelerationFullStepsPerS2();
        return new Band(r.fromFullStepsPerS(), r.toFullStepsPerS(), Double.isFinite(a) ? a : 0);
    }

    /** True when the rate lies inside the band, edges included. */
    public boolean contains(double rateFullStepsPerS) {
        return rateFullStepsPerS >= fromFullStepsPerS && rateFullStepsPerS <= toFullStepsPerS;
    }
}
