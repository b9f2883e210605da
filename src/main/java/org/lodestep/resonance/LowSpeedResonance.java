package org.lodestep.resonance;

import java.util.ArrayList;
import java.util.List;

/**
 * Full-step rates at which open-loop stepping excites the rotor's natural frequency: f_n itself and its
 * sub-multiples f_n/k, where every k-th step arrives in phase with the ring-down of the previous ones.
 *
 * <p>Source: P. P. Acarnley, <i>Stepping Motors: A Guide to Theory and Practice</i>, 4th ed., IEE 2002, section 4.3
 * (mechanical resonances). Resonance is strongest at k = 1 and weaker as k grows.
 */
final class LowSpeedResonance {
    private LowSpeedResonance() {
    }

    /** The risky full-step rates f_n/k for k = 1 ... maxK, in full steps/s, highest first. */
    public static List<Double> riskyRatesFullStepsPerS(double naturalHz, int maxK) {
        Require.positive(naturalHz, "natural frequency", "Hz");
        if (maxK < 1) {
            throw new IllegalArgumentException("subharmonic count must be at least 1, got " + maxK);
        }
        List<Double> rates = new ArrayList<>();
        for (int k = 1; k <= maxK; k++) {
            rates.add(naturalHz / k);
        }
        return rates;
    }
}
