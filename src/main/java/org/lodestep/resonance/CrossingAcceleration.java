package org.lodestep.resonance;

/**
 * The least acceleration that carries the step rate through a band within a given number of oscillation periods, so
 * the resonance has no time to build up: a = (rate span) × f_osc / N, in full steps/s².
 *
 * <p>Common practice (no published source): a lightly damped resonance grows over roughly Q periods, so crossing in
 * fewer periods than that keeps it small. The number of periods is the user's choice; 5 is a cautious default.
 */
final class CrossingAcceleration {
    private CrossingAcceleration() {
    }

    /**
     * @param spanFullStepsPerS width of the rate range to cross, full steps/s
     * @param oscillationHz     frequency of the oscillation that would build up, Hz
     * @param periods           periods allowed for the crossing, positive
     * @return acceleration in full steps/s²
     */
    public static double minimumFullStepsPerS2(double spanFullStepsPerS, double oscillationHz, double periods) {
        Require.positive(oscillationHz, "oscillation frequency", "Hz");
        Require.positive(periods, "crossing periods", "");
        if (!(spanFullStepsPerS >= 0)) {
            throw new IllegalArgumentException("rate span must be non-negative, got " + spanFullStepsPerS
                    + " full steps/s");
        }
        return spanFullStepsPerS * oscillationHz / periods;
    }
}
